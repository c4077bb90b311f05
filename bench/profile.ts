/**
 * CPU profiles of the paths the benchmarks time, recorded in process around the timed work
 * only (inputs are made before the profiler starts; start-up, compilation and the checks are
 * not in the profile), then summarised by bench/cpuprofileTop.ts.
 *
 *   npx ts-node --transpile-only bench/profile.ts call|calltable|sweep|diagram|recalc [outFile]
 *
 * call: 20 × 20,000 Excel-shaped single-case POTENTIAL calls (built-in table, distinct
 * activities); calltable: the same with the user's table (a fresh array each call) and a
 * distinct temperature each call; sweep: 20 spills of 100,000 cases; diagram: 10 × 1,000 calls of a diagram with
 * changing inline activities; recalc: the runner's in-process recalculation of the
 * 10,000-row ECHEM workbook, 3 times.
 */
import * as fs from 'fs';
import * as inspector from 'inspector';
import * as path from 'path';
import { excelFunction, inlineDiagram } from './excelBench';
import { DANIELL_DIAGRAM, caseInputs, daniellTableRange } from './reference';
import { runnerApi, scratchDir, writeWorkbookFile } from './recalcBench';
import { summarise } from './cpuprofileTop';

function post<T>(s: inspector.Session, method: string, params?: object): Promise<T> {
  return new Promise((resolve, reject) =>
    s.post(method, params ?? {}, (err, res) => (err ? reject(err) : resolve(res as T))),
  );
}

async function profiled(work: () => void | Promise<void>): Promise<object> {
  const s = new inspector.Session();
  s.connect();
  await post(s, 'Profiler.enable');
  await post(s, 'Profiler.setSamplingInterval', { interval: 200 });
  await post(s, 'Profiler.start');
  await work();
  const { profile } = await post<{ profile: object }>(s, 'Profiler.stop');
  s.disconnect();
  return profile;
}

async function main(): Promise<void> {
  const target = process.argv[2] ?? 'call';
  const outFile = process.argv[3] ?? path.join(process.cwd(), `${target}.cpuprofile`);
  const potential = excelFunction('POTENTIAL');
  let work: () => void | Promise<void>;
  let cleanup = () => undefined as void;
  if (target === 'call' || target === 'calltable' || target === 'diagram') {
    const single = target !== 'diagram';
    const reps = single ? 20 : 10;
    const calls = single ? 20_000 : 1_000;
    const sets = Array.from({ length: reps }, (_, k) =>
      Array.from({ length: calls }, (_, i) => {
        const c = caseInputs(k * calls + i);
        if (target === 'calltable')
          return [[[DANIELL_DIAGRAM]], [['Zn2+', 'Cu2+']], [[c.aZn, c.aCu]], [[c.tempC]], daniellTableRange()];
        return target === 'call'
          ? [[[DANIELL_DIAGRAM]], [['Zn2+', 'Cu2+']], [[c.aZn, c.aCu]], null, null]
          : [[[inlineDiagram(c.aZn, c.aCu)]], null, null, null, null];
      }),
    );
    for (const a of sets[0]!.slice(0, 200)) potential(...a); // warm up
    work = () => {
      for (const set of sets) for (const a of set) potential(a[0], a[1], a[2], a[3], a[4]);
    };
  } else if (target === 'sweep') {
    const spills = Array.from({ length: 20 }, (_, k) =>
      Array.from({ length: 100_000 }, (_, i) => {
        const c = caseInputs(k * 100_000 + i);
        return [c.aZn, c.aCu];
      }),
    );
    potential([[DANIELL_DIAGRAM]], [['Zn2+', 'Cu2+']], spills[0]!, [[25]], daniellTableRange());
    work = () => {
      for (const rows of spills)
        potential([[DANIELL_DIAGRAM]], [['Zn2+', 'Cu2+']], rows, [[25]], daniellTableRange());
    };
  } else if (target === 'recalc') {
    const api = runnerApi();
    api.register();
    const dir = scratchDir();
    const file = path.join(dir, 'echem.xlsx');
    await writeWorkbookFile('echem', 10_000, file);
    cleanup = () => fs.rmSync(dir, { recursive: true, force: true });
    const once = async () => {
      const wb = await api.readWorkbook(file);
      if (api.loadWorkbook && api.buildEngine && api.writeResults) {
        const loaded = api.loadWorkbook(wb);
        const { hf } = api.buildEngine(loaded);
        api.writeResults(wb, loaded, hf, api.echemFunctionNames());
        hf.destroy();
      } else api.recalcWorkbook?.(wb);
      await wb.xlsx.writeFile(path.join(dir, 'out.xlsx'));
    };
    await once(); // warm up
    work = async () => {
      for (let i = 0; i < 3; i++) await once();
    };
  } else {
    throw new Error(`unknown target ${target}: call, calltable, sweep, diagram or recalc`);
  }
  const profile = await profiled(work);
  cleanup();
  fs.writeFileSync(outFile, JSON.stringify(profile));
  const s = summarise(profile as Parameters<typeof summarise>[0]);
  console.log(`${target}: ${s.total.toFixed(0)} ms sampled; profile in ${outFile}`);
  for (const a of s.areas) console.log(`  ${(a.share * 100).toFixed(1).padStart(5)} %  ${a.area}`);
  for (const e of s.top.slice(0, 15))
    console.log(`  ${(e.share * 100).toFixed(1).padStart(5)} %  ${e.name}  ${e.where}  [${e.area}]`);
}

main().catch((e) => {
  console.error(e);
  process.exitCode = 1;
});
