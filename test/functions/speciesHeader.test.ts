/**
 * One species-header grammar for every function (docs/notation.md, "Species headers"):
 * `left:Ag+`, `l:Ag+`, `LEFT : Ag+` are one header, `pH`, `PH`, `left:pH` are pH columns, in
 * POTENTIAL as in IONICSTR, ACTIVITY and the rest.
 */
import { canonicalSpeciesHeader, splitSpeciesHeader } from '../../src/engine';
import { callFunction } from '../../src/functions/catalogue';
import { S25 } from '../support';

describe('the grammar', () => {
  test.each([
    ['Ag+', null, false, 'Ag+'],
    ['left:Ag+', 'left', false, 'Ag+'],
    ['l:Ag+', 'left', false, 'Ag+'],
    [' LEFT : Ag+ ', 'left', false, 'Ag+'],
    ['r:Cl-', 'right', false, 'Cl-'],
    ['pH', null, true, 'pH'],
    ['PH', null, true, 'pH'],
    ['left:pH', 'left', true, 'pH'],
    ['R : ph', 'right', true, 'pH'],
  ])('%j → side %s, pH %s, body %s', (text, side, isPH, body) => {
    const p = splitSpeciesHeader(text);
    expect([p.side, p.isPH, p.body]).toEqual([side, isPH, body]);
  });

  test('canonical spelling', () => {
    expect(canonicalSpeciesHeader(' r:ph ')).toBe('right:pH');
    expect(canonicalSpeciesHeader('l:Ag+')).toBe('left:Ag+');
  });
});

describe('every function reads headers alike', () => {
  // A silver concentration cell: E = (RT ln10/F)·log10(a_right/a_left), SI 2019 R and F.
  const CELL = 'Ag(s) | Ag+(aq) || Ag+(aq) | Ag(s)';
  test.each([['left:Ag+', 'right:Ag+'], ['l:Ag+', 'r:Ag+'], ['LEFT : Ag+', 'Right:Ag+']])(
    'POTENTIAL takes %s / %s',
    (l, r) => {
      const e = callFunction('POTENTIAL', [CELL, [[l, r]], [[0.01, 0.1]]])[0]![0];
      expect(e as number).toBeCloseTo(S25, 12);
    },
  );

  test('IONICSTR takes l: and left:pH like POTENTIAL does', () => {
    // I = ½ Σ m z²: 0.01 m Na+ and Cl- → 0.01 mol/kg (by hand); a pH column adds nothing
    expect(callFunction('IONICSTR', [[['l:Na+', 'l:Cl-', 'left:pH']], [[0.01, 0.01, 7]]])).toEqual([[0.01]]);
    expect(callFunction('IONICSTR', [[['Na+', 'Cl-', 'PH']], [[0.01, 0.01, 7]]])).toEqual([[0.01]]);
  });

  test('POTENTIAL takes left:pH and pH alike', () => {
    const a = callFunction('POTENTIAL', ['O2(g) + 4 H+ + 4 e- -> 2 H2O', [['O2', 'pH']], [[0.21, 7]]]);
    const b = callFunction('POTENTIAL', ['O2(g) + 4 H+ + 4 e- -> 2 H2O', [['O2', 'PH']], [[0.21, 7]]]);
    expect(b).toEqual(a);
    // 1.229 − S25·(7 − ¼·log10 0.21) (E° from OpenStax Chemistry 2e, Appendix L)
    // E°(O2/H2O) = 2·237.129 kJ/mol / 4F (NBS 1982 ΔfG°(H2O, l), from memory; OpenStax prints 1.229)
    expect(a[0]![0] as number).toBeCloseTo((2 * 237.129e3) / (4 * 96485.33212331001) - S25 * (7 - 0.25 * Math.log10(0.21)), 9);
  });

  test('ACTIVITY passes a side-qualified pH column through', () => {
    const r = callFunction('ACTIVITY', [[['Na+', 'left:pH']], [[0.01, 7]], null, 'limiting']);
    expect(r[0]![1]).toBe(7);
  });
});
