/**
 * One thermodynamic foundation: every route to one reaction (full reaction text, cell
 * diagram, the difference of two couples, the species data directly, acid or base form
 * with a pH) gives one E° at 0, 25, 60 and 100 °C; H2/O2 by every form against published
 * values; the ion product of water 0–100 °C against a published table; reactions that are
 * not redox; ΔG at written activities; ΔH, ΔS and the thermoneutral voltage; user tables.
 */
import fc from 'fast-check';
import {
  bindSpecies,
  builtinTable,
  compiledReaction,
  defaultTable,
  describeSource,
  gibbsAtJ,
  isComplete,
  mapToReactionForTest,
  pKw,
  potentialV,
  reactionEnergy,
  reactionEnthalpyKJ,
  reactionEntropyJK,
  reactionGibbsKJ,
  reactionThermo,
  readUserTable,
  resolveReaction,
  standardPotentialV,
  electronCount,
  tableCycleProblems,
  thermoneutralV,
  formationValue,
  type Resolved,
} from './consistencySupport';
import { F, R, engineErrorOf, expectNear } from '../support';

const TEMPS = [0, 25, 60, 100] as const;

/** Least common multiple of two electron counts (whole numbers). */
function lcmOf(a: number, b: number): number {
  const g = (x: number, y: number): number => (y === 0 ? x : g(y, x % y));
  return (a * b) / g(a, b);
}
const T = defaultTable();
const e0 = (text: string, t = 25) => standardPotentialV(resolveReaction(text, T), t);

/** E° of a resolution's own reaction straight from the species data: −ΔrG°(T)/(nF), or null. */
function speciesE0(r: Resolved, t: number): number | null {
  const map = r.kind === 'half' ? r.half.map : r.map;
  const th = reactionThermo([...map.values()].map((v) => ({ species: v.species, nu: Number(v.nu.num) / Number(v.nu.den) })));
  if (!isComplete(th) || (t !== 25 && th.dSJK === null)) return null;
  return -gibbsAtJ(th, t) / (electronCount(r) * F);
}

describe('every route to one reaction gives one E° (property test over the whole built-in table)', () => {
  const rows = builtinTable();
  const rowIndex = fc.integer({ min: 0, max: rows.length - 1 });
  const temp = fc.constantFrom(...TEMPS);

  // Compared as n·E° (ΔG°/F): a reaction in which one element is on both sides (2 Cu+ -> Cu2+ + Cu)
  // splits into halves with different electron counts, and E° = −ΔG°/(nF) follows the n chosen.
  test('a pair of rows: couple difference = full reaction text = species data directly, n·E° within 0.1 mV', () => {
    fc.assert(
      fc.property(rowIndex, rowIndex, temp, (i, j, t) => {
        fc.pre(i !== j);
        const right = resolveReaction(rows[i]!.text, T);
        const left = resolveReaction(rows[j]!.text, T);
        // skip rows whose temperature dependence is unknown away from 25 °C
        fc.pre(t === 25 || (rows[i]!.temperature.basis !== 'none' && rows[j]!.temperature.basis !== 'none'));
        const diff = standardPotentialV(right, t) - standardPotentialV(left, t);
        // the cell reaction written out as text and resolved as a full reaction
        if (right.kind !== 'half' || left.kind !== 'half') throw new Error('rows resolve to half-reactions');
        const text = mapToReactionForTest(right.half, left.half);
        fc.pre(text !== null);
        let full: Resolved | null = null;
        try {
          full = resolveReaction(text!, T);
        } catch {
          full = null; // a reaction the table splits another way or not at all: the species route below still checks it
        }
        const nCell = lcmOf(right.half.n, left.half.n);
        const nFull = full === null ? nCell : electronCount(full);
        const viaFull = full === null ? diff : standardPotentialV(full, t);
        const viaSpecies = full === null ? viaFull : (speciesE0(full, t) ?? viaFull);
        expect(Math.abs(nFull * viaFull - nCell * diff)).toBeLessThanOrEqual(1e-4 * nCell);
        expect(Math.abs(viaSpecies - viaFull)).toBeLessThanOrEqual(1e-4);
      }),
      { numRuns: 300 },
    );
  });

  test.each(TEMPS)('at %d °C every row’s E° equals −ΔrG°/(nF) of its species', (t) => {
    const off = rows
      .filter((r) => t === 25 || r.temperature.basis === 'species')
      .map((r) => {
        const res = resolveReaction(r.text, T);
        const s = speciesE0(res, t);
        return { text: r.text, d: s === null ? 0 : Math.abs(s - standardPotentialV(res, t)) };
      })
      .filter((x) => x.d > 1e-4);
    expect(off).toEqual([]);
  });

  // acid and base forms with a pH column (a(OH-) from Kw(T)): one potential
  const pairs: ReadonlyArray<readonly [string, string, string[], string[]]> = [
    ['O2(g) + 4 H+ + 4 e- -> 2 H2O', 'O2(g) + 2 H2O + 4 e- -> 4 OH-', ['O2', 'pH'], ['O2', 'pH']],
    ['2 H+ + 2 e- -> H2(g)', '2 H2O + 2 e- -> H2(g) + 2 OH-', ['H2', 'pH'], ['H2', 'pH']],
    ['MnO4- + 4 H+ + 3 e- -> MnO2(s) + 2 H2O', 'MnO4- + 2 H2O + 3 e- -> MnO2(s) + 4 OH-', ['MnO4-', 'pH'], ['MnO4-', 'pH']],
  ];
  test.each(pairs)('%s and %s give one potential at any pH and temperature', (acid, base, ha, hb) => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-6, max: 10, noNaN: true }),
        fc.double({ min: -1, max: 15, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        (a, ph, t) => {
          const ea = potentialV(bindSpecies(compiledReaction(acid, null), ha), [a, ph], t);
          const eb = potentialV(bindSpecies(compiledReaction(base, null), hb), [a, ph], t);
          expect(Math.abs(ea - eb)).toBeLessThanOrEqual(1e-4);
        },
      ),
      { numRuns: 100 },
    );
  });

  test('the mercury and lead rows now close their cycles (they contradicted each other by 7.7 and 10.7 mV)', () => {
    for (const t of TEMPS) {
      // Hg2Cl2/Hg − Hg2^2+/Hg = (RT ln10/2F)·log Ksp(Hg2Cl2), from one set of species
      const hg = e0('Hg2Cl2(s) + 2 e- -> 2 Hg(l) + 2 Cl-', t) - e0('Hg2^2+ + 2 e- -> 2 Hg(l)', t);
      const viaReaction = e0('Hg2Cl2(s) -> Hg2^2+ + 2 Cl-', t);
      expect(Math.abs(hg - viaReaction)).toBeLessThanOrEqual(1e-4);
      const pb = e0('PbSO4(s) + 2 e- -> Pb + SO4^2-', t) - e0('Pb2+ + 2 e- -> Pb', t);
      expect(Math.abs(pb - e0('PbSO4(s) -> Pb2+ + SO4^2-', t))).toBeLessThanOrEqual(1e-4);
    }
  });
});

describe('H2/O2 by every form (Larminie & Dicks, Fuel Cell Systems Explained, from memory)', () => {
  /**
   * E° of H2 + ½ O2 -> H2O(l) by hand from NBS 1982 (from memory): ΔfH°(H2O, l) = −285.83
   * kJ/mol, S° H2O(l) 69.91, H2(g) 130.684, O2(g) 205.138 J/(mol·K); Cp° 75.291, 28.824,
   * 29.355 J/(mol·K); Gibbs–Helmholtz with constant ΔCp°.
   */
  function byHand(tC: number): { g: number; e: number } {
    const T0 = 298.15;
    const Tk = tC + 273.15;
    const dH = -285830;
    const dS = 69.91 - 130.684 - 205.138 / 2;
    const dCp = 75.291 - 28.824 - 29.355 / 2;
    const g = dH + dCp * (Tk - T0) - Tk * (dS + dCp * Math.log(Tk / T0));
    return { g, e: -g / (2 * F) };
  }
  const forms = [
    '2 H2 + O2 -> 2 H2O',
    'H2 + 1/2 O2 -> H2O',
    'Pt | H2(g) | H+(aq) || H+(aq) | O2(g) | Pt',
    'Pt | H2(g) | OH-(aq) || OH-(aq) | O2(g) | Pt',
  ];
  test.each([25, 60, 80])('at %d °C all forms and the couple differences agree with the hand derivation', (t) => {
    const expected = byHand(t).e;
    for (const f of forms) expectNear(e0(f, t), expected, 1e-4);
    expectNear(e0('O2/H2O', t) - e0('H+/H2', t), expected, 1e-4);
    expectNear(e0('O2(g) + 2 H2O + 4 e- -> 4 OH-', t) - e0('2 H2O + 2 e- -> H2(g) + 2 OH-', t), expected, 1e-4);
  });

  test('1.229 V at 25 °C (OpenStax Appendix L) and about 1.18 V at 80 °C (ΔG ≈ −228.2 kJ/mol, Larminie & Dicks)', () => {
    expectNear(e0('2 H2 + O2 -> 2 H2O', 25), 1.229, 0.5e-3);
    expectNear(e0('2 H2 + O2 -> 2 H2O', 80), 1.18, 5e-3);
    expectNear(reactionEnergy('H2 + 1/2 O2 -> H2O', 80, null).gibbsKJ, -228.2, 0.5);
    expectNear(reactionEnergy('H2 + 1/2 O2 -> H2O', 80, null).gibbsKJ, byHand(80).g / 1000, 1e-3);
  });
});

describe('ion product of water 0–100 °C', () => {
  // pKw at saturation pressure, Marshall & Franck, J. Phys. Chem. Ref. Data 10, 295 (1981)
  // (from memory; Bandura & Lvov 2006 agree within 0.01). Tolerance 0.05: the species data
  // give ΔrCp° = −223.8 J/(mol·K) at 25 °C held constant, while the real heat capacity of
  // ionisation changes strongly with temperature.
  // prettier-ignore
  const table: ReadonlyArray<readonly [number, number]> = [
    [0, 14.938], [10, 14.533], [20, 14.167], [25, 13.995], [30, 13.836], [40, 13.535],
    [50, 13.262], [60, 13.017], [70, 12.791], [80, 12.598], [90, 12.422], [100, 12.265],
  ];
  test.each(table)('pKw(%d °C) = %d', (t, v) => {
    expectNear(pKw(t), v, 0.05);
    expectNear(-reactionEnergy('H2O -> H+ + OH-', t, null).log10K, pKw(t), 1e-9);
  });

  test('pKw(25 °C) from NBS 1982 ΔfG° by hand: (−157.244 + 237.129) kJ/mol / (RT ln10)', () => {
    expectNear(pKw(25), 79885 / (R * 298.15 * Math.LN10), 1e-9);
  });

  test.each([-1, 101, 150])('outside 0–100 °C (%d °C) is an argument error naming the range', (t) => {
    const e = engineErrorOf(() => pKw(t));
    expect(e.kind).toBe('argument');
    expect(e.message).toContain('0–100 °C');
  });
});

describe('reactions that are not redox', () => {
  test('PbSO4(s) -> Pb2+ + SO4^2-: log Ksp = 2(−0.3505 + 0.1262)/S (OpenStax Appendix L rows)', () => {
    const s25 = (R * 298.15 * Math.LN10) / F;
    expectNear(reactionEnergy('PbSO4(s) -> Pb2+ + SO4^2-', 25, null).log10K, (2 * (-0.3505 + 0.1262)) / s25, 1e-6);
  });

  test('AgCl(s) -> Ag+ + Cl-: Ksp ≈ 1.8e-10 (published, from memory)', () => {
    expectNear(10 ** reactionEnergy('AgCl(s) -> Ag+ + Cl-', 25, null).log10K / 1.8e-10, 1, 0.05);
  });
});

describe('ΔG at the written activities, ΔH, ΔS, thermoneutral voltage, formation data', () => {
  test('GIBBS of a cell with inline activities agrees with POTENTIAL: ΔG = −nFE', () => {
    const text = 'Zn | Zn2+(aq, 0.1 M) || Cu2+(aq, 0.01 M) | Cu';
    const r = resolveReaction(text, T);
    const e = potentialV(bindSpecies(compiledReaction(text, null), []), [], 25);
    expectNear(reactionGibbsKJ(r, 25, { atActivities: true }), (-2 * F * e) / 1000, 1e-9);
    // ΔG° is the standard value: 2F·0.0296 V more negative than ΔG at Q = 10 … E = E° − (S/2)·log10 10
    expectNear(reactionGibbsKJ(r, 25, { atActivities: false }), (-2 * F * standardPotentialV(r, 25)) / 1000, 1e-9);
  });

  test('water: ΔrH° = −285.83 kJ/mol, ΔrS° = −163.343 J/(mol·K) at 25 °C (NBS 1982, from memory)', () => {
    expectNear(reactionEnthalpyKJ('H2 + 1/2 O2 -> H2O', 25, null), -285.83, 0.01);
    expectNear(reactionEntropyJK('H2 + 1/2 O2 -> H2O', 25, null), 69.91 - 130.684 - 205.138 / 2, 1e-9);
  });

  test('thermoneutral voltage of water electrolysis: 285.83/(2F) ≈ 1.481 V at 25 °C; at 80 °C with ΔCp°', () => {
    expectNear(thermoneutralV('H2O -> H2 + 1/2 O2', 25, null), 285830 / (2 * F), 1e-4);
    // ΔrH°(80 °C) = 285.83 − ΔCp°·55 K, ΔCp° = 75.291 − 28.824 − 29.355/2 J/(mol·K) (NBS 1982)
    const dH80 = 285830 - (75.291 - 28.824 - 29.355 / 2) * 55;
    expectNear(thermoneutralV('H2O -> H2 + 1/2 O2', 80, null), dH80 / (2 * F), 1e-4);
  });

  test('FORMATION quantities and sources', () => {
    expect(formationValue('H2O(l)', 'H')).toBe(-285.83);
    expect(formationValue('Cl-', 'Cp')).toBe(-136.4);
    expect(String(formationValue('Cu2+', 'source'))).toContain('Wagman');
    expect(String(formationValue('Fe2+', 'source'))).toContain('-0.447 V');
    expect(engineErrorOf(() => formationValue('Fe2+', 'Cp')).kind).toBe('notFound');
  });
});

describe('user tables', () => {
  test('a couple derived from the user’s own rows beats the built-in row of the same couple', () => {
    // CRC Handbook, 54th ed., p. D-120 (seen): Fe3+/Fe2+ 0.770, Fe2+/Fe −0.409
    const t = readUserTable([
      ['Fe3+ + e- -> Fe2+', 0.77],
      ['Fe2+ + 2 e- -> Fe', -0.409],
    ]);
    const r = resolveReaction('Fe3+/Fe', t);
    expectNear(standardPotentialV(r, 25), (0.77 - 2 * 0.409) / 3, 1e-12);
    expect(describeSource(r)).not.toContain('built-in');
  });

  test('a user row without dE°/dT takes its temperature dependence from the species data, and SOURCE says so', () => {
    const t = readUserTable([['Cu2+ + 2 e- -> Cu', 0.3419, null, 'CRC Handbook, 92nd ed.']]);
    const r = resolveReaction('Cu2+/Cu', t);
    expectNear(standardPotentialV(r, 60) - 0.3419, e0('Cu2+/Cu', 60) - e0('Cu2+/Cu', 25), 1e-12);
    expect(describeSource(r)).toContain('Gibbs–Helmholtz from the species data');
  });

  test('CHECKTABLE’s cycles: a third row off by more than 2 mV from the two it follows from is reported', () => {
    const bad = readUserTable([
      ['Fe3+ + e- -> Fe2+', 0.771],
      ['Fe2+ + 2 e- -> Fe', -0.447],
      ['Fe3+ + 3 e- -> Fe', -0.037], // CRC92 (from memory); OSX gives (0.771 − 0.894)/3 = −0.041
    ]);
    const p = tableCycleProblems(bad);
    expect(p).toHaveLength(1);
    expect(p[0]!.row).toBe(3);
    expect(p[0]!.message).toContain('rows 1 and 2');
    const good = readUserTable([
      ['Fe3+ + e- -> Fe2+', 0.771],
      ['Fe2+ + 2 e- -> Fe', -0.447],
      ['Fe3+ + 3 e- -> Fe', -0.041],
    ]);
    expect(tableCycleProblems(good)).toEqual([]);
  });

  test('CHECKTABLE’s cycles: acid and base forms must differ by the water ionisation', () => {
    const t = readUserTable([
      ['O2 + 4 H+ + 4 e- -> 2 H2O', 1.229], // OSX App. L (seen)
      ['O2 + 2 H2O + 4 e- -> 4 OH-', 0.42], // 19 mV off the 0.401 OSX prints
    ]);
    expect(tableCycleProblems(t).map((x) => x.row)).toEqual([2]);
  });
});

