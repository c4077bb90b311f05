/**
 * Timing helpers of the benchmarks: runs timed one by one after a full garbage collection,
 * contenders of a pair interleaved run by run (so drifts in machine load fall on both), and
 * every figure given as the minimum and the median of its runs.
 */
import * as v8 from 'v8';
import * as vm from 'vm';

v8.setFlagsFromString('--expose-gc');
const gc = vm.runInNewContext('gc') as (() => void) | undefined;

/** A full collection, so one run's garbage is not charged to the next. */
export function collectGarbage(): void {
  if (typeof gc === 'function') gc();
}

/** Minimum and median of a figure over its runs. */
export interface Stat {
  min: number;
  median: number;
  runs: number;
}

export function median(xs: readonly number[]): number {
  if (xs.length === 0) return NaN;
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 === 1 ? (s[m] as number) : ((s[m - 1] as number) + (s[m] as number)) / 2;
}

export function stat(xs: readonly number[]): Stat {
  return { min: Math.min(...xs), median: median(xs), runs: xs.length };
}

/** Scales a stat (e.g. ms per run → µs per call). */
export function scale(s: Stat, k: number): Stat {
  return { min: s.min * k, median: s.median * k, runs: s.runs };
}

/** Rounds a stat's figures to `digits` decimals, for the JSON line. */
export function rounded(s: Stat, digits = 3): Stat {
  const r = (x: number) => Number(x.toFixed(digits));
  return { min: r(s.min), median: r(s.median), runs: s.runs };
}

/**
 * One contender of a timed pair: `prepare` makes a run's inputs (not timed; fresh arrays each
 * run, as a spreadsheet host makes them), `run` is timed, `check` verifies every output of
 * that run (not timed) and throws on the first wrong one.
 */
export interface Contender<I, O> {
  prepare: () => I;
  run: (input: I) => O;
  check: (input: I, output: O) => void;
}

/**
 * One timed run: its milliseconds and the process's minor page faults during it (memory the
 * run touched first).
 */
function timeOnce<I, O>(c: Contender<I, O>): { ms: number; pageFaults: number } {
  const input = c.prepare();
  collectGarbage();
  const faults0 = process.resourceUsage().minorPageFault;
  const t0 = process.hrtime.bigint();
  const out = c.run(input);
  const ms = Number(process.hrtime.bigint() - t0) / 1e6;
  const pageFaults = process.resourceUsage().minorPageFault - faults0;
  c.check(input, out);
  return { ms, pageFaults };
}

/** Times one contender: `runs` timed runs after `warmup` untimed ones (all checked). */
export function timeRuns<I, O>(c: Contender<I, O>, runs: number, warmup = 2): Stat {
  for (let w = 0; w < warmup; w++) timeOnce(c);
  const ms: number[] = [];
  for (let r = 0; r < runs; r++) ms.push(timeOnce(c).ms);
  return stat(ms);
}

/**
 * A timed pair: each side's milliseconds per run, and the ratio f/g as min(f)/min(g) and
 * median(f)/median(g). (Per-run ratios would be noisier: on a shared machine one descheduled
 * run of the short baseline swings its ratio several-fold; the minimum is each side's cost
 * with the least interference.)
 */
export interface PairStat {
  fMs: Stat;
  gMs: Stat;
  ratio: Stat;
  /**
   * Minor page faults per timed run of each side: pages of memory the run touched for the
   * first time (or again, after the heap gave them back), each one a trip into the kernel.
   */
  fPageFaults: Stat;
  gPageFaults: Stat;
}

/** Times two contenders alternately, run by run, so drifts in machine load fall on both. */
export function timePair<I, O, J, P>(
  f: Contender<I, O>,
  g: Contender<J, P>,
  runs: number,
  warmup = 2,
): PairStat {
  for (let w = 0; w < warmup; w++) {
    timeOnce(f);
    timeOnce(g);
  }
  const fs: number[] = [];
  const gs: number[] = [];
  const fFaults: number[] = [];
  const gFaults: number[] = [];
  for (let r = 0; r < runs; r++) {
    const a = timeOnce(f);
    fs.push(a.ms);
    fFaults.push(a.pageFaults);
    const b = timeOnce(g);
    gs.push(b.ms);
    gFaults.push(b.pageFaults);
  }
  const fMs = stat(fs);
  const gMs = stat(gs);
  return {
    fMs,
    gMs,
    ratio: { min: fMs.min / gMs.min, median: fMs.median / gMs.median, runs },
    fPageFaults: stat(fFaults),
    gPageFaults: stat(gFaults),
  };
}

/** A check that failed: which benchmark, which output, expected and got. */
export class CheckFailure extends Error {
  constructor(bench: string, what: string) {
    super(`${bench}: ${what}`);
    this.name = 'CheckFailure';
  }
}

const checked = new Map<string, number>();

/** Counts outputs that passed their check, by benchmark (reported in the JSON line). */
export function recordChecked(bench: string, n = 1): void {
  checked.set(bench, (checked.get(bench) ?? 0) + n);
}

/** Outputs checked so far, by benchmark (the part of a name before " (" groups variants). */
export function checkedCounts(): Record<string, number> {
  const out: Record<string, number> = {};
  for (const [k, v] of checked) {
    const key = k.split(' (')[0]!;
    out[key] = (out[key] ?? 0) + v;
  }
  return out;
}

/** Throws a CheckFailure unless `got` is a finite number within `tol` of `expected`. */
export function expectClose(bench: string, index: number, got: unknown, expected: number, tol: number): void {
  if (typeof got !== 'number' || !Number.isFinite(got) || !(Math.abs(got - expected) <= tol)) {
    throw new CheckFailure(
      bench,
      `output ${index} is ${typeof got === 'number' ? got : JSON.stringify(got)}, expected ${expected} (±${tol})`,
    );
  }
  recordChecked(bench);
}
