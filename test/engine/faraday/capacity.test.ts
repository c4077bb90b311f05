/**
 * Theoretical specific capacity q = n·F/(3.6·M), mAh/g. Expectations derived from the
 * SI exact F and the CIAAW 2021 abridged atomic weights (from memory); the rounded
 * figures (Li 3861, Zn 820, LiCoO2 274, LiFePO4 170, graphite 372 mAh/g) are the
 * ones printed in battery texts (e.g. Linden's Handbook of Batteries; from memory).
 */
import { specificCapacityMAhG } from '../../../src/engine';
import { F, engineErrorOf } from '../../support';

const M = {
  Li: 6.94,
  Zn: 65.38,
  Co: 58.933,
  Fe: 55.845,
  P: 30.974,
  O: 15.999,
  C: 12.011,
  Pb: 207.2,
  S: 32.06,
};
const q = (n: number, m: number) => (n * F) / (3.6 * m);

describe('CAPACITY of electrode reactions and active materials (derived)', () => {
  test.each([
    ['Li+ + e- -> Li', undefined, q(1, M.Li), 3861],
    ['Li', undefined, q(1, M.Li), 3861], // an element alone: its common valence
    ['Zn2+ + 2 e- -> Zn', undefined, q(2, M.Zn), 820],
    ['Zn2+/Zn', undefined, q(2, M.Zn), 820],
    ['Zn', 2, q(2, M.Zn), 820],
    ['CoO2 + Li+ + e- -> LiCoO2', undefined, q(1, M.Li + M.Co + 2 * M.O), 274],
    ['LiCoO2', 1, q(1, M.Li + M.Co + 2 * M.O), 274],
    ['FePO4 + Li+ + e- -> LiFePO4', 'reduced', q(1, M.Li + M.Fe + M.P + 4 * M.O), 170],
    ['LiFePO4', '1', q(1, M.Li + M.Fe + M.P + 4 * M.O), 170],
    ['C6 + Li+ + e- -> LiC6', 'oxidised', q(1, 6 * M.C), 372], // per C6 host
    ['C6 + Li+ + e- -> LiC6', 'C6', q(1, 6 * M.C), 372],
    ['C6 + Li+ + e- -> LiC6', 'reduced', q(1, 6 * M.C + M.Li), 339], // per LiC6
  ])('%s (basis %p)', (text, basis, expected, rounded) => {
    const got = specificCapacityMAhG(text, basis);
    expect(got).toBeCloseTo(expected, 8);
    expect(Math.abs(got - rounded)).toBeLessThan(1); // the rounded printed figure
  });

  test('lead dioxide per PbO2 on the oxidised side', () => {
    expect(specificCapacityMAhG('PbO2 + SO4^2- + 4 H+ + 2 e- -> PbSO4 + 2 H2O', 'oxidized')).toBeCloseTo(
      q(2, M.Pb + 2 * M.O),
      8,
    );
  });

  test.each([
    ['2 H+ + 2 e- -> H2', undefined, /no solid on its reduced side/],
    ['Li+ + e- -> Li', 'oxidised', /no solid on its oxidised side/],
    ['Li+ + e- -> Li', 'Na', /basis "Na" is not a species/],
    ['Li+ + e- -> Li', 2, /A number of electrons goes with an active material written alone/],
    ['LiCoO2', undefined, /Give the electrons per formula unit/],
    ['LiCoO2', 'reduced', /electrons per formula unit \(a number\)/],
    ['LiCoO2', -1, /basis must be greater than 0/],
    ['Zn + Cu2+ -> Zn2+ + Cu', undefined, /not an electrode reaction.*A whole cell has a specific energy/],
  ])('%s, basis %p is refused', (text, basis, message) => {
    const e = engineErrorOf(() => specificCapacityMAhG(text, basis));
    expect(e.kind).toBe('argument');
    expect(e.message).toMatch(message);
  });

  test.each([[''], ['Lq']])('%p does not parse', (text) => {
    expect(engineErrorOf(() => specificCapacityMAhG(text)).kind).toBe('parse');
  });
});
