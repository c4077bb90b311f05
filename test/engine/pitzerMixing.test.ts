/**
 * The Pitzer mixture model: seawater, reduction to the single-salt model, the
 * unsymmetrical-mixing function J(x), and the mixture's errors.
 */
import {
  activities,
  pitzerIonActivityCoefficients,
  pitzerMeanActivityCoefficient,
  pitzerMixture,
  pitzerOsmoticCoefficient,
  waterActivity,
} from '../../src/engine';
import { pitzerJ } from '../../src/engine/activity/pitzerMixing';
import { engineErrorOf } from '../support';

// Seawater S = 35, 25 °C, major ions in mol/kg of water: the reference composition of
// Millero, Feistel, Wright & McDougall, Deep-Sea Res. I 55, 50 (2008) (from memory), converted
// from mol/kg of seawater with the salt mass fraction 0.035165; the minor anions (Br-, HCO3-,
// CO3 2-, F-, B(OH)4-) counted as Cl- so that the row is neutral (common practice with the
// six-ion seawater model).
const SW_SPECIES = ['Na+', 'K+', 'Mg2+', 'Ca2+', 'Cl-', 'SO4^2-'];
const SW_MOLALITY = [0.48598, 0.01058, 0.05474, 0.01065, 0.5658 + 0.00314, 0.02926];

describe('seawater, S = 35, 25 °C', () => {
  const r = pitzerMixture(SW_SPECIES, SW_MOLALITY);
  const [gNa, gK, gMg, gCa, gCl, gSO4] = r.gamma as [number, number, number, number, number, number];

  it('ionic strength about 0.72 mol/kg (Millero et al. 2008, from memory: 0.7227 at S = 35)', () => {
    expect(Math.abs(r.ionicStrengthMolKg - 0.7227)).toBeLessThan(0.003);
  });

  it('osmotic coefficient 0.902 (Millero & Leung, Am. J. Sci. 276, 1035 (1976), from memory) within 0.005', () => {
    expect(Math.abs(r.osmoticCoefficient - 0.902)).toBeLessThanOrEqual(0.005);
  });

  it('water activity 0.981 (common practice for S = 35 seawater) within 0.001', () => {
    expect(Math.abs(waterActivity(SW_SPECIES, SW_MOLALITY) - 0.981)).toBeLessThanOrEqual(0.001);
  });

  it('mean γ± of NaCl in seawater 0.668 (Platford & Dafoe, J. Mar. Res. 23, 63 (1965), from memory) within 0.01', () => {
    expect(Math.abs(Math.sqrt(gNa * gCl) - 0.668)).toBeLessThanOrEqual(0.01);
  });

  // Single-ion γ in the Pitzer/HMW convention; Millero & Pierrot, Aquatic Geochem. 4, 153 (1998)
  // (from memory): Na+ 0.665, K+ 0.625, Mg2+ 0.211, Ca2+ 0.203, Cl- 0.666, SO4 2- 0.104. The
  // split between cation and anion is not measurable and the recalled values are uncertain:
  // tolerance ±0.04 for the univalent ions and ±0.03 for the divalent.
  it.each([
    ['Na+', 0, 0.665, 0.04],
    ['K+', 1, 0.625, 0.04],
    ['Mg2+', 2, 0.211, 0.03],
    ['Ca2+', 3, 0.203, 0.03],
    ['Cl-', 4, 0.666, 0.04],
    ['SO4^2-', 5, 0.104, 0.03],
  ] as [string, number, number, number][])(
    'γ(%s) within tolerance of Millero & Pierrot 1998',
    (_ion, i, published, tol) => {
      expect(Math.abs((r.gamma[i] as number) - published)).toBeLessThanOrEqual(tol);
    },
  );

  it('orders the ions as the measurements do: γCl ≈ γNa > γK ≫ γMg > γCa > γSO4', () => {
    expect(gK).toBeLessThan(gNa);
    expect(gMg).toBeLessThan(gK / 2);
    expect(gCa).toBeLessThan(gMg);
    expect(gSO4).toBeLessThan(gCa);
  });

  it('ACTIVITY with model pitzer gives a = γ m for each ion, and passes pH and water through', () => {
    const a = activities([...SW_SPECIES, 'pH', 'H2O'], [...SW_MOLALITY, 8.1, 1], 'pitzer');
    r.gamma.forEach((g, i) => expect(a[i]).toBeCloseTo(g * (SW_MOLALITY[i] as number), 14));
    expect(a[6]).toBe(8.1);
    expect(a[7]).toBe(1);
  });

  it('does not depend on the order of the species', () => {
    const g = pitzerIonActivityCoefficients([...SW_SPECIES].reverse(), [...SW_MOLALITY].reverse());
    expect(g.reverse().map((x) => x.toFixed(12))).toEqual(r.gamma.map((x) => x.toFixed(12)));
  });
});

describe('a mixture of one salt is the single-salt model', () => {
  it.each([
    ['NaCl', ['Na+', 'Cl-'], [1, 1], 2, 1],
    ['NaCl', ['Na+', 'Cl-'], [5, 5], 2, 5],
    ['Na2SO4', ['Na+', 'SO4^2-'], [2, 1], 3, 1],
    ['CaCl2', ['Ca2+', 'Cl-'], [1, 2], 3, 1],
    ['CuSO4', ['Cu2+', 'SO4^2-'], [0.5, 0.5], 2, 0.5],
  ] as [string, string[], number[], number, number][])(
    '%s: γ± = (γ+^ν+ γ−^ν−)^(1/ν), same φ',
    (salt, sp, m, nu, mSalt) => {
      const r = pitzerMixture(sp, m);
      const nuP = (m[0] as number) / mSalt;
      const nuN = (m[1] as number) / mSalt;
      const gpm = Math.pow(Math.pow(r.gamma[0] as number, nuP) * Math.pow(r.gamma[1] as number, nuN), 1 / nu);
      expect(gpm).toBeCloseTo(pitzerMeanActivityCoefficient(salt, mSalt), 12);
      expect(r.osmoticCoefficient).toBeCloseTo(pitzerOsmoticCoefficient(salt, mSalt), 12);
    },
  );

  it('merges a species listed twice', () => {
    const g = pitzerIonActivityCoefficients(['Na+', 'Cl-', 'Na+'], [0.5, 1, 0.5]);
    expect(g[0]).toBeCloseTo(pitzerMeanActivityCoefficient('NaCl', 1), 12);
    expect(g[2]).toBe(g[0]);
  });
});

describe('J(x) of the unsymmetrical-mixing terms (Pitzer 1975)', () => {
  // J(x) = (1/x) ∫0^∞ [1 + q + q²/2 − e^q] y² dy, q = −(x/y) e^−y (Pitzer 1975, definition),
  // integrated here by the midpoint rule; the engine's approximation is good to about 1.5%.
  function jByQuadrature(x: number): number {
    const n = 100000;
    const ymax = 40;
    let s = 0;
    for (let i = 0; i < n; i++) {
      const y = ((i + 0.5) * ymax) / n;
      const q = -(x / y) * Math.exp(-y);
      s += (1 + q + (q * q) / 2 - Math.exp(q)) * y * y;
    }
    return (s * ymax) / n / x;
  }
  it.each([[0.1], [0.5], [1], [2], [5], [10], [50]])('x = %d: within 1.5%% of the integral', (x) => {
    const o = new Float64Array(2);
    pitzerJ(x, o);
    const j = jByQuadrature(x);
    expect(Math.abs((o[0] as number) - j) / j).toBeLessThan(0.015);
    // J' by central difference of the quadrature
    const h = x * 1e-3;
    const dj = (jByQuadrature(x + h) - jByQuadrature(x - h)) / (2 * h);
    expect(Math.abs((o[1] as number) - dj) / dj).toBeLessThan(0.03);
  });
  it('J(0) = 0', () => {
    const o = new Float64Array(2);
    pitzerJ(0, o);
    expect(o[0]).toBe(0);
  });
});

describe('mixture errors', () => {
  it.each([
    [
      'a row that is not neutral',
      () => pitzerMixture(['Na+', 'Cl-'], [1, 0.5]),
      'argument',
      /electrically neutral.*counter-ions/,
    ],
    [
      'a pair without parameters',
      () => pitzerMixture(['Zn2+', 'OH-'], [0.1, 0.2]),
      'argument',
      /Zn2\+ – OH-.*davies/,
    ],
    ['shapes that differ', () => pitzerMixture(['Na+', 'Cl-'], [1]), 'shape', /2 entries/],
    ['a negative molality', () => pitzerMixture(['Na+', 'Cl-'], [-1, -1]), 'argument', /≥ 0 mol\/kg/],
    [
      'seawater at 30 °C (mixing parameters are 25 °C values)',
      () => pitzerMixture(SW_SPECIES, SW_MOLALITY, 30),
      'argument',
      /25 °C only.*extrapolate/,
    ],
    [
      'ionic strength beyond 6 mol/kg',
      () => pitzerMixture(['Na+', 'Mg2+', 'Cl-'], [3, 1.5, 6]),
      'argument',
      /I ≤ 6 mol\/kg/,
    ],
    [
      'a given ionic strength with model pitzer',
      () => activities(['Na+', 'Cl-'], [1, 1], 'pitzer', 1),
      'argument',
      /leave ionic_strength empty/,
    ],
  ] as [string, () => unknown, string, RegExp][])('%s', (_label, f, kind, message) => {
    const err = engineErrorOf(f);
    expect(err.kind).toBe(kind);
    expect(err.message).toMatch(message);
  });

  it('NaCl alone keeps its own temperature range (0–50 °C)', () => {
    expect(pitzerIonActivityCoefficients(['Na+', 'Cl-'], [1, 1], 40)[0]).toBeCloseTo(
      pitzerMeanActivityCoefficient('NaCl', 1, 40),
      12,
    );
  });

  it('extrapolate lets seawater be evaluated at 30 °C with the 25 °C parameters', () => {
    const g = pitzerIonActivityCoefficients(SW_SPECIES, SW_MOLALITY, 30, { extrapolate: true });
    for (const x of g) expect(x > 0 && x < 1).toBe(true);
  });
});
