/**
 * The built-in table is built from src/engine/data/potentialTerms.json (each built-in
 * half-reaction as the notation parser reads it, written by `npm run gen:terms`) instead of
 * parsing every row on the first call. These checks hold the stored form to the parser: the
 * same reaction, term by term, the same stoichiometry and electron count, and a row whose
 * stored text differs is parsed at run time instead of being read from the stale entry.
 */
import { BUILTIN_POTENTIALS, builtinTable, checkBalance, parseNotation } from '../../src/engine';
import { reactionMap } from '../../src/engine/table/halfReaction';
import STORED from '../../src/engine/data/potentialTerms.json';
import type { Reaction } from '../../src/engine/notation/reaction';

function parsed(text: string): Reaction {
  const n = parseNotation(text, 'half-reaction');
  if (n.kind !== 'half') throw new Error(`${text} is not a half-reaction`);
  return n.reaction;
}

/** A map as sorted [key, formula, charge, phase, num/den] rows, for comparison. */
function mapRows(m: ReturnType<typeof reactionMap>): string[] {
  return [...m].map(([k, v]) => `${k} ${v.species.formula} ${v.species.charge} ${String(v.species.phase)} ${v.nu.num}/${v.nu.den}`).sort();
}

describe('stored parse of the built-in rows (potentialTerms.json)', () => {
  test('is fresh: one entry per built-in row, same text, same order (else run npm run gen:terms)', () => {
    expect(STORED.rows.map((r) => r[0])).toEqual(BUILTIN_POTENTIALS.map((r) => r.halfReaction));
  });

  const rows = BUILTIN_POTENTIALS.map((r, i) => [i + 1, r.halfReaction] as const);

  test.each(rows)('row %d: %s is read as the parser reads it', (i, text) => {
    const row = builtinTable()[i - 1]!;
    const reaction = parsed(text);
    expect(row.reaction).toEqual(reaction);
    expect(checkBalance(row.reaction).balanced).toBe(true);
    expect(mapRows(row.map)).toEqual(mapRows(reactionMap(reaction)));
    const electrons = -Number(reactionMap(reaction).get('e')!.nu.num) / Number(reactionMap(reaction).get('e')!.nu.den);
    expect(row.n).toBe(electrons);
    expect(row.n).toBeGreaterThan(0);
    // per electron: every coefficient divided by the electron count
    for (const [k, v] of row.perElectron) {
      const whole = row.map.get(k)!.nu;
      expect(Number(v.nu.num) / Number(v.nu.den)).toBeCloseTo(Number(whole.num) / Number(whole.den) / electrons, 12);
    }
    expect(row.perElectron.size).toBe(row.map.size);
  });
});

describe('a stale stored entry', () => {
  test('is not used: the row is parsed from its text', () => {
    jest.isolateModules(() => {
      // the first entry's text no longer matches its row, and its terms are those of another couple
      jest.doMock('../../src/engine/data/potentialTerms.json', () => ({
        rows: [['Li+ + e- -> Li', [[1, 'Li', 1], [1, 'e', -1]], [[1, 'Li', 0]]], ...STORED.rows.slice(1)],
      }));
      // eslint-disable-next-line @typescript-eslint/no-require-imports
      const table = require('../../src/engine/table/potentialTable') as typeof import('../../src/engine/table/potentialTable');
      const first = table.builtinTable()[0]!;
      expect(first.text).toBe(BUILTIN_POTENTIALS[0]!.halfReaction);
      expect(first.reaction).toEqual(parsed(BUILTIN_POTENTIALS[0]!.halfReaction));
    });
  });
});
