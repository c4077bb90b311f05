/**
 * Properties of the thermodynamics layer over random input (fast-check): the Nernst equation
 * ties potentialV, log10Quotient and standardPotentialV together; sweeps agree with single
 * cases; concentration cells are antisymmetric and additive; nothing returns NaN or ±Infinity
 * for input in the physical range, and every bad input is an EngineError.
 */
import fc from 'fast-check';
import {
  EngineError,
  bindSpecies,
  compiledReaction,
  concentrationCellEmfV,
  equilibriumConstantFromLog10,
  gibbsEnergyKJ,
  log10EquilibriumConstant,
  log10Quotient,
  planConcentrationCell,
  potentialV,
  standardPotentialV,
  sweepCases,
} from '../../src/engine';
import { F, R } from '../support';

// SI 2019 exact constants, written out here so that expectations are independent of the engine.
/** RT ln10 / F in V (derived from the SI exact constants). */
const s = (tC: number) => (R * (tC + 273.15) * Math.LN10) / F;

/** Reactions of every notation with the species they need (E° from OSX App. L rows, seen). */
const CASES: readonly { text: string; headers: readonly string[] }[] = [
  { text: 'Cu2+/Cu', headers: ['Cu2+'] },
  { text: 'Fe3+/Fe2+', headers: ['Fe3+', 'Fe2+'] },
  { text: 'MnO4-/Mn2+', headers: ['MnO4-', 'Mn2+', 'pH'] },
  { text: 'Cr2O7^2-/Cr3+', headers: ['Cr2O7^2-', 'Cr3+', 'pH'] },
  { text: 'O2/H2O', headers: ['O2', 'pH'] },
  { text: 'Cl2/Cl-', headers: ['Cl2', 'Cl-'] },
  { text: 'Zn | Zn2+ || Cu2+ | Cu', headers: ['Zn2+', 'Cu2+'] },
  { text: 'Co + Fe2+ -> Co2+ + Fe', headers: ['Fe2+', 'Co2+'] },
  { text: 'Pt | H2(g) | HCl | AgCl | Ag', headers: ['H+', 'Cl-', 'H2'] },
  { text: 'Ag | Ag+ || Ag+ | Ag', headers: ['left:Ag+', 'right:Ag+'] },
];

/** An activity or pressure, log-uniform over 1e-12 … 1e3. */
const activity = fc.double({ min: -12, max: 3, noNaN: true }).map((x) => 10 ** x);
const pH = fc.double({ min: -2, max: 16, noNaN: true });
// the species data hold 0–100 °C (aqueous solutions near 1 bar)
const tempC = fc.double({ min: 0, max: 100, noNaN: true });
const caseIndex = fc.integer({ min: 0, max: CASES.length - 1 });

function rowFor(headers: readonly string[], acts: readonly number[], ph: number): number[] {
  return headers.map((h, i) => (h === 'pH' ? ph : acts[i]!));
}

describe('the Nernst equation links the public functions (derived)', () => {
  test('E = E°(T) − (RT ln10 / nF)·log10 Q for random compositions and temperatures', () => {
    fc.assert(
      fc.property(
        caseIndex,
        fc.array(activity, { minLength: 3, maxLength: 3 }),
        pH,
        tempC,
        (k, acts, ph, t) => {
          const c = CASES[k]!;
          const form = compiledReaction(c.text, null);
          const b = bindSpecies(form, c.headers);
          const row = rowFor(c.headers, acts, ph);
          const e = potentialV(b, row, t);
          const logQ = log10Quotient(b, row);
          expect(Number.isFinite(e)).toBe(true);
          expect(Number.isFinite(logQ)).toBe(true);
          const expected = standardPotentialV(form.resolved, t) - (s(t) / form.n) * logQ;
          expect(Math.abs(e - expected)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(expected)));
        },
      ),
    );
  });

  test('a sweep gives the same values as single cases, at one temperature or one per case', () => {
    fc.assert(
      fc.property(
        caseIndex,
        fc.array(fc.tuple(fc.array(activity, { minLength: 3, maxLength: 3 }), pH, tempC), {
          minLength: 1,
          maxLength: 8,
        }),
        (k, cases) => {
          const c = CASES[k]!;
          const b = bindSpecies(compiledReaction(c.text, null), c.headers);
          const rows = cases.map(([acts, ph]) => rowFor(c.headers, acts, ph));
          const temps = cases.map(([, , t]) => t);
          const perCase = sweepCases(b, rows, (i) => temps[i]!, 'potential');
          const at25 = sweepCases(b, rows, 25, 'potential');
          const logQ = sweepCases(b, rows, 25, 'log10Q');
          expect(perCase.errors.size + at25.errors.size + logQ.errors.size).toBe(0);
          rows.forEach((row, i) => {
            const e = potentialV(b, row, temps[i]!);
            expect(Math.abs(perCase.values[i]! - e)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(e)));
            expect(Math.abs(at25.values[i]! - potentialV(b, row, 25))).toBeLessThanOrEqual(1e-12);
            expect(Math.abs(logQ.values[i]! - log10Quotient(b, row))).toBeLessThanOrEqual(1e-12);
          });
        },
      ),
    );
  });

  test('ΔG = −nFE and log K = nFE/(RT ln10) agree: ΔG = −RT ln K (derived)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -10, max: 10, noNaN: true }),
        fc.integer({ min: 1, max: 12 }),
        tempC,
        (e, n, t) => {
          const g = gibbsEnergyKJ(e, n) * 1000; // J/mol
          const lnK = log10EquilibriumConstant(e, n, t) * Math.LN10;
          const rtlnk = R * (t + 273.15) * lnK;
          expect(Math.abs(g + rtlnk)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(g)));
        },
      ),
    );
  });
});

describe('concentration cells (IUPAC sign convention; derived)', () => {
  const couples = fc.constantFrom(
    ['Ag+/Ag', null] as const,
    ['AgCl/Ag', null] as const,
    ['Cu2+/Cu', null] as const,
    ['H+/H2', 'H2'] as const,
    ['H+/H2', 'H+'] as const,
  );

  test('EMF(left, right) = −EMF(right, left), and EMF(a, b) + EMF(b, c) = EMF(a, c)', () => {
    fc.assert(
      fc.property(couples, activity, activity, activity, tempC, ([couple, species], a, b, c, t) => {
        const plan = planConcentrationCell(compiledReaction(couple, null), species);
        const ab = concentrationCellEmfV(plan, a, b, t);
        const ba = concentrationCellEmfV(plan, b, a, t);
        const bc = concentrationCellEmfV(plan, b, c, t);
        const ac = concentrationCellEmfV(plan, a, c, t);
        expect(Math.abs(ab + ba)).toBeLessThanOrEqual(1e-15);
        expect(Math.abs(ab + bc - ac)).toBeLessThanOrEqual(1e-12);
      }),
    );
  });
});

describe('bad values are EngineErrors, never NaN or ±Infinity (docs/design.md, Reliability)', () => {
  /** any double, including NaN, ±Infinity, ±0, subnormals */
  const anyDouble = fc.double();

  test('potentialV with arbitrary numbers: a finite E or an argument error', () => {
    fc.assert(
      fc.property(caseIndex, fc.array(anyDouble, { minLength: 3, maxLength: 3 }), anyDouble, (k, vals, t) => {
        const c = CASES[k]!;
        const b = bindSpecies(compiledReaction(c.text, null), c.headers);
        // pH within ±1e300 (see the overflow case below); activities and pressures unrestricted
        const row = c.headers.map((h, i) => {
          const v = vals[i]!;
          return h === 'pH' && Number.isFinite(v) ? Math.min(Math.max(v, -1e300), 1e300) : v;
        });
        // a physical temperature, so that only the values are under test here
        const tC = Number.isFinite(t) ? Math.min(Math.max(t, -273), 1e4) : t;
        try {
          expect(Number.isFinite(potentialV(b, row, tC))).toBe(true);
        } catch (e) {
          if (!(e instanceof EngineError)) throw e;
          expect(e.kind).toBe('argument');
        }
      }),
    );
  });

  test('concentrationCellEmfV with arbitrary numbers: a finite EMF or an argument error', () => {
    const plan = planConcentrationCell(compiledReaction('Ag+/Ag', null), null);
    fc.assert(
      fc.property(anyDouble, anyDouble, fc.double({ min: -300, max: 1e4 }), (l, r, t) => {
        try {
          expect(Number.isFinite(concentrationCellEmfV(plan, l, r, t))).toBe(true);
        } catch (e) {
          if (!(e instanceof EngineError)) throw e;
          expect(e.kind).toBe('argument');
        }
      }),
    );
  });

  test('K from E° in ±100 V, n 1…20: a finite positive K or a range error', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -100, max: 100, noNaN: true }),
        fc.integer({ min: 1, max: 20 }),
        tempC,
        (e, n, t) => {
          const logK = log10EquilibriumConstant(e, n, t);
          expect(Number.isFinite(logK)).toBe(true);
          try {
            const k = equilibriumConstantFromLog10(logK);
            expect(Number.isFinite(k)).toBe(true);
            expect(k).toBeGreaterThan(0);
          } catch (err) {
            if (!(err instanceof EngineError)) throw err;
            expect(err.kind).toBe('range');
          }
        },
      ),
    );
  });

  test('arbitrary species header text: bound, or a parse/argument error, never another exception', () => {
    const form = compiledReaction('Cu2+/Cu', null);
    fc.assert(
      fc.property(fc.string({ maxLength: 12 }), (h) => {
        try {
          bindSpecies(form, ['Cu2+', h]);
        } catch (e) {
          if (!(e instanceof EngineError)) throw e;
          expect(['parse', 'argument']).toContain(e.kind);
        }
      }),
    );
  });

  // Regression (fixed): finite but absurd magnitudes overflow to ±Infinity inside the engine instead of giving
  // an EngineError: Cr2O7^2-/Cr3+ at pH 1e308 → E = −Infinity (Σ w·log10 a overflows:
  // 14/6 × 1e308); Cu2+/Cu at 1e308 °C → E = −Infinity (R·T overflows in the slope); the same
  // through sweepCases and concentrationCellEmfV. The worksheet layer maps them to #NUM!, but
  // the engine's own contract (docs/design.md: no NaN or ±Infinity) is broken. Expected: a finite
  // number or an EngineError ('argument' or 'range').
  test.each([
    [
      'potentialV(Cr2O7^2-/Cr3+, pH = 1e308)',
      () =>
        potentialV(
          bindSpecies(compiledReaction('Cr2O7^2-/Cr3+', null), ['Cr2O7^2-', 'Cr3+', 'pH']),
          [1, 1, 1e308],
          25,
        ),
    ],
    [
      'potentialV(Cu2+/Cu, a = 1e-300, 1e308 °C)',
      () => potentialV(bindSpecies(compiledReaction('Cu2+/Cu', null), ['Cu2+']), [1e-300], 1e308),
    ],
    [
      'sweepCases(Cu2+/Cu, a = 1e-300, 1e308 °C)',
      () =>
        sweepCases(bindSpecies(compiledReaction('Cu2+/Cu', null), ['Cu2+']), [[1e-300]], 1e308, 'potential')
          .values[0]!,
    ],
    [
      'concentrationCellEmfV(Ag+/Ag, 1e-300 | 1e300, 1e308 °C)',
      () =>
        concentrationCellEmfV(
          planConcentrationCell(compiledReaction('Ag+/Ag', null), null),
          1e-300,
          1e300,
          1e308,
        ),
    ],
  ])('%s gives a finite number or an EngineError', (_label, f) => {
    let x: number;
    try {
      x = f();
    } catch (e) {
      expect(e).toBeInstanceOf(EngineError);
      return;
    }
    expect(Number.isFinite(x)).toBe(true);
  });
});
