/**
 * Reference-electrode scales: the built-in values against their publications, conversions,
 * RHE, temperature, name matching and errors.
 */
import {
  convertPotentialV,
  findReference,
  listReferences,
  normaliseReferenceName,
  referencePotentialV,
  referenceTemperatureNote,
  batesBowerE0V,
  silverChlorideSeawaterV,
} from '../../src/engine/references';
import { nernstSlopeV } from '../../src/engine/constants';
import { EngineError } from '../../src/engine/errors';
import { BATES_BOWER_AGCL_E0_V, engineErrorOf } from '../support';

/** Runs `f` and returns the EngineError it throws (fails the test otherwise). */
describe('built-in reference potentials at 25 °C', () => {
  // prettier-ignore
  const published: [string, number, string][] = [
    ['SHE', 0, 'IUPAC Gold Book, standard hydrogen electrode: 0 by definition'],
    ['SCE', 0.2412, 'Bard & Faulkner (from memory); Int. J. Corrosion 2010, art. 756950, Table 2 (seen) prints 0.2410'],
    ['calomel-1M-KCl', 0.2801, 'Int. J. Corrosion 2010, art. 756950, Table 2 (seen)'],
    ['calomel-0.1M-KCl', 0.3337, 'Int. J. Corrosion 2010, art. 756950, Table 2 (seen)'],
    ['SSCE', 0.236, 'Int. J. Corrosion 2010, art. 756950, Table 2 (seen)'],
    ['Ag/AgCl-sat-KCl', 0.197, 'Int. J. Corrosion 2010, art. 756950, Table 2 (seen)'],
    ['Ag/AgCl-3.5M-KCl', 0.205, 'Int. J. Corrosion 2010, art. 756950, Table 2 (seen)'],
    ['Ag/AgCl-3M-KCl', 0.21, 'Int. J. Corrosion 2010, art. 756950, Table 2 (seen)'],
    ['Ag/AgCl-1M-KCl', 0.236, 'Int. J. Corrosion 2010, art. 756950, Table 2 (seen)'],
    ['Ag/AgCl-0.1M-KCl', 0.2895, 'Int. J. Corrosion 2010, art. 756950, Table 2 (seen)'],
    ['CSE', 0.316, 'Int. J. Corrosion 2010, art. 756950, Table 2 (seen)'],
    ['Hg/Hg2SO4-1M-H2SO4', 0.6739, 'Int. J. Corrosion 2010, art. 756950, Table 2 (seen)'],
    ['Hg/Hg2SO4-sat-K2SO4', 0.64, 'from memory: printed values 0.64–0.65, 0.640 used'],
    ['Hg/HgO-0.1M-NaOH', 0.165, 'Int. J. Corrosion 2010, art. 756950, Table 2 (seen)'],
    ['Hg/HgO-1M-NaOH', 0.14, 'Bard & Faulkner (from memory)'],
    ['Ag/AgCl-seawater', 0.2473, 'Bates & Bower E° with a(Cl-) of standard seawater (from memory); about +0.25 V (common practice)'],
    ['Zn-seawater', -0.7827, 'Ag/AgCl seawater − 1.030 V (DNV-RP-B401, from memory)'],
  ];

  it.each(published)('%s = %d V vs SHE (%s)', (id, value) => {
    const ref = findReference(id);
    expect(ref.id).toBe(id);
    expect(referencePotentialV(ref, 25, null)).toBe(value);
    expect(convertPotentialV(0, id, 'SHE')).toBeCloseTo(value, 12);
  });

  it('covers every built-in electrode except the pH-dependent RHE', () => {
    const ids = listReferences()
      .filter((r) => !r.needsPH)
      .map((r) => r.id)
      .sort();
    expect(ids).toEqual(published.map((p) => p[0]).sort());
  });

  it('marks every recalled value "from memory" in its source', () => {
    // From memory: Hg/Hg2SO4 sat. K2SO4, Hg/HgO 1 M NaOH, SCE and Ag/AgCl sat. dE/dT
    for (const id of ['Hg/Hg2SO4-sat-K2SO4', 'Hg/HgO-1M-NaOH', 'SCE', 'Ag/AgCl-sat-KCl']) {
      expect(findReference(id).source).toMatch(/from memory/);
    }
    for (const r of listReferences()) expect(r.source.length).toBeGreaterThan(10);
  });
});

describe('conversions between scales', () => {
  it.each([
    // [potential, from, to, expected, source]
    [0, 'SCE', 'SHE', 0.2412, 'SCE value, Bard & Faulkner (from memory)'],
    [0.5, 'SHE', 'SCE', 0.2588, 'SCE value, Bard & Faulkner (from memory)'],
    [0.2412, 'SHE', 'SCE', 0, 'SCE value, Bard & Faulkner (from memory)'],
    // NACE SP0169 −850 mV vs CSE criterion (common practice): −0.850 + 0.316 − 0.197
    [-0.85, 'CSE', 'Ag/AgCl sat KCl', -0.731, 'Int. J. Corrosion 2010, art. 756950, Table 2 (seen)'],
    [-0.731, 'Ag/AgCl sat KCl', 'CSE', -0.85, 'Int. J. Corrosion 2010, art. 756950, Table 2 (seen)'],
    // −0.850 + 0.316 − 0.2412
    [-0.85, 'CSE', 'SCE', -0.7752, 'IJC Table 2 (seen) and Bard & Faulkner (from memory)'],
    // Ag/AgCl 3 M KCl → SCE: 0.1 + 0.210 − 0.2412
    [0.1, 'Ag/AgCl 3M KCl', 'SCE', 0.0688, 'IJC Table 2 (seen) and Bard & Faulkner (from memory)'],
  ] as [number, string, string, number, string][])('%d V vs %s = %d V vs %s', (e, from, to, expected) => {
    expect(convertPotentialV(e, from, to)).toBeCloseTo(expected, 12);
  });

  it('composes (A→B→C = A→C) and inverts (A→B→A = identity) for every pair', () => {
    const e = -0.4321;
    for (const temp of [25, 35]) {
      // at 35 °C only the electrodes with a known temperature dependence (the others are an error there)
      const ids = listReferences()
        .filter((r) => temp === 25 || r.model.kind !== 'unknown')
        .map((r) => r.id);
      for (const a of ids) {
        for (const b of ids) {
          const ab = convertPotentialV(e, a, b, temp, 3.2);
          expect(convertPotentialV(ab, b, a, temp, 3.2)).toBeCloseTo(e, 12);
          for (const c of ids) {
            expect(convertPotentialV(ab, b, c, temp, 3.2)).toBeCloseTo(
              convertPotentialV(e, a, c, temp, 3.2),
              12,
            );
          }
        }
      }
    }
  });

  it('returns the potential unchanged on the same scale', () => {
    expect(convertPotentialV(0.123456789, 'SCE', 'saturated calomel')).toBe(0.123456789);
    expect(convertPotentialV(0.3, 'RHE', 'RHE')).toBe(0.3); // no pH needed for RHE→RHE
  });
});

describe('reversible hydrogen electrode', () => {
  // Definition E(SHE) = E(RHE) − (RT ln10/F)·pH; slopes derived from the exact constants:
  // 25 °C 0.05915935 V, 60 °C 0.06610410 V (R·333.15 K·ln10/F)
  it.each([
    [25, 7, -0.41411545, 'derived from the exact constants'],
    [25, 0, 0, 'definition'],
    [25, 14, -0.8282309, 'derived from the exact constants'],
    [60, 7, -0.4627287, 'derived from the exact constants'],
  ] as [number, number, number, string][])('0 V vs RHE at %d °C, pH %d = %d V vs SHE', (t, pH, expected) => {
    expect(convertPotentialV(0, 'RHE', 'SHE', t, pH)).toBeCloseTo(expected, 7);
  });

  it('uses the temperature actually given in the slope (derived from the exact constants)', () => {
    expect(referencePotentialV(findReference('RHE'), 60, 7)).toBeCloseTo(-7 * nernstSlopeV(60), 14);
    expect(referenceTemperatureNote(findReference('RHE'), 60)).toBeNull();
  });

  it('converts RHE to SCE at pH 7 (derived: −0.41412 − 0.2412)', () => {
    expect(convertPotentialV(0, 'RHE', 'SCE', 25, 7)).toBeCloseTo(-0.65531545, 7);
  });

  it('needs pH, naming the argument', () => {
    const err = engineErrorOf(() => convertPotentialV(0, 'RHE', 'SHE', 25));
    expect(err.kind).toBe('argument');
    expect(err.argument).toBe('pH');
    expect(err.message).toMatch(/pH is required/);
  });
});

describe('temperature', () => {
  // SCE fit (from memory, Bard & Faulkner App. C): E = 0.2412 − 6.61e-4·x − 1.75e-6·x² − 9.0e-10·x³, x = t − 25
  const sceByHand = (t: number) => {
    const x = t - 25;
    return 0.2412 - 6.61e-4 * x - 1.75e-6 * x * x - 9.0e-10 * x * x * x;
  };

  it.each([[0], [10], [35], [50], [60]])('SCE at %d °C follows the published fit (from memory)', (t) => {
    expect(referencePotentialV(findReference('SCE'), t, null)).toBeCloseTo(sceByHand(t), 12);
    expect(convertPotentialV(0, 'SCE', 'SHE', t)).toBeCloseTo(sceByHand(t), 12);
  });

  it('SCE at 50 °C: the fit lies 1.1 mV below the straight −0.66 mV/K line (curvature)', () => {
    const linear = 0.2412 - 0.66e-3 * 25;
    expect((linear - referencePotentialV(findReference('SCE'), 50, null)) * 1000).toBeCloseTo(1.1, 1);
  });

  it('SCE about −0.66 mV/K near 25 °C (Bard & Faulkner, from memory)', () => {
    expect(findReference('SCE').tempCoeffMvPerK).toBeCloseTo(-0.66, 2);
  });

  // Bates & Bower, J. Res. NBS 53, 283 (1954), E°(AgCl/Ag), seen
  it.each(BATES_BOWER_AGCL_E0_V)('the Bates & Bower fit of E°(AgCl/Ag) at %d °C is within 0.5 mV of their table (%d V)', (t, bb) => {
    expect(Math.abs(batesBowerE0V(t) - bb)).toBeLessThanOrEqual(0.5e-3);
  });

  it('Ag/AgCl in a KCl filling moves with E°(AgCl/Ag)(t) at constant chloride activity (derived)', () => {
    // 3 M KCl, 0.210 V at 25 °C (IJC, seen): log a(Cl-) = (E°25 − 0.210)/S25, held
    const sl = (t: number) => nernstSlopeV(t);
    const logA = (batesBowerE0V(25) - 0.21) / sl(25);
    for (const t of [5, 40, 60])
      expect(referencePotentialV(findReference('Ag/AgCl 3M KCl'), t, null)).toBeCloseTo(batesBowerE0V(t) - sl(t) * logA, 12);
  });

  it('applies the Ag/AgCl sat. KCl coefficient at 15 °C: 0.197 + 1.0·10/1000 (from memory)', () => {
    expect(referencePotentialV(findReference('Ag/AgCl sat KCl'), 15, null)).toBeCloseTo(0.207, 12);
  });

  it('Cu/CuSO4 moves by about +0.9 mV/K (common practice): 18 mV lower at 5 °C', () => {
    expect(referencePotentialV(findReference('CSE'), 5, null)).toBeCloseTo(0.316 - 0.018, 12);
    expect(findReference('CSE').tempCoeffMvPerK).toBe(0.9);
  });

  it('corrects both sides of a conversion: CSE → SCE at 10 °C', () => {
    const e = convertPotentialV(-0.85, 'CSE', 'SCE', 10);
    expect(e).toBeCloseTo(-0.85 + (0.316 - 0.9e-3 * 15) - sceByHand(10), 12);
  });

  it('an electrode without a known coefficient is an error away from 25 °C, naming it', () => {
    for (const id of ['SSCE', 'Hg/Hg2SO4-sat-K2SO4', 'Zn seawater']) {
      const err = engineErrorOf(() => convertPotentialV(0, id, 'SHE', 40));
      expect(err.kind).toBe('argument');
      expect(err.message).toContain('no known temperature coefficient');
      expect(referenceTemperatureNote(findReference(id), 40)).toMatch(/no known temperature coefficient/);
    }
    expect(convertPotentialV(0, 'SSCE', 'SHE', 25)).toBe(0.236);
    expect(referenceTemperatureNote(findReference('SCE'), 40)).toBeNull();
  });

  it('outside a fit’s range is an error naming the range', () => {
    const err = engineErrorOf(() => convertPotentialV(0, 'SCE', 'SHE', 80));
    expect(err.kind).toBe('argument');
    expect(err.message).toContain('0–60 °C');
  });

  it('Ag/AgCl in seawater: about +0.25 V vs SHE at 25 °C, S = 35 (common practice), lower in fresher water', () => {
    expect(referencePotentialV(findReference('Ag/AgCl seawater'), 25, null)).toBeCloseTo(0.25, 2);
    // a(Cl-) = 0.5658·0.67 (from memory): E = E°(BB) − S25·log10 a, derived by hand
    expect(silverChlorideSeawaterV(25, 35)).toBeCloseTo(batesBowerE0V(25) - nernstSlopeV(25) * Math.log10(0.5658 * 0.67), 12);
    expect(silverChlorideSeawaterV(25, 20)).toBeGreaterThan(silverChlorideSeawaterV(25, 35));
    expect(engineErrorOf(() => silverChlorideSeawaterV(25, 60)).argument).toBe('salinity');
  });

  it('Zn seawater is about 1.03 V below Ag/AgCl seawater (DNV-RP-B401, from memory)', () => {
    expect(convertPotentialV(0, 'Zn seawater', 'Ag/AgCl seawater')).toBeCloseTo(-1.03, 3);
    // −0.80 V vs Ag/AgCl seawater (a protection criterion for steel in seawater, common practice) is +0.23 V vs Zn
    expect(convertPotentialV(-0.8, 'Ag/AgCl seawater', 'Zn seawater')).toBeCloseTo(0.23, 3);
  });

  it('keeps SHE at 0 at every temperature (IUPAC Gold Book, by definition)', () => {
    for (const t of [-20, 0, 25, 80, 150]) expect(referencePotentialV(findReference('SHE'), t, null)).toBe(0);
  });

  it.each([[-273.15], [-300], [NaN], [Infinity]])('rejects temp_C = %d', (t) => {
    const err = engineErrorOf(() => convertPotentialV(0, 'SCE', 'SHE', t));
    expect(err.kind).toBe('argument');
    expect(err.argument).toBe('temp_C');
  });
});

describe('names', () => {
  it.each([
    ['sce', 'SCE'],
    ['Saturated Calomel', 'SCE'],
    ['vs. SCE', 'SCE'],
    ['Hg/Hg2Cl2 sat. KCl', 'SCE'],
    ['NCE', 'calomel-1M-KCl'],
    ['calomel 0.1 M KCl', 'calomel-0.1M-KCl'],
    ['ssce', 'SSCE'],
    ['Ag/AgCl sat KCl', 'Ag/AgCl-sat-KCl'],
    ['AgAgCl saturated KCl', 'Ag/AgCl-sat-KCl'],
    ['ag_agcl_3.5m_kcl', 'Ag/AgCl-3.5M-KCl'],
    ['Ag/AgCl (3 M KCl)', 'Ag/AgCl-3M-KCl'],
    ['Ag|AgCl, 3 mol/L KCl', 'Ag/AgCl-3M-KCl'],
    ['AG/AGCL 1M', 'Ag/AgCl-1M-KCl'],
    ['Ag/AgCl KCl 0.1M', 'Ag/AgCl-0.1M-KCl'],
    ['cse', 'CSE'],
    ['Cu/CuSO4', 'CSE'],
    ['cu-cuso4', 'CSE'],
    ['Cu/CuSO₄', 'CSE'],
    ['Copper Sulfate', 'CSE'],
    ['Hg/Hg2SO4 1 M H2SO4', 'Hg/Hg2SO4-1M-H2SO4'],
    ['mercurous sulfate sat K2SO4', 'Hg/Hg2SO4-sat-K2SO4'],
    ['Hg/HgO 0.1 M NaOH', 'Hg/HgO-0.1M-NaOH'],
    ['hg-hgo-1m-naoh', 'Hg/HgO-1M-NaOH'],
    ['rhe', 'RHE'],
    ['Standard Hydrogen Electrode', 'SHE'],
  ])('%s → %s', (name, id) => {
    expect(findReference(name).id).toBe(id);
  });

  it('normalises names', () => {
    expect(normaliseReferenceName('Ag/AgCl (3 M KCl)')).toBe('agagcl3mkcl');
    expect(normaliseReferenceName('Ag/AgCl')).toBe(normaliseReferenceName('agagcl'));
  });

  it('gives every alias of every electrode back that electrode', () => {
    for (const r of listReferences()) {
      expect(findReference(r.id)).toBe(r);
      for (const a of r.aliases) expect(findReference(a)).toBe(r);
    }
  });

  it('lists every known id for an unknown name', () => {
    const err = engineErrorOf(() => convertPotentialV(0, 'Pt wire', 'SHE'));
    expect(err.kind).toBe('notFound');
    expect(err.argument).toBe('from_ref');
    expect(err.message).toMatch(/"Pt wire"/);
    for (const r of listReferences()) expect(err.message).toContain(r.id);
  });

  it('rejects an empty name as a parse error naming the argument', () => {
    const err = engineErrorOf(() => convertPotentialV(0, 'SCE', '  '));
    expect(err.kind).toBe('parse');
    expect(err.argument).toBe('to_ref');
  });

  it.each([
    ['Ag/AgCl', 5],
    ['calomel', 4],
    ['Hg/Hg2SO4', 2],
    ['MSE', 2],
    ['Hg/HgO', 2],
  ])('calls the generic name %s ambiguous and lists its %d fillings', (name, n) => {
    const err = engineErrorOf(() => findReference(name));
    expect(err.kind).toBe('ambiguous');
    expect((err.message.match(/V vs SHE/g) ?? []).length).toBe(n);
  });
});

describe('bad numbers', () => {
  it.each([[NaN], [Infinity], [-Infinity]])('rejects potential = %d', (e) => {
    const err = engineErrorOf(() => convertPotentialV(e, 'SCE', 'SHE'));
    expect(err.kind).toBe('argument');
    expect(err.argument).toBe('potential');
  });

  it('rejects a non-finite pH', () => {
    const err = engineErrorOf(() => convertPotentialV(0, 'RHE', 'SHE', 25, NaN));
    expect(err.kind).toBe('argument');
    expect(err.argument).toBe('pH');
  });

  it('never returns a non-finite number over a grid of inputs', () => {
    const ids = listReferences().map((r) => r.id);
    for (const a of ids)
      for (const b of ids)
        for (const t of [-273, 0, 25, 1000])
          for (const pH of [-2, 7, 16]) {
            // a finite value, or an EngineError that says why (a temperature outside a model's
            // range, or no known coefficient): never NaN; at 25 °C always a value
            let outcome: string;
            try {
              outcome = Number.isFinite(convertPotentialV(1e3, a, b, t, pH)) ? 'finite' : 'not finite';
            } catch (e) {
              outcome = e instanceof EngineError ? (t === 25 ? 'error at 25 °C' : 'finite') : 'thrown';
            }
            expect(outcome).toBe('finite');
          }
  });
});
