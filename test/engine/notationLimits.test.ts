/**
 * The parser's limits: text length, bracket nesting, exact atom counts and charges, and
 * the byte-bounded cache registry. Expected values are counted by hand.
 */
import {
  approximateBytes,
  ByteBoundedCache,
  cacheStats,
  clearCaches,
  compiledReaction,
  countElements,
  formatReaction,
  MAX_NOTATION_CHARS,
  parseNotation,
  parseReaction,
  parseSpecies,
  registerCache,
} from '../../src/engine';
import { callFunction, isCellError } from '../../src/functions/catalogue';
import { engineErrorOf } from './support';

describe('length limit', () => {
  test('the limit is 4,096 characters', () => {
    expect(MAX_NOTATION_CHARS).toBe(4096);
  });

  test('a text of exactly 4,096 characters is read', () => {
    const text = 'Cu2+ + 2e- -> Cu'.padEnd(4096, ' ');
    expect(text).toHaveLength(4096);
    expect(parseNotation(text).kind).toBe('half');
  });

  test('one character more is refused with a parse error naming the limit', () => {
    const e = engineErrorOf(() => parseNotation('Cu2+ + 2e- -> Cu'.padEnd(4097, ' ')));
    expect(e.kind).toBe('parse');
    expect(e.message).toContain('4,097 characters');
    expect(e.message).toContain('4,096 characters');
  });

  test('species text has the same limit', () => {
    expect(engineErrorOf(() => parseSpecies(`Cu${' '.repeat(5000)}`)).message).toContain('4,096');
  });
});

describe('nesting limit', () => {
  const nested = (levels: number) => `${'('.repeat(levels)}H${')'.repeat(levels)}2`;

  test('32 levels of brackets are read: H counted once, times 2', () => {
    expect(countElements(nested(32)).get('H')).toBe(2);
  });

  test('33 levels are refused with a clear message (no stack overflow)', () => {
    const e = engineErrorOf(() => countElements(nested(33)));
    expect(e.kind).toBe('parse');
    expect(e.message).toContain('nested deeper than 32 levels');
  });

  test('2,000 levels inside a reaction: a parse error, not a crash', () => {
    const e = engineErrorOf(() => parseNotation(`${nested(2000)} -> H2`));
    expect(e.kind).toBe('parse');
    expect(e.message).toContain('nested deeper');
  });
});

describe('exact counts: never rounded', () => {
  test('2^53 - 1 atoms are read exactly', () => {
    // 9007199254740991 = 2^53 - 1, the largest integer a double holds exactly.
    expect(countElements('H9007199254740991').get('H')).toBe(9007199254740991);
  });

  test('2^60 + 1 atoms are refused, not rounded to 2^60', () => {
    // 1152921504606846977 = 2^60 + 1 (by hand); as a double it would read as 2^60.
    const e = engineErrorOf(() => parseReaction('H1152921504606846977 + e- -> H-'));
    expect(e.kind).toBe('parse');
    expect(e.message).toContain('atom count above 9,007,199,254,740,991');
  });

  test('a product of multipliers past 2^53 is refused', () => {
    // (H100000000)100000000 is 10^16 hydrogen atoms, above 2^53 ≈ 9.007e15.
    expect(engineErrorOf(() => countElements('(H100000000)100000000')).message).toContain('atom count');
  });

  test('BALANCE of the 2^60 + 1 case is an error cell, not an equation one atom off', () => {
    const r = callFunction('BALANCE', ['H1152921504606846977 + e- -> H-']);
    const cell = r[0]?.[0];
    expect(isCellError(cell)).toBe(true);
  });

  test('a 400-digit charge is refused with the charge limit', () => {
    const e = engineErrorOf(() => parseSpecies(`Fe^${'9'.repeat(400)}+`));
    expect(e.message).toContain('a charge larger than 12');
  });

  test('coefficients are exact up to 2^53 - 1, mixed numbers too', () => {
    // 4503599627370495½ = (2·4503599627370495 + 1)/2 = 9007199254740991/2 = (2^53 - 1)/2, by hand.
    const r = parseReaction('4503599627370495½ O2 -> 9007199254740991 O');
    expect(r.reactants[0]?.coefficient).toEqual({ num: 9007199254740991n, den: 2n });
    expect(formatReaction(r)).toBe('9007199254740991/2 O2 -> 9007199254740991 O');
  });

  test('a larger coefficient is refused, not rounded (and no function returns Infinity for it)', () => {
    const n = `1${'0'.repeat(400)}`;
    const text = `${n} Cu2+ + 2${n.slice(1)} e- -> ${n} Cu`;
    expect(engineErrorOf(() => parseReaction(text)).message).toContain('too large to compute with exactly');
    expect(engineErrorOf(() => parseReaction('123456789012345678901½ O2 -> O2')).kind).toBe('parse');
    const cell = callFunction('ELECTRONS', [text])[0]?.[0];
    expect(isCellError(cell)).toBe(true);
  });
});

describe('cache registry', () => {
  test('a byte-bounded cache drops the oldest entries past its byte budget', () => {
    const c = new ByteBoundedCache<string>('test-bytes', {
      maxEntries: 100,
      maxBytes: 1000,
      sizeOf: (_k, v) => (v as string).length,
    });
    c.set('a', 'x'.repeat(400));
    c.set('b', 'x'.repeat(400));
    c.set('c', 'x'.repeat(400)); // 1200 > 1000: 'a' goes
    expect(c.get('a')).toBeUndefined();
    expect(c.get('b')).toBeDefined();
    expect(c.stats()).toEqual({ name: 'test-bytes', entries: 2, bytes: 800 });
    c.set('huge', 'x'.repeat(2000)); // larger than the budget: not kept
    expect(c.get('huge')).toBeUndefined();
  });

  test('entries are bounded too', () => {
    const c = new ByteBoundedCache<number>('test-entries', { maxEntries: 3, maxBytes: 1 << 20 });
    for (let i = 0; i < 10; i++) c.set(String(i), i);
    expect(c.stats().entries).toBe(3);
    expect(c.get('9')).toBe(9);
    expect(c.get('6')).toBeUndefined();
  });

  test('one clear empties every registered cache, also ones registered from outside', () => {
    let held = 5;
    registerCache({
      name: 'test-outside',
      clear: () => {
        held = 0;
      },
      stats: () => ({ name: 'test-outside', entries: held, bytes: held * 10 }),
    });
    compiledReaction('Cu2+ + 2e- -> Cu', null);
    expect(cacheStats().find((s) => s.name === 'resolvedReactions')?.entries).toBeGreaterThan(0);
    clearCaches();
    expect(held).toBe(0);
    for (const s of cacheStats()) expect(s.entries).toBe(0);
  });

  test('long reaction texts are bounded by bytes: 4,000 near-maximal texts stay under the budget', () => {
    clearCaches();
    for (let i = 0; i < 4000; i++) {
      try {
        compiledReaction(`Cu2+ + 2e- -> Cu${' '.repeat(3000)}${'H'.repeat(i % 7)}x${i}`, null);
      } catch {
        // Errors are cached too; what matters is the bytes held.
      }
    }
    const held = cacheStats().find((s) => s.name === 'resolvedReactions');
    expect(held?.bytes).toBeLessThanOrEqual(64 * 1024 * 1024);
    expect(held?.entries).toBeGreaterThan(0);
    clearCaches();
  });

  test('approximateBytes grows with what a value holds', () => {
    // 16 bytes of header plus 2 per UTF-16 unit (the estimate's own rule).
    expect(approximateBytes('abcd')).toBe(24);
    expect(approximateBytes({ s: 'x'.repeat(1000) })).toBeGreaterThan(2000);
  });
});
