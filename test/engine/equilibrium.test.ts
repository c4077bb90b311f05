/**
 * Equilibrium constants, Gibbs energies and chained couples from standard potentials:
 * log10 K = nFE°/(RT ln10), ΔG = −nFE, E°(chain) = Σ nᵢEᵢ / Σ nᵢ; published worked examples,
 * solubility products from two couples, K beyond the float64 range, and bad input.
 */
import {
  EngineError,
  MAX_LOG10_K,
  MIN_LOG10_K,
  checkElectrons,
  combineStepPotentialsV,
  compiledReaction,
  electronCount,
  equilibriumConstantFromLog10,
  gibbsEnergyKJ,
  log10EquilibriumConstant,
  nernstSlopeV,
  standardPotentialV,
} from '../../src/engine';
import { F, s, S25, engineErrorOf, expectNear, rowE0V } from './support';

function e0(text: string, tempC = 25): number {
  return standardPotentialV(compiledReaction(text, null).resolved, tempC);
}

describe('Sn + 2 Cu2+ ⇌ Sn2+ + 2 Cu+ (OpenStax Chemistry 2e, ch. 17, seen)', () => {
  // OSX ch. 17 prints E° = +0.291 V, ΔG° = −56.2 kJ/mol, K = 6.8e9, with 0.0592 V and
  // F = 96 485, from its App. L values 0.153 and −0.1375. The table's Cu2+/Cu+ row comes from
  // NBS 1982 ΔfG° (0.1607 V, from memory), 7.7 mV above OSX's 0.153: the checks against OSX
  // allow for that, the checks of the arithmetic use the rows' E°.
  const text = 'Sn + 2 Cu2+ -> Sn2+ + 2 Cu+';
  const E = rowE0V('Cu2+ + e- -> Cu+') - rowE0V('Sn2+ + 2 e- -> Sn');

  test('E° = E°(Cu2+/Cu+) − E°(Sn2+/Sn) from the table, within 8 mV of the 0.291 OSX ch. 17 prints', () => {
    expectNear(e0(text), E, 1e-12);
    expectNear(e0(text), 0.291, 0.008);
    expect(electronCount(compiledReaction(text, null).resolved)).toBe(2);
  });

  test('ΔG° = −2F·E° = −56.06 kJ/mol (derived); OSX ch. 17 prints −56.2 (seen; rounded E°)', () => {
    const g = gibbsEnergyKJ(e0(text), 2);
    expectNear(g, (-2 * F * E) / 1000, 1e-9);
    // OSX: −2 × 96 485 × 0.291 / 1000 = −56.15 → −56.2; the 7.7 mV of Cu2+/Cu+ move it by 1.5
    expectNear(g, -56.2, 1.6);
  });

  test('K = 10^(2E°/S) ≈ 6.6e9 (derived); OSX ch. 17 prints 6.8e9 (seen; 0.0592 and rounded E°)', () => {
    const logK = log10EquilibriumConstant(e0(text), 2, 25);
    expectNear(logK, (2 * E) / S25, 1e-10);
    const k = equilibriumConstantFromLog10(logK);
    expectNear(k / 10 ** ((2 * E) / S25), 1, 1e-12);
    // OSX's own arithmetic: 10^(2·0.291/0.0592) = 6.78e9, log K 9.83; ours within 0.3 in log K
    expectNear(logK, Math.log10(6.8e9), 0.3);
  });
});

describe('ΔG° = −nFE° (OpenStax Chemistry 2e, ch. 17, seen)', () => {
  // OSX prints one decimal in kJ/mol and uses F = 96 485, so the tolerance is 0.05 kJ/mol.
  test.each([
    [0.0, 2, 0],
    [0.434, 2, -83.7],
    [-2.439, 1, 235.3],
  ])('E° = %d V, n = %d: ΔG° = %d kJ/mol', (e, n, published) => {
    const g = gibbsEnergyKJ(e, n);
    expectNear(g, (-n * F * e) / 1000, 1e-9); // derived from the SI exact constants
    expectNear(g, published, 0.05);
  });

  test('ΔG = −nFE is linear in n and E, and its sign is opposite to E (derived)', () => {
    expectNear(gibbsEnergyKJ(0.5, 4), 4 * gibbsEnergyKJ(0.5, 1), 1e-9);
    expectNear(gibbsEnergyKJ(-0.5, 3), -gibbsEnergyKJ(0.5, 3), 1e-12);
    expect(gibbsEnergyKJ(0.1, 1)).toBeLessThan(0);
    expect(gibbsEnergyKJ(-0.1, 1)).toBeGreaterThan(0);
  });
});

describe('log10 K = nFE°/(RT ln10)', () => {
  test.each([
    [0.291, 2, 25],
    [1.1, 2, 25],
    [-0.57727, 1, 25],
    [0.771, 1, 80],
    [1.232, 6, 0],
    [-3.04, 1, 100],
  ])(
    'E° = %d V, n = %d, %d °C: log K by hand, and E° round-trips (derived from the SI exact constants)',
    (e, n, tC) => {
      const logK = log10EquilibriumConstant(e, n, tC);
      expectNear(logK, (n * e) / s(tC), 1e-9);
      // back to E°: E° = (RT ln10 / nF)·log K
      expectNear(nernstSlopeV(tC, n) * logK, e, 1e-12);
      // and through K itself where K is a float64
      expectNear(Math.log10(equilibriumConstantFromLog10(logK)), logK, 1e-9);
    },
  );

  test('the default temperature is 25 °C (docs/design.md, Conventions)', () => {
    expect(log10EquilibriumConstant(0.5, 2)).toBe(log10EquilibriumConstant(0.5, 2, 25));
  });

  test('log K at 25 °C from the OSX ch. 17 example is 9.821 with the exact slope (derived); OSX prints 9.83 with 0.0592 (seen)', () => {
    expectNear(log10EquilibriumConstant(0.2905, 2), 9.821, 0.0005);
    expectNear(log10EquilibriumConstant(0.2905, 2), 9.83, 0.02);
  });
});

describe('K beyond the float64 range', () => {
  test('F2 + 2 Li → 2 F- + 2 Li+: E° = 5.906 V, log K ≈ 199.66, K ≈ 4.6e199 is finite (OSX App. L, seen; derived)', () => {
    const form = compiledReaction('F2 + 2 Li -> 2 F- + 2 Li+', null);
    // E° = E°(F2/F-) − E°(Li+/Li); OSX App. L prints 2.866 and −3.04 (seen), the F2 row from
    // NBS ΔfG°(F-) = −278.79 kJ/mol (from memory) is 2.8895 V
    const e = rowE0V('F2(g) + 2 e- -> 2 F-') - rowE0V('Li+ + e- -> Li');
    expectNear(standardPotentialV(form.resolved, 25), e, 1e-12);
    expectNear(e, 2.866 + 3.04, 0.025);
    expect(form.n).toBe(2);
    const logK = log10EquilibriumConstant(standardPotentialV(form.resolved, 25), form.n, 25);
    expectNear(logK, (2 * e) / S25, 1e-9);
    expectNear(logK, 200, 0.5); // "K ≈ 10^200" (derived)
    const k = equilibriumConstantFromLog10(logK);
    expect(Number.isFinite(k)).toBe(true);
    expectNear(Math.log10(k), logK, 1e-9);
  });

  test.each([
    [20, 2],
    [-20, 2],
    [10, 4],
    [-12, 3],
  ])('E° = %d V, n = %d: range error whose message gives K in decimal (docs/design.md, Errors: #NUM!)', (e, n) => {
    const logK = (n * e) / S25; // derived from the SI exact constants
    const err = engineErrorOf(() => equilibriumConstantFromLog10(log10EquilibriumConstant(e, n, 25)));
    expect(err.kind).toBe('range');
    // K = m × 10^p with p = floor(log K) and m = 10^(log K − p), written out by hand
    const p = Math.floor(logK);
    const mantissa = (10 ** (logK - p)).toFixed(4);
    expect(err.message).toContain(`${mantissa}e${p >= 0 ? '+' : ''}${p}`);
    expect(err.message).toContain(logK.toFixed(4));
  });

  test('20 V with n = 2: K = 1.3802e+676 (derived: log K = 40/S = 676.14)', () => {
    const err = engineErrorOf(() => equilibriumConstantFromLog10(log10EquilibriumConstant(20, 2)));
    expect(err.message).toContain('1.3802e+676');
  });

  test('the edges of the float64 range (IEEE 754): just inside is returned, beyond is a range error', () => {
    // one ulp below MAX_LOG10_K, 10^x is the largest K that rounds to a float64 (1.79769e308)
    const below = MAX_LOG10_K - MAX_LOG10_K * Number.EPSILON;
    const kMax = equilibriumConstantFromLog10(below);
    expect(Number.isFinite(kMax)).toBe(true);
    expect(kMax).toBeGreaterThan(1.7976e308);
    const kMin = equilibriumConstantFromLog10(MIN_LOG10_K);
    expect(kMin).toBeGreaterThan(2.2e-308);
    expect(kMin).toBeLessThan(2.3e-308);
    expect(engineErrorOf(() => equilibriumConstantFromLog10(MAX_LOG10_K + 1e-6)).kind).toBe('range');
    expect(engineErrorOf(() => equilibriumConstantFromLog10(MIN_LOG10_K - 1e-6)).kind).toBe('range');
    expect(engineErrorOf(() => equilibriumConstantFromLog10(Number.POSITIVE_INFINITY)).kind).toBe('range');
  });

  // Regression (fixed): at log10 K = MAX_LOG10_K exactly (308.25471555991675, reached e.g. from E° =
  // 18.236148509792226 V with n = 1 at 25 °C) the range check passes but Math.pow(10, log10K)
  // rounds up to Infinity; expected a finite K (≤ 1.7976931348623157e308) or a 'range' error.
  test('log K = MAX_LOG10_K gives a finite K or a range error (docs/design.md, Errors: no ±Infinity)', () => {
    let k: number;
    try {
      k = equilibriumConstantFromLog10(MAX_LOG10_K);
    } catch (e) {
      expect(e).toBeInstanceOf(EngineError);
      return;
    }
    expect(Number.isFinite(k)).toBe(true);
  });

  // Regression (fixed): equilibriumConstantFromLog10(NaN) returns NaN (NaN fails both range comparisons, so
  // Math.pow(10, NaN) is returned); expected an EngineError. docs/design.md: no NaN, ever.
  test('log K = NaN is an error, not a NaN K (docs/design.md, Errors)', () => {
    expect(engineErrorOf(() => equilibriumConstantFromLog10(Number.NaN))).toBeInstanceOf(EngineError);
  });
});

describe('solubility products from two couples', () => {
  // AgCl + e- -> Ag + Cl- (0.22233, OSX App. L, seen) minus Ag+ + e- -> Ag (0.7996, OSX App. L,
  // seen): AgCl(s) ⇌ Ag+ + Cl-, n = 1, log Ksp = (0.22233 − 0.7996)/S = −9.758, Ksp = 1.75e-10.
  // AgBr + e- -> Ag + Br- (0.07133, CRC92, seen): log Ksp = (0.07133 − 0.7996)/S, Ksp = 4.9e-13.
  // Published Ksp at 25 °C: AgCl about 1.8e-10, AgBr about 5e-13 (from memory), so ±10 %.
  test.each([
    ['AgCl', 'Ag(s) | Ag+(aq) || Cl-(aq) | AgCl(s) | Ag(s)', 'AgCl/Ag', 0.22234, 1.8e-10],
    ['AgBr', 'Ag | Ag+ || Br- | AgBr | Ag', 'AgBr/Ag', 0.07133, 5e-13],
  ])(
    '%s: the cell %s gives Ksp by hand, near the published value (from memory)',
    (_salt, cell, couple, eSalt, published) => {
      const form = compiledReaction(cell, null);
      const e = standardPotentialV(form.resolved, 25);
      expectNear(e, eSalt - rowE0V('Ag+ + e- -> Ag'), 1e-12);
      // the same E° from the two couples taken one by one
      expectNear(e0(couple) - e0('Ag+/Ag'), e, 1e-12);
      expect(form.n).toBe(1);
      const logKsp = log10EquilibriumConstant(e, form.n, 25);
      expectNear(logKsp, (eSalt - 0.7996) / S25, 1e-10);
      const ksp = equilibriumConstantFromLog10(logKsp);
      expectNear(ksp / 10 ** ((eSalt - 0.7996) / S25), 1, 1e-12);
      expectNear(ksp / published, 1, 0.1);
    },
  );

  test('Ksp(AgCl) = 1.746e-10 with the exact slope (derived from the SI exact constants)', () => {
    const ksp = equilibriumConstantFromLog10(log10EquilibriumConstant(0.22233 - 0.7996, 1));
    expectNear(ksp / 1.746e-10, 1, 5e-4);
  });

  // Regression (fixed): the full reaction "AgCl(s) -> Ag+ + Cl-" is not resolved (notFound: "cannot be split
  // into two half-reactions of the potentials table"), although AgCl + e- -> Ag + Cl- minus
  // Ag+ + e- -> Ag gives it exactly; resolveFull keeps only rows whose every species occurs in
  // the reaction, so a species that cancels between the halves (Ag) rules both rows out.
  // Expected E° = 0.22233 − 0.7996 = −0.57727 V, n = 1 (OSX App. L, seen).
  test.each([
    ['AgCl(s) -> Ag+ + Cl-', 0.22234 - 0.7996], // Bates & Bower; OSX App. L (seen)
    ['AgBr(s) -> Ag+ + Br-', 0.07133 - 0.7996], // CRC92 (seen); OSX App. L (seen)
  ])('the dissolution %s resolves as a full reaction with E° = %d V', (text, expected) => {
    const form = compiledReaction(text, null);
    expect(form.n).toBe(1);
    expectNear(standardPotentialV(form.resolved, 25), expected, 1e-12);
  });
});

describe('combining steps: E° = Σ nᵢEᵢ / Σ nᵢ', () => {
  test('Fe3+/Fe from Fe3+/Fe2+ (0.771, 1) and Fe2+/Fe (−0.447, 2) is −0.041 V (OSX App. L, seen; derived)', () => {
    expectNear(combineStepPotentialsV([0.771, -0.447], [1, 2]), (0.771 - 2 * 0.447) / 3, 1e-15);
    expectNear(combineStepPotentialsV([0.771, -0.447], [1, 2]), -0.041, 1e-12);
    // the order of the steps does not matter
    expectNear(combineStepPotentialsV([-0.447, 0.771], [2, 1]), -0.041, 1e-12);
  });

  test('Cu2+/Cu from Cu2+/Cu+ (0.153) and Cu+/Cu (0.521) is 0.337 V, the tabulated value (OSX App. L, seen)', () => {
    expectNear(combineStepPotentialsV([0.153, 0.521], [1, 1]), 0.337, 1e-12);
    expectNear(combineStepPotentialsV([e0('Cu2+/Cu+'), e0('Cu+/Cu')], [1, 1]), e0('Cu2+/Cu'), 1e-12);
  });

  test('one step gives back its own E°; n·E° adds, E° does not (derived)', () => {
    expect(combineStepPotentialsV([0.7996], [1])).toBe(0.7996);
    // two steps of unequal n: not the plain mean
    expect(combineStepPotentialsV([0.771, -0.447], [1, 2])).not.toBeCloseTo((0.771 - 0.447) / 2, 3);
    // ΔG° adds: −F·Σ nᵢEᵢ = −F·(Σ nᵢ)·E°(chain)
    const chain = combineStepPotentialsV([0.771, -0.447], [1, 2]);
    expectNear(gibbsEnergyKJ(chain, 3), gibbsEnergyKJ(0.771, 1) + gibbsEnergyKJ(-0.447, 2), 1e-9);
  });

  test('bad steps: shape mismatch, empty list, n not a positive whole number (docs/design.md, Errors)', () => {
    expect(engineErrorOf(() => combineStepPotentialsV([0.771, -0.447], [1])).kind).toBe('shape');
    expect(engineErrorOf(() => combineStepPotentialsV([], [])).kind).toBe('argument');
    expect(engineErrorOf(() => combineStepPotentialsV([0.771, -0.447], [1, 0])).kind).toBe('argument');
    expect(engineErrorOf(() => combineStepPotentialsV([0.771, -0.447], [1, 1.5])).kind).toBe('argument');
    expect(engineErrorOf(() => combineStepPotentialsV([0.771, Number.NaN], [1, 2])).kind).toBe('argument');
  });
});

describe('electron counts', () => {
  // n of the balanced half-reaction or cell reaction (OSX App. L rows, seen)
  test.each([
    ['Cr2O7^2-/Cr3+', 6],
    ['MnO4-/Mn2+', 5],
    ['O2/H2O', 4],
    ['Fe3+/Fe2+', 1],
    ['Zn | Zn2+ || Cu2+ | Cu', 2],
    ['Cu + 2 Ag+ -> Cu2+ + 2 Ag', 2],
    ['Al | Al3+ || Cu2+ | Cu', 6],
    ['2 Al + 3 Cu2+ -> 2 Al3+ + 3 Cu', 6],
  ])('%s: n = %d', (text, n) => {
    expect(electronCount(compiledReaction(text, null).resolved)).toBe(n);
    expect(compiledReaction(text, null).n).toBe(n);
  });

  test('checkElectrons returns a valid n unchanged (common practice)', () => {
    expect(checkElectrons(2)).toBe(2);
    expect(checkElectrons(6)).toBe(6);
  });

  test.each([0, -1, 1.5, 0.5, Number.NaN, Number.POSITIVE_INFINITY])(
    'n = %p is an argument error in checkElectrons, log10EquilibriumConstant and gibbsEnergyKJ (common practice: n is a positive whole number)',
    (n) => {
      expect(engineErrorOf(() => checkElectrons(n)).kind).toBe('argument');
      expect(engineErrorOf(() => log10EquilibriumConstant(0.5, n)).kind).toBe('argument');
      expect(engineErrorOf(() => gibbsEnergyKJ(0.5, n)).kind).toBe('argument');
    },
  );
});

describe('bad potentials and temperatures', () => {
  test.each([Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY])(
    'E = %p: argument error from log10EquilibriumConstant and gibbsEnergyKJ (docs/design.md, Errors)',
    (e) => {
      expect(engineErrorOf(() => log10EquilibriumConstant(e, 1)).kind).toBe('argument');
      expect(engineErrorOf(() => gibbsEnergyKJ(e, 1)).kind).toBe('argument');
    },
  );

  test.each([-273.15, -400, Number.NaN])(
    'log10EquilibriumConstant at %p °C: argument error (T > 0 K)',
    (tC) => {
      const err = engineErrorOf(() => log10EquilibriumConstant(0.5, 1, tC));
      expect(err.kind).toBe('argument');
      expect(err.message).toContain('temp_C');
    },
  );

  // Regression (fixed): finite but huge inputs overflow to ±Infinity in the engine: nernstSlopeV(1e308)
  // = Infinity (R·T overflows before the division by F), log10EquilibriumConstant(1e308, 2)
  // = Infinity, gibbsEnergyKJ(1e308, 2) = −Infinity, combineStepPotentialsV([1e308, 1e308],
  // [1, 1]) = Infinity. The worksheet layer turns these into #NUM!, but the engine itself
  // should give a finite number or an EngineError ('range'). docs/design.md: no NaN or ±Infinity.
  test.each([
    ['nernstSlopeV(1e308 °C)', () => nernstSlopeV(1e308)],
    ['log10EquilibriumConstant(1e308 V, 2)', () => log10EquilibriumConstant(1e308, 2)],
    ['gibbsEnergyKJ(1e308 V, 2)', () => gibbsEnergyKJ(1e308, 2)],
    ['combineStepPotentialsV([1e308, 1e308], [1, 1])', () => combineStepPotentialsV([1e308, 1e308], [1, 1])],
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
