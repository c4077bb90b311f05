/**
 * Benchmarks of this round's function families, each one spilled call through the catalogue
 * (the host-independent layer both Excel and the runner call), every output checked:
 *
 * - `pitzer_100k_ms`: MEANACTCOEF("NaCl", m) over a column of molalities 0.001–6 mol/kg. Each
 *   output is checked against the single-salt Pitzer equation written out here (Pitzer 1991,
 *   ch. 3, for a 1:1 salt: ln γ± = f^γ + m B^γ + m² C^γ, b = 1.2, α = 2), fed with the
 *   engine's parameter row and A_φ(25 °C) as data, to 1e-9 relative.
 * - `eph_map_ms`: PREDOMINANT("Fe", E, pH) over an n × n grid of (pH 0–14, E −1.5…+1.5 V).
 *   Every output must be one of the element's species, and five points well inside regions of
 *   Pourbaix's Atlas (1966, from memory; at 1e-6 and 25 °C) must be the Atlas's species.
 */
import { callFunction, type Result } from '../src/functions/catalogue';
import { PITZER_BINARY, pitzerAphi } from '../src/engine';
import { CheckFailure, recordChecked, timeRuns, type Stat } from './stats';

type Cell = number | string | boolean | null;

/** γ± of a 1:1 salt by the Pitzer equation, written out independently of the engine. */
function pitzerOneOneGamma(m: number, beta0: number, beta1: number, cphi: number, aphi: number): number {
  const b = 1.2;
  const alpha = 2;
  const sqrtI = Math.sqrt(m); // I = m for a 1:1 salt
  const f = -aphi * (sqrtI / (1 + b * sqrtI) + (2 / b) * Math.log(1 + b * sqrtI));
  const x = alpha * sqrtI;
  const g = (2 * (1 - (1 + x - (x * x) / 2) * Math.exp(-x))) / (x * x);
  const bGamma = 2 * beta0 + beta1 * g; // 2β0 + (2β1/(α²I))[1 − (1 + α√I − α²I/2) e^(−α√I)]
  const cGamma = 1.5 * cphi;
  return Math.exp(f + m * bGamma + m * m * cGamma);
}

/** Times one spilled MEANACTCOEF over `cases` molalities; every output checked. */
export function benchPitzer(cases: number, runs: number): Stat {
  const row = PITZER_BINARY.find((r) => r.salt === 'NaCl');
  if (!row) throw new CheckFailure('pitzer', 'the engine holds no NaCl parameters');
  const aphi = pitzerAphi(25);
  const molalities = Array.from({ length: cases }, (_, k) => 0.001 + (5.999 * k) / Math.max(1, cases - 1));
  const expected = molalities.map((m) => pitzerOneOneGamma(m, row.beta0, row.beta1, row.cphi, aphi));
  return timeRuns<Cell[][], Result>(
    {
      prepare: () => molalities.map((m) => [m]),
      run: (column) => callFunction('MEANACTCOEF', ['NaCl', column]),
      check: (_in, out) => {
        if (out.length !== cases) throw new CheckFailure('pitzer', `${out.length} rows, expected ${cases}`);
        for (let k = 0; k < cases; k++) {
          const got = out[k]?.[0];
          const want = expected[k]!;
          if (typeof got !== 'number' || !(Math.abs(got - want) <= 1e-9 * want))
            throw new CheckFailure(
              'pitzer',
              `case ${k} (m = ${molalities[k]}): ${String(got)}, expected ${want}`,
            );
        }
        recordChecked('pitzer', cases);
      },
    },
    runs,
  );
}

/** The species PREDOMINANT may name for iron (the engine's set; checked by name). */
const IRON_SPECIES = new Set([
  'Fe(s)',
  'Fe2+',
  'Fe3+',
  'FeOH2+',
  'HFeO2-',
  'Fe(OH)2(s)',
  'Fe(OH)3(s)',
  'Fe3O4(s)',
  'Fe2O3(s)',
]);

/** Points well inside regions of the iron diagram at 1e-6, 25 °C (Pourbaix 1966, from memory). */
const IRON_ATLAS_POINTS: readonly [pH: number, eV: number, species: string][] = [
  [7, -1.0, 'Fe(s)'], // immunity
  [4, -0.3, 'Fe2+'], // corrosion
  [1, 1.2, 'Fe3+'], // corrosion
  [10, 0.0, 'Fe2O3(s)'], // passivation
  [11, -0.6, 'Fe3O4(s)'], // magnetite band
];

/** Times one spilled PREDOMINANT over an n × n (pH, E) map of iron; every output checked. */
export function benchEphMap(n: number, runs: number): Stat {
  const ph: number[] = [];
  const e: number[] = [];
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) {
      ph.push((14 * i) / Math.max(1, n - 1));
      e.push(-1.5 + (3 * j) / Math.max(1, n - 1));
    }
  for (const [p, v] of IRON_ATLAS_POINTS) {
    ph.push(p);
    e.push(v);
  }
  const cases = ph.length;
  return timeRuns<[Cell[][], Cell[][]], Result>(
    {
      prepare: () => [e.map((x) => [x]), ph.map((x) => [x])],
      run: ([eCol, phCol]) => callFunction('PREDOMINANT', ['Fe', eCol, phCol]),
      check: (_in, out) => {
        if (out.length !== cases) throw new CheckFailure('eph_map', `${out.length} rows, expected ${cases}`);
        for (let k = 0; k < cases; k++) {
          const got = out[k]?.[0];
          if (typeof got !== 'string' || !IRON_SPECIES.has(got))
            throw new CheckFailure(
              'eph_map',
              `case ${k} (pH ${ph[k]}, E ${e[k]} V): ${JSON.stringify(got)} is no iron species`,
            );
        }
        IRON_ATLAS_POINTS.forEach(([p, v, want], i) => {
          const got = out[cases - IRON_ATLAS_POINTS.length + i]?.[0];
          if (got !== want)
            throw new CheckFailure('eph_map', `pH ${p}, E ${v} V: ${String(got)}, the Atlas has ${want}`);
        });
        recordChecked('eph_map', cases);
      },
    },
    runs,
  );
}
