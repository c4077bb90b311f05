/**
 * Summarises a V8 CPU profile (`node --cpu-prof`): the functions with the most self time,
 * and the share of each part of the code (Potentia's engine, its function layer, its runner,
 * HyperFormula, ExcelJS, Node and V8 internals, garbage collection).
 *
 *   node --cpu-prof --cpu-prof-dir=prof bench/run.js --only=sweep
 *   npx ts-node --transpile-only bench/cpuprofileTop.ts prof/*.cpuprofile [top]
 */
import * as fs from 'fs';
import * as path from 'path';

interface CallFrame {
  functionName: string;
  url: string;
  lineNumber: number;
}
interface ProfileNode {
  id: number;
  callFrame: CallFrame;
  hitCount?: number;
  children?: number[];
}
interface CpuProfile {
  nodes: ProfileNode[];
  samples: number[];
  timeDeltas: number[];
}

/** Which part of the code a frame belongs to. */
export function area(url: string, name: string): string {
  if (name === '(garbage collector)') return 'garbage collection';
  if (name === '(idle)' || name === '(program)' || name === '(root)') return name;
  if (url.includes('/src/engine/')) return 'engine (src/engine)';
  if (url.includes('/src/functions/')) return 'function layer (src/functions)';
  if (url.includes('/src/cli/')) return 'runner (src/cli)';
  if (url.includes('/bench/')) return 'benchmark harness';
  if (url.includes('node_modules/hyperformula') || url.includes('node_modules/chevrotain'))
    return 'HyperFormula (with its parser, chevrotain)';
  if (
    /node_modules\/(exceljs|jszip|pako|saxes|sax|readable-stream|archiver|unzipper|zip-stream|fast-csv)\//.test(
      url,
    )
  )
    return 'ExcelJS (with its zip and xml)';
  if (url.includes('node_modules/typescript') || url.includes('node_modules/ts-node'))
    return 'TypeScript compiler (ts-node)';
  if (url.includes('node_modules/')) return 'other dependencies';
  if (url.startsWith('node:') || url === '') return 'Node and V8 internals';
  return 'other';
}

export interface Entry {
  name: string;
  where: string;
  area: string;
  selfMs: number;
  share: number;
}

/** Self time per function (by name and location) and per area, in ms, largest first. */
export function summarise(p: CpuProfile): {
  total: number;
  top: Entry[];
  areas: { area: string; ms: number; share: number }[];
} {
  const byId = new Map<number, ProfileNode>(p.nodes.map((n) => [n.id, n]));
  const selfUs = new Map<number, number>();
  p.samples.forEach((id, i) => selfUs.set(id, (selfUs.get(id) ?? 0) + (p.timeDeltas[i] ?? 0)));
  const fnMs = new Map<string, Entry>();
  const areaMs = new Map<string, number>();
  let total = 0;
  for (const [id, us] of selfUs) {
    const n = byId.get(id);
    if (!n) continue;
    const { functionName, url, lineNumber } = n.callFrame;
    const name = functionName || '(anonymous)';
    const where = url ? `${path.basename(url)}:${lineNumber + 1}` : '';
    const a = area(url, name);
    // idle time, and the in-process inspector's own frame (profiler overhead, bench/profile.ts)
    if (a === '(idle)' || (name === 'dispatch' && url === '')) continue;
    const ms = us / 1000;
    total += ms;
    const key = `${name} ${where}`;
    const e = fnMs.get(key) ?? { name, where, area: a, selfMs: 0, share: 0 };
    e.selfMs += ms;
    fnMs.set(key, e);
    areaMs.set(a, (areaMs.get(a) ?? 0) + ms);
  }
  const top = [...fnMs.values()]
    .sort((a, b) => b.selfMs - a.selfMs)
    .map((e) => ({ ...e, share: e.selfMs / total }));
  const areas = [...areaMs.entries()]
    .sort((a, b) => b[1] - a[1])
    .map(([a, ms]) => ({ area: a, ms, share: ms / total }));
  return { total, top, areas };
}

if (require.main === module) {
  const file = process.argv[2];
  const n = Number(process.argv[3] ?? 15);
  if (!file) {
    console.error('usage: cpuprofileTop.ts FILE.cpuprofile [top]');
    process.exit(2);
  }
  const s = summarise(JSON.parse(fs.readFileSync(file, 'utf8')) as CpuProfile);
  console.log(`total ${s.total.toFixed(0)} ms sampled (idle left out)`);
  console.log('by area:');
  for (const a of s.areas) console.log(`  ${(a.share * 100).toFixed(1).padStart(5)} %  ${a.area}`);
  console.log(`top ${n} functions by self time:`);
  for (const e of s.top.slice(0, n))
    console.log(`  ${(e.share * 100).toFixed(1).padStart(5)} %  ${e.name}  ${e.where}  [${e.area}]`);
}
