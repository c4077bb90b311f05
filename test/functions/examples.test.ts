/**
 * Every example of every function spec gives the value its spec states, which comes from
 * outside the engine (a publication or a derivation by hand from published constants; the
 * spec names the source beside it). These examples are what the docs and the formula bar show.
 */
import { CATALOGUE, callFunction, isCellError } from '../../src/functions/catalogue';

const cases = CATALOGUE.flatMap((e) =>
  e.examples.map((ex, i) => ({ id: e.id, i, ex, label: `${e.id} example ${i + 1}: ${ex.source.slice(0, 60)}` })),
);

describe('spec examples give their independently known results', () => {
  test('every function has at least one example with a named source', () => {
    for (const e of CATALOGUE) {
      expect([e.id, e.examples.length > 0]).toEqual([e.id, true]);
      for (const ex of e.examples) expect(ex.source.length).toBeGreaterThan(10);
    }
  });

  test.each(cases)('$label', ({ id, ex }) => {
    const first = callFunction(id, ex.args)[0]?.[0];
    if (isCellError(first)) throw new Error(`${id} gave ${first.code}: ${first.message}`);
    if (typeof ex.expected === 'number') {
      expect(typeof first).toBe('number');
      expect(Math.abs((first as number) - ex.expected)).toBeLessThanOrEqual(ex.tolerance ?? 0);
    } else {
      expect(String(first)).toContain(ex.expected);
    }
  });
});
