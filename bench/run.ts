/**
 * Benchmarks (figures, never timed tests). What each figure times is in bench/README.md.
 *
 *   npm run bench                 figures as text
 *   npm run bench -- --json       the same, and one JSON object on the last line of stdout
 *   npm run bench -- --full       adds the 100,000-row end-to-end recalculations and
 *                                 LibreOffice at that size (slow: minutes)
 *   npm run bench -- --tiny       every benchmark at a tiny size, 2 runs (a smoke test of the
 *                                 harness and its checks; the figures mean nothing)
 *   npm run bench -- --only=call,sweep,diagram,families,first,cli,parse,recalc,e2e
 *                                 only those benchmarks (for profiling one path)
 *   npm run bench -- --in-process the Excel-shaped benchmarks (call, sweep, diagram) in the
 *                                 benchmark process on the TypeScript sources, instead of a
 *                                 fresh process on dist/functions.js
 *
 * Every figure is {min, median, runs} over its timed runs. Every output of every timed run is
 * checked against an independent computation (bench/reference.ts); a wrong output stops the
 * benchmark with an error instead of printing a figure.
 */
import * as fs from 'fs';
import * as os from 'os';
import * as path from 'path';
import * as zlib from 'zlib';
import * as engine from '../src/engine';
import { benchExcelCalls, benchInlineDiagram, benchSweep } from './excelBench';
import type { ChildReport } from './excelChild';
import { excelFiguresInChild, FUNCTIONS_BUNDLE } from './excelProcess';
import { benchCliEval, benchFirstCall } from './firstCall';
import { benchEphMap, benchPitzer } from './familiesBench';
import {
  benchEndToEnd,
  benchInProcess,
  benchLibreOffice,
  compareOutputs,
  hasLibreOffice,
  RunFailure,
  scratchDir,
  type EndToEndFigures,
} from './recalcBench';
import { checkedCounts, rounded, stat, type Stat } from './stats';

export interface BenchOptions {
  json?: boolean;
  full?: boolean;
  tiny?: boolean;
  only?: readonly string[];
  /**
   * Run the Excel-shaped benchmarks (call, sweep, diagram) in this process, on the TypeScript
   * sources through ts-node, instead of in a fresh process on dist/functions.js (which is what
   * happens when a build exists).
   */
  inProcess?: boolean;
  /** Where progress lines go (stderr with --json, stdout otherwise). */
  log?: (line: string) => void;
}

/** Sizes and run counts of one mode. */
interface Sizes {
  calls: number;
  callRuns: number;
  sweepCases: number;
  sweepRuns: number;
  diagramCalls: number;
  diagramRuns: number;
  spawnRuns: number;
  recalcRows: number;
  recalcRuns: number;
  e2eRows: number;
  e2eRuns: number;
  bigRows: number;
  bigRuns: number;
  pitzerCases: number;
  ephSide: number;
  familyRuns: number;
}

const NORMAL: Sizes = {
  calls: 100_000,
  callRuns: 7,
  sweepCases: 100_000,
  sweepRuns: 9,
  diagramCalls: 1_000,
  diagramRuns: 5,
  spawnRuns: 5,
  recalcRows: 10_000,
  recalcRuns: 5,
  e2eRows: 10_000,
  e2eRuns: 5,
  bigRows: 100_000,
  bigRuns: 3,
  pitzerCases: 100_000,
  ephSide: 200,
  familyRuns: 5,
};

const TINY: Sizes = {
  calls: 100,
  callRuns: 2,
  sweepCases: 100,
  sweepRuns: 2,
  diagramCalls: 20,
  diagramRuns: 2,
  spawnRuns: 1,
  recalcRows: 100,
  recalcRuns: 2,
  e2eRows: 100,
  e2eRuns: 1,
  bigRows: 100,
  bigRuns: 1,
  pitzerCases: 100,
  ephSide: 10,
  familyRuns: 2,
};

type Json = Record<string, unknown>;

const r3 = (s: Stat) => rounded(s, 3);
const mm = (s: Stat, d = 2) => `min ${s.min.toFixed(d)} / median ${s.median.toFixed(d)}`;

/** Cold parse + table resolution of one text, caches cleared before each, µs (built-in table kept parsed). */
function coldParseUs(text: string, reps: number, runs: number): Stat | null {
  const e = engine as unknown as Record<string, unknown>;
  const clear = e.clearCaches;
  const compile = e.compiledReaction;
  if (typeof clear !== 'function' || typeof compile !== 'function') return null;
  (compile as (t: string, c: null) => unknown)(text, null);
  const per: number[] = [];
  for (let k = 0; k < runs; k++) {
    const t0 = process.hrtime.bigint();
    for (let i = 0; i < reps; i++) {
      (clear as () => void)();
      (compile as (t: string, c: null) => unknown)(text, null);
    }
    per.push(Number(process.hrtime.bigint() - t0) / 1e3 / reps);
  }
  return stat(per);
}

function bundleSize(): { kb: number | null; gzipKb: number | null } {
  const f = path.join(__dirname, '..', 'dist', 'functions.js');
  if (!fs.existsSync(f)) return { kb: null, gzipKb: null };
  const buf = fs.readFileSync(f);
  return {
    kb: Number((buf.length / 1024).toFixed(1)),
    gzipKb: Number((zlib.gzipSync(buf, { level: 9 }).length / 1024).toFixed(1)),
  };
}

function rss(f: EndToEndFigures | null): Stat | null {
  return f?.peakRssMiB ? rounded(f.peakRssMiB, 1) : null;
}

/** A figure the child process was asked for; its absence is an error, not a reason to measure here. */
function reported<T>(figure: T | undefined, what: string): T {
  if (figure === undefined)
    throw new Error(`the Excel-shaped benchmarks' process reported no ${what} figures`);
  return figure;
}

/** Runs the benchmarks and returns the JSON figures (also printed with --json). */
export async function runBench(opts: BenchOptions = {}): Promise<Json> {
  const sz = opts.tiny ? TINY : NORMAL;
  const wants = (k: string) => !opts.only || opts.only.includes(k);
  const log = opts.log ?? ((s: string) => (opts.json ? console.error(s) : console.log(s)));
  const out: Json = {};
  const loadStart = os.loadavg();
  log(
    `Potentia benchmarks — ${os.cpus()[0]?.model ?? 'unknown CPU'} × ${os.cpus().length}, Node ${process.version}, ` +
      `load average ${loadStart.map((x) => x.toFixed(2)).join(' ')}${opts.tiny ? ' (tiny mode: figures mean nothing)' : ''}`,
  );

  // the Excel-shaped benchmarks: in a fresh process on the built bundle where there is one
  const excelSource = !opts.inProcess && fs.existsSync(FUNCTIONS_BUNDLE) ? 'dist' : 'ts-node';
  const wantsExcel = wants('call') || wants('sweep') || wants('diagram');
  let child: ChildReport | null = null;
  if (excelSource === 'dist' && wantsExcel) {
    child = excelFiguresInChild({
      bundle: FUNCTIONS_BUNDLE,
      ...(wants('call') ? { call: { calls: sz.calls, runs: sz.callRuns } } : {}),
      ...(wants('sweep') ? { sweep: { cases: sz.sweepCases, runs: sz.sweepRuns } } : {}),
      ...(wants('diagram') ? { diagram: { calls: sz.diagramCalls, runs: sz.diagramRuns } } : {}),
    });
  }
  if (wantsExcel) {
    out.excel_bench_source = excelSource;
    log(
      excelSource === 'dist'
        ? 'call, sweep, diagram: a fresh Node process loading dist/functions.js (as Excel loads it)'
        : 'call, sweep, diagram: in this process, on the TypeScript sources through ts-node',
    );
  }

  if (wants('call')) {
    const c = child ? reported(child.call, 'call') : benchExcelCalls(sz.calls, sz.callRuns, false);
    const t = child ? reported(child.callTable, 'callTable') : benchExcelCalls(sz.calls, sz.callRuns, true);
    log(
      `call: one Excel-shaped POTENTIAL of the Daniell cell, distinct activities, built-in table: ${mm(c.potentiaUs, 3)} µs per call; ` +
        `hand-written custom function ${mm(c.handUs, 3)} µs; call_ratio_excel ${mm(c.ratio)} (target ≤ 3)`,
    );
    log(
      `      with the user's table and a distinct temperature each call: ${mm(t.potentiaUs, 3)} µs; hand ${mm(t.handUs, 3)} µs; ratio ${mm(t.ratio)}`,
    );
    out.call_ratio_excel = r3(c.ratio);
    out.call_excel_us = r3(c.potentiaUs);
    out.call_hand_us = r3(c.handUs);
    out.call_ratio_excel_table = r3(t.ratio);
    out.call_excel_table_us = r3(t.potentiaUs);
  }

  if (wants('sweep')) {
    const s = child ? reported(child.sweep, 'sweep') : benchSweep(sz.sweepCases, sz.sweepRuns);
    const ns = (x: Stat) => ({
      min: (x.min * 1e6) / s.cases,
      median: (x.median * 1e6) / s.cases,
      runs: x.runs,
    });
    log(
      `sweep: one spilled POTENTIAL over ${s.cases.toLocaleString('en-US')} cases × 2 species: ${mm(ns(s.spillMs), 1)} ns per case; ` +
        `Float64Array loop ${mm(ns(s.floorMs), 1)} ns; sweep_ratio_floor ${mm(s.ratioFloor)} (target ≤ 2.5); ` +
        `vs the hand loop writing one-cell rows: sweep_ratio ${mm(s.ratioRows)} (contract ≤ 3)`,
    );
    out.sweep_ratio_floor = r3(s.ratioFloor);
    out.sweep_ratio = r3(s.ratioRows);
    out.sweep_ns_per_case = rounded(ns(s.spillMs), 1);
    out.sweep_floor_ns_per_case = rounded(ns(s.floorMs), 1);
    out.sweep_floor_pair_ns_per_case = rounded(ns(s.spillFloorPairMs), 1);
    out.sweep_page_faults_per_run = {
      spill_rows_pair: rounded(s.pageFaults.spillRowsPair, 0),
      rows_loop: rounded(s.pageFaults.rowsLoop, 0),
      spill_floor_pair: rounded(s.pageFaults.spillFloorPair, 0),
      floor: rounded(s.pageFaults.floor, 0),
    };
    log(
      `      the spill's runs in the floor pair ${mm(ns(s.spillFloorPairMs), 1)} ns per case; minor page faults per run (median): ` +
        `spill ${s.pageFaults.spillRowsPair.median} and hand loop ${s.pageFaults.rowsLoop.median} (rows pair), ` +
        `spill ${s.pageFaults.spillFloorPair.median} and floor ${s.pageFaults.floor.median} (floor pair)`,
    );
    out.sweep_rows_loop_ns_per_case = rounded(ns(s.rowsLoopMs), 1);
    if (s.kernelMs && s.kernelRatioFloor) {
      log(
        `      the engine kernel alone (no function layer): ${mm(ns(s.kernelMs), 1)} ns per case; ÷ floor ${mm(s.kernelRatioFloor)}`,
      );
      out.sweep_kernel_ns_per_case = rounded(ns(s.kernelMs), 1);
      out.sweep_kernel_ratio_floor = r3(s.kernelRatioFloor);
    }
  }

  if (wants('diagram')) {
    const d = child
      ? reported(child.diagram, 'diagram')
      : benchInlineDiagram(sz.diagramCalls, sz.diagramRuns);
    log(
      `diagram: POTENTIAL("Zn | Zn2+(aq, a1 M) || Cu2+(aq, a2 M) | Cu"), activities changing every call: ${mm(d.us, 1)} µs per call (target ≤ 5); ` +
        `with the user's table and a temperature ${mm(d.tableUs, 1)} µs`,
    );
    out.diagram_inline_us = rounded(d.us, 2);
    out.diagram_inline_table_us = rounded(d.tableUs, 2);
  }

  if (wants('families')) {
    const p = benchPitzer(sz.pitzerCases, sz.familyRuns);
    const m = benchEphMap(sz.ephSide, sz.familyRuns);
    log(
      `families: one spilled MEANACTCOEF("NaCl", m) over ${sz.pitzerCases.toLocaleString('en-US')} molalities (Pitzer): ${mm(p, 1)} ms; ` +
        `one spilled PREDOMINANT("Fe", E, pH) over a ${sz.ephSide} × ${sz.ephSide} map: ${mm(m, 1)} ms`,
    );
    out.pitzer_100k_ms = rounded(p, 1);
    out.pitzer_cases = sz.pitzerCases;
    out.eph_map_ms = rounded(m, 1);
    out.eph_map_side = sz.ephSide;
  }

  if (wants('first')) {
    const f = benchFirstCall(sz.spawnRuns);
    log(
      `first call after load (${f.source === 'dist' ? 'dist/functions.js' : 'sources through ts-node: includes compiling; run npm run build'}): ` +
        `${mm(f.totalMs)} ms (load ${mm(f.loadMs)} ms + first POTENTIAL ${mm(f.callMs)} ms) (target ≤ 15)`,
    );
    out.first_call_ms = rounded(f.totalMs, 2);
    out.first_call_load_ms = rounded(f.loadMs, 2);
    out.first_call_source = f.source;
  }

  if (wants('cli')) {
    const e = benchCliEval(sz.spawnRuns);
    log(`cli: node bin/potentia.js eval of one ECHEM formula, start-up included: ${mm(e, 0)} ms wall`);
    out.cli_eval_ms = rounded(e, 1);
  }

  if (wants('parse')) {
    const reps = opts.tiny ? 5 : 200;
    const cell = coldParseUs('Zn(s) | Zn2+(aq, 0.1 M) || Cu2+(aq, 0.01 M) | Cu(s)', reps, opts.tiny ? 2 : 7);
    const reaction = coldParseUs(
      '2 MnO4- + 10 Fe2+ + 16 H+ -> 2 Mn2+ + 10 Fe3+ + 8 H2O',
      Math.ceil(reps / 4),
      opts.tiny ? 2 : 7,
    );
    if (cell && reaction)
      log(
        `parse: cold parse + resolution (built-in table kept parsed): cell diagram ${mm(cell, 1)} µs, full reaction ${mm(reaction, 1)} µs`,
      );
    out.parse_cell_us = cell ? rounded(cell, 1) : null;
    out.parse_reaction_us = reaction ? rounded(reaction, 1) : null;
  }

  const dir = scratchDir();
  try {
    if (wants('recalc')) {
      const r = await benchInProcess(sz.recalcRows, sz.recalcRuns, dir);
      const ph = (p: typeof r.echem) =>
        `read ${p.readFile.median.toFixed(0)} + to engine ${p.toEngine.median.toFixed(0)} + engine ${p.engine.median.toFixed(0)} ` +
        `(parse ${p.engineParse.median.toFixed(0)}, evaluate ${p.engineEval.median.toFixed(0)}) + write cells ${p.writeCells.median.toFixed(0)} ` +
        `+ write file ${p.writeFile.median.toFixed(0)} = ${p.total.median.toFixed(0)} ms`;
      log(`recalc in process, ${r.rows.toLocaleString('en-US')} rows (medians): ECHEM ${ph(r.echem)}`);
      log(`                                      plain ${ph(r.plain)}`);
      log(
        `      ECHEM ÷ plain: whole path ${mm(r.ratioTotal)}, evaluation only ${mm(r.ratioEval)} (contract ≤ 1.5); ` +
          `largest |ECHEM − plain| ${r.maxDifferenceV.toExponential(2)} V${r.phases ? '' : ' (runner phases not exposed: engine includes writing cells)'}`,
      );
      const phases = (p: typeof r.echem) => ({
        read_file_ms: rounded(p.readFile, 1),
        to_engine_ms: rounded(p.toEngine, 1),
        engine_ms: rounded(p.engine, 1),
        engine_parse_ms: rounded(p.engineParse, 1),
        engine_eval_ms: rounded(p.engineEval, 1),
        write_cells_ms: rounded(p.writeCells, 1),
        write_file_ms: rounded(p.writeFile, 1),
        total_ms: rounded(p.total, 1),
      });
      out.recalc_rows = r.rows;
      out.recalc_ratio = r3(r.ratioTotal);
      out.recalc_eval_ratio = r3(r.ratioEval);
      out.recalc_phases_echem = phases(r.echem);
      out.recalc_phases_plain = phases(r.plain);
      out.recalc_max_difference_v = r.maxDifferenceV;
    }

    if (wants('e2e')) {
      const lo = hasLibreOffice();
      // Tiers: 10,000 rows (always); with --full 100,000 rows on one sheet and the same
      // 100,000 cases split over 4 sheets of 25,000 rows (a layout every peer can load).
      // --tiny --full runs the two big tiers only, at the tiny size.
      const tiers: { rows: number; runs: number; sheets: number; prefix: string }[] =
        opts.tiny && opts.full
          ? []
          : [{ rows: sz.e2eRows, runs: sz.e2eRuns, sheets: 1, prefix: 'recalc_e2e' }];
      if (opts.full) {
        tiers.push({ rows: sz.bigRows, runs: sz.bigRuns, sheets: 1, prefix: 'recalc_100k' });
        tiers.push({ rows: sz.bigRows, runs: sz.bigRuns, sheets: 4, prefix: 'recalc_100k_split' });
      }
      const m = (f: EndToEndFigures) =>
        `${mm(f.wallS)} s, peak RSS ${f.peakRssMiB ? `${f.peakRssMiB.median.toFixed(0)} MiB` : 'not measured'}`;
      // min ÷ min and median ÷ median (the peers run one after the other, not interleaved)
      const over = (a: EndToEndFigures, b: EndToEndFigures) => ({
        min: Number((a.wallS.min / b.wallS.min).toFixed(3)),
        median: Number((a.wallS.median / b.wallS.median).toFixed(3)),
        runs: Math.min(a.runs, b.runs),
      });
      /** A peer's run, or the reason it could not run (recorded, not thrown: the others still run). */
      const attempt = async <T>(key: string, f: () => Promise<T>): Promise<T | null> => {
        try {
          return await f();
        } catch (e) {
          if (!(e instanceof RunFailure)) throw e;
          out[key] =
            e.message
              .split('\n')
              .find((l) => /potentia:|Error/.test(l))
              ?.trim() ?? e.message.slice(0, 300);
          log(`  ${key}: ${String(out[key])}`);
          return null;
        }
      };
      for (const { rows, runs, sheets, prefix } of tiers) {
        const layout = sheets === 1 ? 'one sheet' : `${sheets} sheets`;
        out[`${prefix}_rows`] = rows;
        out[`${prefix}_sheets`] = sheets;
        const echem = await attempt(`${prefix}_error`, () => benchEndToEnd('echem', rows, runs, dir, sheets));
        const plain = await attempt(`${prefix}_plain_error`, () =>
          benchEndToEnd('plain', rows, runs, dir, sheets),
        );
        const office = lo
          ? await attempt(`${prefix}_libreoffice_error`, () => benchLibreOffice(rows, runs, dir, sheets))
          : null;
        if (echem && plain) compareOutputs('potentia recalc ECHEM vs plain', echem.values, plain.values);
        if (echem && office)
          compareOutputs('potentia recalc ECHEM vs LibreOffice plain', echem.values, office.values);
        log(
          `recalc end to end, ${rows.toLocaleString('en-US')} rows on ${layout}, ${runs} run${runs === 1 ? '' : 's'}: ` +
            `potentia ECHEM ${echem ? m(echem.figures) : 'failed'}; potentia plain ${plain ? m(plain.figures) : 'failed'}; ` +
            `${lo ? `LibreOffice plain ${office ? m(office.figures) : 'failed'}` : 'LibreOffice not installed'}`,
        );
        out[`${prefix}_s`] = echem ? rounded(echem.figures.wallS, 2) : null;
        out[`${prefix}_plain_s`] = plain ? rounded(plain.figures.wallS, 2) : null;
        out[`${prefix}_peak_rss_mib`] = echem ? rss(echem.figures) : null;
        out[`${prefix}_plain_peak_rss_mib`] = plain ? rss(plain.figures) : null;
        if (lo) {
          out[`${prefix}_libreoffice_s`] = office ? rounded(office.figures.wallS, 2) : null;
          out[`${prefix}_libreoffice_peak_rss_mib`] = office ? rss(office.figures) : null;
          out[`${prefix}_vs_libreoffice`] = echem && office ? over(echem.figures, office.figures) : null;
        }
      }
      if (opts.full && lo) {
        // the headline: one sheet of 100,000 rows where the runner loads it, else the split layout
        const one = out.recalc_100k_vs_libreoffice;
        out.recalc_vs_libreoffice = one ?? out.recalc_100k_split_vs_libreoffice ?? null;
        const n = sz.bigRows.toLocaleString('en-US');
        out.recalc_vs_libreoffice_layout = one ? `one sheet of ${n} rows` : `${n} rows over 4 sheets`;
      }
    }
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }

  const size = bundleSize();
  if (wants('bundle')) {
    log(
      size.kb === null
        ? 'bundle: dist/functions.js missing (run npm run build first)'
        : `bundle: dist/functions.js ${size.kb} KB minified, ${size.gzipKb} KB gzipped (budget < 230 KB, docs/design.md)`,
    );
    out.bundle_kb = size.kb;
    out.bundle_gzip_kb = size.gzipKb;
  }

  const counts = checkedCounts();
  out.outputs_checked = counts;
  out.checks_passed = true;
  out.mode = opts.tiny ? 'tiny' : opts.full ? 'full' : 'normal';
  out.bench_peak_rss_mib = Number((process.resourceUsage().maxRSS / 1024).toFixed(1));
  out.machine = {
    cpus: os.cpus().length,
    node: process.version,
    load_average_start: loadStart.map((x) => Number(x.toFixed(2))),
    load_average_end: os.loadavg().map((x) => Number(x.toFixed(2))),
  };
  const total = Object.values(counts).reduce((a, b) => a + b, 0);
  log(
    `checks: ${total.toLocaleString('en-US')} outputs checked against the hand-written computation, all passed`,
  );
  return out;
}

/** Command-line entry (bench/run.js). */
export async function main(argv: string[]): Promise<void> {
  const only = argv.find((a) => a.startsWith('--only='));
  const figures = await runBench({
    json: argv.includes('--json'),
    full: argv.includes('--full'),
    tiny: argv.includes('--tiny'),
    inProcess: argv.includes('--in-process'),
    ...(only ? { only: only.slice('--only='.length).split(',') } : {}),
  });
  if (argv.includes('--json')) console.log(JSON.stringify(figures));
}
