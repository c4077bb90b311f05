/**
 * PREDOMINANT, EPHCLASS and EPHLINES as worksheet functions: through the catalogue the add-in
 * calls and through the runner's formula evaluation (HyperFormula), with spilled columns of
 * cases, defaults, and errors per case.
 *
 * Expected species: Pourbaix, Atlas of Electrochemical Equilibria (1966), diagrams at 1e-6 and
 * 25 °C (from memory), at points well inside regions. Line values: derived by hand from NBS
 * ΔfG° (Wagman et al. 1982, from memory) and the SI exact constants.
 */
import { callFunction, isCellError } from '../../src/functions/catalogue';
import { evaluateFormulas } from '../../src/cli/evalCommand';
import { F, R } from './helpers';

const s25 = (R * 298.15 * Math.LN10) / F;

describe('PREDOMINANT', () => {
  test('a column of cases spills one species per row (Atlas, iron)', () => {
    const r = callFunction('PREDOMINANT', ['Fe', [[-1], [0.5], [-0.3], [1.2]], [[7], [10], [4], [0.5]]]);
    expect(r).toEqual([['Fe(s)'], ['Fe2O3(s)'], ['Fe2+'], ['Fe3+']]);
  });
  test('activity and temperature per case; defaults 1e-6 and 25 °C', () => {
    // Ag2O has a region at 1e-4 (pH ≈ 10.3–13.7, E between Ag/Ag2O 1.171 − s·pH and
    // Ag2O/AgO ≈ 1.398 − s·pH) but none at 1e-6, where 0.6 V, pH 11.5 is Ag+ (by hand, see the
    // engine test)
    const r = callFunction('PREDOMINANT', ['Ag', 0.6, 11.5, [[1e-4], [1e-6]], 25]);
    expect(r).toEqual([['Ag2O(s)'], ['Ag+']]);
    expect(callFunction('PREDOMINANT', ['Cu', 0, 10])).toEqual([['Cu2O(s)']]);
  });
  test('a bad case gives an error in its own cell; the others compute', () => {
    const r = callFunction('PREDOMINANT', ['Zn', [[-0.5], [-0.5]], [[4], [20]]]);
    expect(r[0]).toEqual(['Zn2+']);
    const e = r[1]?.[0];
    expect(isCellError(e)).toBe(true);
    expect(isCellError(e) && e.code).toBe('#VALUE!');
  });
  test('unknown element: #N/A naming the elements', () => {
    const e = callFunction('PREDOMINANT', ['Unobtainium', 0, 7])[0]?.[0];
    expect(isCellError(e) && e.code).toBe('#N/A');
    expect(isCellError(e) && e.message).toMatch(/give one of Fe, Cu, Zn, Al, Ni, Cr, Pb, Sn, Mg, Ag/);
  });
  test('temperature outside 0–100 °C is #VALUE!', () => {
    const e = callFunction('PREDOMINANT', ['Fe', 0, 7, 1e-6, 150])[0]?.[0];
    expect(isCellError(e) && e.code).toBe('#VALUE!');
  });
});

describe('EPHCLASS', () => {
  test('immunity, corrosion, passivation (Atlas, zinc)', () => {
    const r = callFunction('EPHCLASS', ['Zn', [[-1.5], [-0.5], [0]], [[6], [4], [9.4]]]);
    expect(r).toEqual([['immunity'], ['corrosion'], ['passivation']]);
  });
});

describe('EPHLINES', () => {
  test('a header, the boundaries and the water lines; Zn/Zn2+ by hand', () => {
    const r = callFunction('EPHLINES', ['Zn']);
    expect(r[0]).toEqual(['species A', 'species B', 'pH1', 'E1 (V vs SHE)', 'pH2', 'E2 (V vs SHE)']);
    const zn = r.find((row) => row[0] === 'Zn(s)' && row[1] === 'Zn2+');
    // Zn2+ + 2e- -> Zn: E = E° + (s/2) log a, E° = −0.7618 V (OpenStax Chemistry 2e, Appendix L)
    expect(Math.abs((zn?.[3] as number) - (-0.7618 + (s25 / 2) * -6))).toBeLessThan(1e-9);
    expect(r[r.length - 1]?.slice(0, 2)).toEqual(['O2(g)', 'H2O(l)']);
    for (const row of r.slice(1)) expect(row).toHaveLength(6);
  });
  test('fits the reserved spill for every element over the widest pH range', () => {
    for (const el of ['Fe', 'Cu', 'Zn', 'Al', 'Ni', 'Cr', 'Pb', 'Sn', 'Mg', 'Ag']) {
      const r = callFunction('EPHLINES', [el, 1e-6, 25, -2, 16]);
      expect(isCellError(r[0]?.[0])).toBe(false);
      expect(r.length).toBeLessThanOrEqual(24);
    }
  });
  test('pH_min ≥ pH_max is #VALUE! with the reason', () => {
    const e = callFunction('EPHLINES', ['Fe', 1e-6, 25, 9, 3])[0]?.[0];
    expect(isCellError(e) && e.message).toMatch(/pH_min \(9\) must be below pH_max \(3\)/);
  });
});

describe('in the runner (HyperFormula)', () => {
  test('a 20 × 20 map in one spilled formula, and the lines spill', () => {
    const [map, lines] = evaluateFormulas([
      '=ECHEM.PREDOMINANT("Cu", -1+2*INT((SEQUENCE(400)-1)/20)/19, 14*MOD(SEQUENCE(400)-1,20)/19)',
      '=ECHEM.EPHLINES("Mg")',
    ]);
    expect(Array.isArray(map)).toBe(true);
    const flat = (map as unknown[][]).map((row) => row[0]);
    expect(flat).toHaveLength(400);
    // row 0: E = −1 V, pH 0 → Cu (Atlas); last: E = +1 V, pH 14 → CuO2 2- (Atlas, strongly alkaline)
    expect(flat[0]).toBe('Cu(s)');
    expect(flat[399]).toBe('CuO2 2-');
    expect((lines as unknown[][])[0]?.[0]).toBe('species A');
  });
});
