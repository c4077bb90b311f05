/**
 * Notation edge cases added after review: Roman-numeral oxidation states are
 * refused rather than misread, and activities written inside a couple are used.
 */
import {
  parseNotation,
  compiledReaction,
  bindSpecies,
  potentialV,
  EngineError,
  nernstSlopeV,
  countElements,
} from '../../src/engine';

describe('Roman numerals are refused, not read as iodine', () => {
  test.each(['Fe(III) + e- -> Fe(II)', 'Cr(VI)/Cr(III)', 'Fe(II)/Fe'])('%s', (text) => {
    let err: unknown;
    try {
      parseNotation(text);
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(EngineError);
    expect((err as EngineError).kind).toBe('parse');
    expect((err as EngineError).message).toMatch(/Roman numerals/);
  });

  test('a real iodine group in brackets still reads', () => {
    // common practice: Pb(IO3)2 has two iodate groups
    const n = parseNotation('Pb(IO3)2 + 2 e- -> Pb + 2 IO3-');
    expect(n.kind).toBe('half');
    // by hand: 1 Pb, 2 I and 6 O on each side
    expect(countElements('Pb(IO3)2')).toEqual(new Map([['Pb', 1], ['I', 2], ['O', 6]]));
  });
});

describe('activities written inside a couple', () => {
  test('Cu2+(aq, 5 mM)/Cu uses a(Cu2+) = 0.005', () => {
    const form = compiledReaction('Cu2+(aq, 5 mM)/Cu', null);
    const e = potentialV(bindSpecies(form, []), [], 25);
    // E° of the built-in Cu2+/Cu row (NBS 1982 ΔfG°(Cu2+) = 65.49 kJ/mol, from memory: 65.49/(2F));
    // Nernst slope derived from the SI exact constants
    const e0 = 65.49e3 / (2 * 96485.33212331001);
    expect(e).toBeCloseTo(e0 + (nernstSlopeV(25) / 2) * Math.log10(0.005), 12);
  });
});
