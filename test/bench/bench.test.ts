/**
 * The benchmark harness in its tiny mode: it runs every benchmark (Excel-shaped calls, the
 * spill, diagrams with inline activities, the first call in a fresh process, the runner's
 * eval, the recalculations in process and end to end, LibreOffice where installed) at a few
 * cases, and its JSON carries every key with a {min, median, runs} figure and the count of
 * outputs checked against the hand-written computation. No timing is asserted: the figures
 * are figures, not tests.
 */
import * as fs from 'fs';
import { runBench } from '../../bench/run';
import { FUNCTIONS_BUNDLE } from '../../bench/excelProcess';
import { BuiltinE0Check, handPotential } from '../../bench/excelBench';
import { COPPER, ZINC, daniellEmfV, daniellTableRange } from '../../bench/reference';
import { hasLibreOffice } from '../../bench/recalcBench';
import { CheckFailure, expectClose } from '../../bench/stats';
import { S25 } from '../engine/support';

jest.setTimeout(600_000);

describe('the independent reference of the benchmarks', () => {
  it('gives the Daniell cell E° from the published potentials', () => {
    // OpenStax Chemistry 2e, Appendix L: E°(Cu2+/Cu) = +0.34 V, E°(Zn2+/Zn) = −0.7618 V, so E°cell = 1.1018 V
    expect(daniellEmfV(0.1, 0.1, 25)).toBeCloseTo(1.1018, 12);
  });

  it('moves by half the Nernst slope per decade of a(Zn2+)/a(Cu2+) (n = 2)', () => {
    // RT ln10/F at 25 °C = 59.15935 mV (derived from the SI exact constants)
    expect(daniellEmfV(1, 0.1, 25) - daniellEmfV(0.1, 0.1, 25)).toBeCloseTo(-0.05915935 / 2, 8);
    expect(daniellEmfV(1, 0.1, 25) - daniellEmfV(0.1, 0.1, 25)).toBeCloseTo(-S25 / 2, 14);
  });

  it('shifts E° by the difference of the dE°/dT of the two couples', () => {
    // Bratsch 1989 (from memory): +0.011 and +0.119 mV/K, so E°cell changes by −0.108 mV/K
    expect(daniellEmfV(0.1, 0.1, 35) - (0.34 + 0.7618)).toBeCloseTo(-0.00108, 12);
  });

  it('agrees with the hand-written custom function of the baseline', () => {
    const got = handPotential([['x']], [['Zn2+', 'Cu2+']], [[0.0123, 0.1]], [[40]], daniellTableRange());
    expect(got[0]![0]).toBeCloseTo(daniellEmfV(0.0123, 0.1, 40), 12);
  });

  it('holds the typed-in potentials of its table', () => {
    expect(daniellTableRange()).toEqual([
      ['half-reaction', 'E° (V)', 'dE°/dT (mV/K)', 'source'],
      [ZINC.halfReaction, -0.7618, 0.119, ZINC.source],
      [COPPER.halfReaction, 0.34, 0.011, COPPER.source],
    ]);
  });
});

describe('the checks of the benchmarks fail on a wrong output', () => {
  it('rejects a number off by more than the tolerance, a non-number and a non-finite number', () => {
    expect(() => expectClose('t', 0, 1.1018 + 1e-9, 1.1018, 1e-12)).toThrow(CheckFailure);
    expect(() => expectClose('t', 0, '#VALUE!', 1.1018, 1e-12)).toThrow(CheckFailure);
    expect(() => expectClose('t', 0, NaN, NaN, 1e-12)).toThrow(CheckFailure);
    expect(() => expectClose('t', 0, 1.1018, 1.1018, 1e-12)).not.toThrow();
  });

  it('rejects built-in results whose Nernst term is wrong or whose E° is far from the published one', () => {
    const ok = new BuiltinE0Check('t');
    ok.check(0, daniellEmfV(0.01, 0.1, 25), 0.01, 0.1);
    expect(() => ok.check(1, daniellEmfV(0.02, 0.1, 25) + 1e-6, 0.02, 0.1)).toThrow(CheckFailure);
    const far = new BuiltinE0Check('t');
    expect(() => far.check(0, daniellEmfV(0.01, 0.1, 25) + 0.05, 0.01, 0.1)).toThrow(CheckFailure);
  });
});

interface Figure {
  min: number;
  median: number;
  runs: number;
}

/**
 * A figure {min, median, runs} of positive finite numbers; for a time, min ≤ median. (A ratio
 * of a pair is min ÷ min and median ÷ median, which need not be ordered.)
 */
function expectFigure(v: unknown, runs: number, kind: 'time' | 'ratio' = 'time'): void {
  expect(v).toEqual({ min: expect.any(Number), median: expect.any(Number), runs });
  const f = v as Figure;
  expect(Number.isFinite(f.min) && Number.isFinite(f.median)).toBe(true);
  expect(f.min).toBeGreaterThan(0);
  expect(f.median).toBeGreaterThan(0);
  expect(kind === 'ratio' || f.min <= f.median).toBe(true);
}

describe('npm run bench -- --tiny --full', () => {
  let figures: Record<string, unknown>;
  const lines: string[] = [];

  beforeAll(async () => {
    figures = await runBench({ tiny: true, full: true, log: (s) => lines.push(s) });
  });

  it('gives every headline figure as min, median and runs', () => {
    for (const key of ['call_ratio_excel', 'sweep_ratio_floor']) expectFigure(figures[key], 2, 'ratio');
    expectFigure(figures.diagram_inline_us, 2);
    expectFigure(figures.first_call_ms, 1);
    expectFigure(figures.recalc_100k_s, 1);
    expect(figures.recalc_100k_rows).toBe(100);
    expectFigure(figures.recalc_100k_split_s, 1);
    expect(figures.recalc_100k_split_sheets).toBe(4);
    expect('recalc_100k_error' in figures).toBe(false);
    for (const key of ['call_ratio_excel_table', 'sweep_ratio', 'recalc_ratio', 'recalc_eval_ratio'])
      expectFigure(figures[key], 2, 'ratio');
    expectFigure(figures.cli_eval_ms, 1);
    expectFigure(figures.pitzer_100k_ms, 2);
    expectFigure(figures.eph_map_ms, 2);
    expect(figures.pitzer_cases).toBe(100);
    expect(figures.eph_map_side).toBe(10);
  });

  it('reports peak memory of the end-to-end runs where GNU time is installed', () => {
    const expected = fs.existsSync('/usr/bin/time');
    const rss = figures.recalc_100k_peak_rss_mib as Figure | null;
    expect(rss === null ? 'not measured' : rss.median > 0 && rss.min <= rss.median).toBe(
      expected ? true : 'not measured',
    );
  });

  it('compares with LibreOffice exactly when it is installed', () => {
    expect('recalc_vs_libreoffice' in figures).toBe(hasLibreOffice());
    expect('recalc_100k_libreoffice_s' in figures).toBe(hasLibreOffice());
    expect(figures.recalc_vs_libreoffice_layout).toBe(hasLibreOffice() ? 'one sheet of 100 rows' : undefined);
  });

  it('checked every timed output against the hand-written computation', () => {
    expect(figures.checks_passed).toBe(true);
    const counts = figures.outputs_checked as Record<string, number>;
    // 100 calls × (2 warm-up + 2 timed runs) × 2 contenders (ECHEM and the hand-written function)
    expect(counts.call_excel).toBe(800);
    expect(counts.call_excel_table).toBe(800);
    // 100 cases × 4 runs × (spill in two pairs + hand loop + Float64Array loop in two pairs)
    expect(counts.sweep).toBe(2000);
    // 100 molalities × (2 warm-up + 2 timed runs), checked against the Pitzer equation written out
    expect(counts.pitzer).toBe(400);
    // (10 × 10 map + 5 Atlas points) × 4 runs
    expect(counts.eph_map).toBe(420);
    // the engine kernel alone, 100 cases × 4 runs
    expect(counts.sweep_kernel).toBe(400);
    // 20 calls × 4 runs, each variant
    expect(counts.diagram_inline).toBe(80);
    expect(counts.diagram_inline_table).toBe(80);
    // two results per fresh process
    expect(counts.first_call).toBe(2);
    expect(counts.cli_eval).toBe(1);
    // 100 rows × (1 warm-up + 2 runs) × 2 workbooks
    expect(counts['recalc in process']).toBe(600);
    expect(counts['recalc engine split']).toBe(600);
    expect(counts['recalc ECHEM vs plain']).toBe(100);
    // the first end-to-end output of each workbook, then ECHEM against plain, in two layouts
    // (one sheet, and the same cases over 4 sheets)
    expect(counts['potentia recalc']).toBe(400);
    expect(counts['potentia recalc ECHEM vs plain']).toBe(200);
    expect(counts['LibreOffice recalc']).toBe(hasLibreOffice() ? 200 : undefined);
    expect(lines[lines.length - 1]).toMatch(/outputs checked .* all passed/);
  });

  it('finds the ECHEM and the plain workbooks equal cell by cell', () => {
    expect(typeof figures.recalc_max_difference_v).toBe('number');
    expect(figures.recalc_max_difference_v as number).toBeLessThanOrEqual(1e-9);
  });

  it('measures call, sweep and diagram on the bundle in a process of its own where there is a build', () => {
    const built = fs.existsSync(FUNCTIONS_BUNDLE);
    expect(figures.excel_bench_source).toBe(built ? 'dist' : 'ts-node');
    expect(lines).toContain(
      built
        ? 'call, sweep, diagram: a fresh Node process loading dist/functions.js (as Excel loads it)'
        : 'call, sweep, diagram: in this process, on the TypeScript sources through ts-node',
    );
    expectFigure(figures.sweep_floor_pair_ns_per_case, 2);
    const faults = figures.sweep_page_faults_per_run as Record<string, unknown>;
    expect(Object.keys(faults).sort()).toEqual(['floor', 'rows_loop', 'spill_floor_pair', 'spill_rows_pair']);
    for (const f of Object.values(faults)) {
      expect(f).toEqual({ min: expect.any(Number), median: expect.any(Number), runs: 2 });
      const { min, median } = f as Figure;
      expect(Number.isInteger(min) && min >= 0 && min <= median).toBe(true);
    }
  });
});

describe('npm run bench -- --tiny --in-process --only=sweep', () => {
  it('measures the spill in the benchmark process on the sources, every output checked', async () => {
    const figures = await runBench({ tiny: true, inProcess: true, only: ['sweep'], log: () => undefined });
    expect(figures.excel_bench_source).toBe('ts-node');
    expectFigure(figures.sweep_ratio_floor, 2, 'ratio');
    expect(figures.checks_passed).toBe(true);
  });
});
