/**
 * Benchmarks (figures, never timed tests). Each figure is a ratio to a baseline
 * measured in the same process and run: the median of several repetitions after
 * warm-up. `npm run bench -- --json` prints one JSON object on its last line.
 *
 * 1. sweep_ratio: one POTENTIAL call over 100,000 cases × 2 species through the
 *    function layer (matrix in, column out) vs a hand-written Nernst loop over the
 *    same arrays producing the same column.
 * 2. call_ratio: 100,000 single-case POTENTIAL calls with the same reaction text,
 *    per call, vs the hand loop's per-case cost.
 * 3. parse_cell_us / parse_reaction_us: cold parse + table resolution of a cell
 *    diagram and of a full reaction (caches cleared before each).
 * 4. recalc_ratio: headless recalculation of a 10,000-row workbook of ECHEM
 *    formulas vs the same workbook in plain spreadsheet arithmetic.
 * 5. bundle_kb / bundle_gzip_kb: size of the built dist/functions.js.
 */
import * as fs from 'fs';
import * as os from 'os';
import * as path from 'path';
import * as zlib from 'zlib';
import * as v8 from 'v8';
import * as vm from 'vm';
import { potential } from '../src/functions/catalogue';
import { clearCaches, compiledReaction, FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K } from '../src/engine';

const CASES = 100_000;

v8.setFlagsFromString('--expose-gc');
const gc = vm.runInNewContext('gc') as (() => void) | undefined;

/** A full collection before each timed run, so one run's garbage is not charged to the next. */
function collectGarbage(): void {
  if (typeof gc === 'function') gc();
}

function median(xs: number[]): number {
  const s = xs.slice().sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

/**
 * Time two functions alternately (so drift and garbage collection fall on both alike) and
 * return the median of each and the median of the per-repetition ratios f/g.
 */
function pairedMs(
  f: () => unknown,
  g: () => unknown,
  reps: number,
  warmup = 3,
): { fMs: number; gMs: number; ratio: number } {
  for (let i = 0; i < warmup; i++) {
    f();
    g();
  }
  const fs: number[] = [];
  const gs: number[] = [];
  const rs: number[] = [];
  const clock = (h: () => unknown) => {
    collectGarbage();
    const t0 = process.hrtime.bigint();
    h();
    return Number(process.hrtime.bigint() - t0) / 1e6;
  };
  for (let i = 0; i < reps; i++) {
    const a = clock(f);
    const b = clock(g);
    fs.push(a);
    gs.push(b);
    rs.push(a / b);
  }
  return { fMs: median(fs), gMs: median(gs), ratio: median(rs) };
}

function makeCases(): number[][] {
  const rows: number[][] = new Array(CASES);
  for (let i = 0; i < CASES; i++) rows[i] = [Math.pow(10, -1 - (i % 50) / 10), Math.pow(10, -(i % 37) / 10)];
  return rows;
}

/** The floor: the Nernst equation written by hand for the Daniell cell, same arrays, same column out. */
function handLoop(rows: number[][], e0V: number): number[][] {
  const s = (GAS_CONSTANT_J_PER_MOL_K * 298.15 * Math.LN10) / (2 * FARADAY_C_PER_MOL);
  const out: number[][] = new Array(rows.length);
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i]!;
    out[i] = [e0V - s * Math.log10(r[0]! / r[1]!)];
  }
  return out;
}

/** A stricter floor: the same loop writing into a Float64Array (no per-case allocation). */
function handLoopTyped(rows: number[][], e0V: number): Float64Array {
  const s = (GAS_CONSTANT_J_PER_MOL_K * 298.15 * Math.LN10) / (2 * FARADAY_C_PER_MOL);
  const out = new Float64Array(rows.length);
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i]!;
    out[i] = e0V - s * Math.log10(r[0]! / r[1]!);
  }
  return out;
}

function coldParseUs(text: string, reps: number): number {
  const per: number[] = [];
  compiledReaction(text, null); // built-in table parsed once per process
  for (let k = 0; k < 7; k++) {
    const t0 = process.hrtime.bigint();
    for (let i = 0; i < reps; i++) {
      clearCaches();
      compiledReaction(text, null);
    }
    per.push(Number(process.hrtime.bigint() - t0) / 1e3 / reps);
  }
  return median(per);
}

async function recalcRatio(): Promise<{
  ratio: number | null;
  echemMs: number | null;
  plainMs: number | null;
  note: string;
}> {
  const file = path.join(__dirname, 'recalcBench.ts');
  if (!fs.existsSync(file))
    return { ratio: null, echemMs: null, plainMs: null, note: 'bench/recalcBench.ts not present' };
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const mod = require(file) as {
    runRecalcBench?: (rows?: number) => Promise<{ echemMs: number; plainMs: number }>;
  };
  if (!mod.runRecalcBench)
    return { ratio: null, echemMs: null, plainMs: null, note: 'runRecalcBench not exported' };
  const r = await mod.runRecalcBench(10_000);
  return { ratio: r.echemMs / r.plainMs, echemMs: r.echemMs, plainMs: r.plainMs, note: '' };
}

function bundleSize(): { kb: number | null; gzipKb: number | null } {
  const f = path.join(__dirname, '..', 'dist', 'functions.js');
  if (!fs.existsSync(f)) return { kb: null, gzipKb: null };
  const buf = fs.readFileSync(f);
  return { kb: buf.length / 1024, gzipKb: zlib.gzipSync(buf, { level: 9 }).length / 1024 };
}

const round = (x: number | null, d = 3) => (x === null ? null : Number(x.toFixed(d)));

export async function main(argv: string[]): Promise<void> {
  const json = argv.includes('--json');
  const log = (s: string) => {
    if (!json) console.log(s);
    else console.error(s);
  };
  log(
    `Potentia benchmarks — ${os.cpus()[0]?.model ?? 'unknown CPU'} × ${os.cpus().length}, Node ${process.version}`,
  );
  const rows = makeCases();
  const species = [['Zn2+', 'Cu2+']];
  const cell = 'Zn | Zn2+ || Cu2+ | Cu';
  const e0 = 0.337 - -0.7618;

  // correctness guard: the function layer and the hand loop agree
  const check = potential(cell, species, rows.slice(0, 100), 25, null);
  const hand = handLoop(rows.slice(0, 100), e0);
  check.forEach((r, i) => {
    if (typeof r[0] !== 'number' || Math.abs(r[0] - hand[i]![0]!) > 1e-12)
      throw new Error(`mismatch at case ${i}`);
  });

  const sweep = pairedMs(
    () => potential(cell, species, rows, 25, null),
    () => handLoop(rows, e0),
    21,
  );
  const typed = pairedMs(
    () => potential(cell, species, rows, 25, null),
    () => handLoopTyped(rows, e0),
    21,
  );
  const sweepMs = sweep.fMs;
  const handMs = sweep.gMs;
  log(
    `1. sweep of ${CASES} cases × 2 species: ${sweepMs.toFixed(2)} ms; hand loop ${handMs.toFixed(2)} ms (typed-array floor ${typed.gMs.toFixed(2)} ms)`,
  );
  log(
    `   sweep_ratio ${sweep.ratio.toFixed(2)}× (target ≤ 3×, goal 1.5×); vs typed-array floor ${typed.ratio.toFixed(2)}×`,
  );

  const one = [[0.1, 0.01]];
  const calls = pairedMs(
    () => {
      for (let i = 0; i < CASES; i++) potential(cell, species, one, 25, null);
    },
    () => handLoop(rows, e0),
    11,
  );
  const perCallUs = (calls.fMs * 1000) / CASES;
  const perCaseUs = (calls.gMs * 1000) / CASES;
  log(
    `2. ${CASES} single-case calls: ${perCallUs.toFixed(3)} µs per call; hand loop ${perCaseUs.toFixed(3)} µs per case`,
  );
  log(`   call_ratio ${calls.ratio.toFixed(2)}× (target ≤ 10×)`);

  const parseCellUs = coldParseUs('Zn(s) | Zn2+(aq, 0.1 M) || Cu2+(aq, 0.01 M) | Cu(s)', 200);
  const parseReactionUs = coldParseUs('2 MnO4- + 10 Fe2+ + 16 H+ -> 2 Mn2+ + 10 Fe3+ + 8 H2O', 50);
  log(
    `3. cold parse + resolution: cell diagram ${parseCellUs.toFixed(1)} µs, full reaction ${parseReactionUs.toFixed(1)} µs`,
  );

  const recalc = await recalcRatio();
  if (recalc.ratio === null) log(`4. recalc: skipped (${recalc.note})`);
  else
    log(
      `4. recalc of 10,000 rows: ECHEM ${recalc.echemMs!.toFixed(0)} ms vs plain arithmetic ${recalc.plainMs!.toFixed(0)} ms — recalc_ratio ${recalc.ratio.toFixed(2)}× (target ≤ 1.5×)`,
    );

  const size = bundleSize();
  if (size.kb === null) log('5. bundle: dist/functions.js missing (run npm run build first)');
  else
    log(
      `5. bundle dist/functions.js: ${size.kb.toFixed(1)} KB minified, ${size.gzipKb!.toFixed(1)} KB gzipped (target ≤ 150 KB)`,
    );

  const figures = {
    sweep_ratio: round(sweep.ratio),
    call_ratio: round(calls.ratio),
    parse_cell_us: round(parseCellUs, 1),
    parse_reaction_us: round(parseReactionUs, 1),
    recalc_ratio: round(recalc.ratio),
    bundle_kb: round(size.kb, 1),
    bundle_gzip_kb: round(size.gzipKb, 1),
    sweep_ratio_typed_floor: round(typed.ratio),
  };
  if (json) console.log(JSON.stringify(figures));
}
