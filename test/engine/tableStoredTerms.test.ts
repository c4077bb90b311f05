/**
 * The built-in table and the species registry are built from src/engine/data/storedParse.json
 * (each built-in half-reaction and each species-data species as the notation parser reads
 * them, written by `npm run gen:terms`) instead of parsing every text on the first call.
 * These checks hold the stored form to the parser: the same reaction, term by term, the same
 * stoichiometry and electron count, the same species with the same inferred phase, the same
 * E° and temperature model of every built-in row as the species data gives now; and a stale
 * file (texts changed since) is not used: the texts are parsed at run time.
 */
import {
  BUILTIN_POTENTIALS,
  builtinTable,
  checkBalance,
  listSpecies,
  parseNotation,
  parseSpecies,
  standardSpecies,
} from '../../src/engine';
import { speciesRecord } from '../../src/engine/data/species';
import { MEDIUM_KEYS, reactionMap } from '../../src/engine/table/halfReaction';
import { EPH_SPECIES } from '../../src/engine/data/species/ephSpecies';
import { phaseOf, speciesKey } from '../../src/engine/notation/species';
import {
  rowInputsHash,
  storedHalfReactionRows,
  storedHalfReactions,
  storedSpecies,
  textsHash,
} from '../../src/engine/data/storedParseReader';
import { builtinRowsHolding, builtinThermoFromSpecies, rowE0V } from '../../src/engine/table/potentialTable';
import STORED from '../../src/engine/data/storedParse.json';
import type { Reaction } from '../../src/engine/notation/reaction';

function parsed(text: string): Reaction {
  const n = parseNotation(text, 'half-reaction');
  if (n.kind !== 'half') throw new Error(`${text} is not a half-reaction`);
  return n.reaction;
}

/** A map as [key, formula, charge, phase, num/den] rows in its order, for comparison. */
function mapRows(m: ReturnType<typeof reactionMap>): string[] {
  return [...m].map(([k, v]) => `${k} ${v.species.formula} ${v.species.charge} ${String(v.species.phase)} ${v.nu.num}/${v.nu.den}`);
}

const potentialTexts = BUILTIN_POTENTIALS.map((r) => r.halfReaction);

describe('textsHash (FNV-1a, 32-bit)', () => {
  // FNV-1a test vectors (Fowler, Noll, Vo; the published FNV test suite, from memory)
  test.each([
    ['', 0x811c9dc5],
    ['a', 0xe40c292c],
    ['foobar', 0xbf9cf968],
  ])('of %j is %d', (text, hash) => {
    expect(textsHash([text])).toBe(hash);
  });
  test('separates texts by a line feed: ["a", "b"] hashes as "a\\nb"', () => {
    expect(textsHash(['a', 'b'])).toBe(textsHash(['a\nb']));
    expect(textsHash(['a', 'b'])).not.toBe(textsHash(['ab']));
  });
});

describe('stored parse of the built-in rows (storedParse.json)', () => {
  test('is fresh: made from the rows as they are (else run npm run gen:terms)', () => {
    expect(STORED.potentials.rows).toHaveLength(BUILTIN_POTENTIALS.length);
    expect(STORED.potentials.e0V).toHaveLength(BUILTIN_POTENTIALS.length);
    expect(STORED.potentials.inputsHash).toBe(rowInputsHash(BUILTIN_POTENTIALS));
    expect(storedHalfReactions(BUILTIN_POTENTIALS)).not.toBeNull();
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

describe('the index of the built-in rows by species (storedParse.json rowsByKey)', () => {
  /** The species keys of a parsed row's terms other than the medium's. */
  const termKeys = (text: string) => {
    const r = parsed(text);
    return new Set([...r.reactants, ...r.products].map((t) => speciesKey(t.species)).filter((k) => !MEDIUM_KEYS.has(k)));
  };
  const keysOfRows = potentialTexts.map(termKeys);

  test('lists, for each species key other than the medium’s, exactly the rows whose parsed terms hold it', () => {
    const all = new Set(keysOfRows.flatMap((k) => [...k]));
    expect(Object.keys(STORED.potentials.rowsByKey).sort()).toEqual([...all].sort());
    for (const key of all) {
      const expected = keysOfRows.flatMap((k, i) => (k.has(key) ? [i] : []));
      expect([key, [...builtinRowsHolding([key])!]]).toEqual([key, expected]);
    }
    for (const medium of MEDIUM_KEYS) expect(builtinRowsHolding([medium])!.size).toBe(0);
  });

  test('every row map holds a species other than the medium’s, each among the indexed terms of its row', () => {
    builtinTable().forEach((row, i) => {
      const keys = [...row.map.keys()].filter((k) => !MEDIUM_KEYS.has(k));
      expect([i, keys.length > 0]).toEqual([i, true]);
      for (const k of keys) expect([i, k, keysOfRows[i]!.has(k)]).toEqual([i, k, true]);
    });
  });

  test('gives the union for several keys, and none for a key no row holds', () => {
    const zincOrCopper = keysOfRows.flatMap((k, i) => (k.has('Zn|2') || k.has('Cu|2') ? [i] : []));
    expect([...builtinRowsHolding(['Zn|2', 'Cu|2'])!].sort((a, b) => a - b)).toEqual(zincOrCopper);
    expect(zincOrCopper.length).toBeGreaterThanOrEqual(2);
    expect(builtinRowsHolding(['Xx|0'])!.size).toBe(0);
    expect(builtinRowsHolding(['constructor', '__proto__'])!.size).toBe(0);
  });
});

describe('stored species of the species data (storedParse.json)', () => {
  const lists = [
    ['standard', standardSpecies().map((r) => r.species)],
    ['eph', EPH_SPECIES.map((r) => r.species)],
  ] as const;
  test.each(lists)('the %s list is fresh and each species is the parsed one, phase as inferred', (list, texts) => {
    const s = STORED.species[list];
    expect(s.textsHash).toBe(textsHash(texts));
    const stored = storedSpecies(list, texts);
    expect(stored).not.toBeNull();
    texts.forEach((t, i) => {
      const p = parseSpecies(t, 'species');
      expect(stored![i]).toEqual({ ...p, phase: phaseOf(p) });
    });
  });
  test('a species record is looked up by the stored keys as the registry holds it, first record winning', () => {
    const entries = listSpecies();
    expect(entries.length).toBeGreaterThan(100);
    for (const e of entries) expect([e.key, speciesRecord(e.species)]).toEqual([e.key, e.record]);
    for (const e of entries) expect(speciesRecord(e.species)).toBe(e.record);
    expect(speciesRecord(parseSpecies('Cu3+', 'species'))).toBeNull();
  });
  test('the registry holds every species of both lists under its parsed key', () => {
    const keys = new Set(listSpecies().map((r) => r.key));
    for (const t of [...lists[0][1], ...lists[1][1]]) {
      const p = parseSpecies(t, 'species');
      expect(keys.has(`${p.formula}|${p.charge}|${phaseOf(p) ?? ''}`)).toBe(true);
    }
  });
});

describe('stored E° at 25 °C of the built-in rows (storedParse.json e0V)', () => {
  test('each row holds, to the last bit, what the species data gives now (else run npm run gen:terms)', () => {
    // a fresh engine, so that E° is read before anything builds a row's temperature model: the stored values
    jest.isolateModules(() => {
      // eslint-disable-next-line @typescript-eslint/no-require-imports
      const fresh = require('../../src/engine/table/potentialTable') as typeof import('../../src/engine/table/potentialTable');
      const freshRows = fresh.builtinTable();
      const stored = freshRows.map((r) => [r.text, r.e0V, r.speciesE0V]);
      expect(fresh.builtinThermoFromSpecies().map((t, i) => [freshRows[i]!.text, t.e0V, t.speciesE0V])).toEqual(stored);
    });
    const rows = builtinTable();
    const now = builtinThermoFromSpecies();
    expect(now).toHaveLength(rows.length);
    rows.forEach((r, i) => {
      const t = now[i]!;
      const label = r.text;
      expect([label, r.e0V, r.dE0dTmVperK, r.speciesE0V]).toEqual([label, t.e0V, t.dE0dTmVperK, t.speciesE0V]);
      expect([label, r.temperature]).toEqual([label, t.temperature]);
      // and so E°(T) across the species data's range
      for (const tempC of [0, 25, 60, 100]) {
        const fromSpecies = { ...r, e0V: t.e0V, temperature: t.temperature };
        expect([label, tempC, rowE0V(r, tempC)]).toEqual([label, tempC, rowE0V(fromSpecies, tempC)]);
      }
    });
    // rows of every kind are covered: a species slope, a row's own (or no) slope, missing species
    expect(rows.some((r) => r.temperature.basis === 'species')).toBe(true);
    expect(rows.some((r) => r.temperature.basis !== 'species')).toBe(true);
    expect(rows.some((r) => r.temperature.entropyMissing.length > 0)).toBe(true);
  });
  test('the copper row at 25 °C: E° from ΔfG°(Cu2+) = 65.49 kJ/mol (NBS 1982, from memory)', () => {
    // E° = ΔfG°(Cu2+)/(2F) = 65490 / (2 × 96485.332) = 0.339378 V
    const cu = builtinTable().find((r) => r.text.replace(/\s+/g, ' ') === 'Cu2+ + 2 e- -> Cu')!;
    expect(cu).toBeDefined();
    expect(cu.e0V).toBeCloseTo(0.339378, 6);
  });
  test('a row changed since (its E° or dE°/dT, not only its text) makes the lists stale', () => {
    const first = BUILTIN_POTENTIALS[0]!;
    const rest = BUILTIN_POTENTIALS.slice(1);
    expect(storedHalfReactionRows([{ ...first, e0V: first.e0V + 0.001 }, ...rest])).toBeNull();
    expect(storedHalfReactionRows([{ ...first, e0V: first.e0V * (1 + Number.EPSILON) }, ...rest])).toBeNull();
    expect(storedHalfReactionRows([{ ...first, dE0dTmVperK: first.dE0dTmVperK === null ? 0 : null }, ...rest])).toBeNull();
    expect(storedHalfReactionRows(rest)).toBeNull();
    expect(storedHalfReactionRows(BUILTIN_POTENTIALS)!.e0V).toBe(STORED.potentials.e0V);
  });
});

describe('a stale stored file', () => {
  test('is not used for texts that changed: they are parsed', () => {
    // the stored lists now describe other texts (another couple in row 1, species renamed)
    const [first, ...rest] = BUILTIN_POTENTIALS;
    expect(storedHalfReactions([{ ...first!, halfReaction: 'Li+ + e- -> Li' }, ...rest])).toBeNull();
    expect(storedHalfReactions(rest)).toBeNull();
    expect(storedSpecies('standard', ['Li+(aq)'])).toBeNull();
    jest.isolateModules(() => {
      // a file made from other texts: the first row's stored reaction is another couple's
      jest.doMock('../../src/engine/data/storedParse.json', () => ({
        ...STORED,
        potentials: {
          ...STORED.potentials,
          inputsHash: 1,
          rows: ['Li 1,e>Li', ...STORED.potentials.rows.slice(1)],
          e0V: STORED.potentials.e0V.map(() => 9),
        },
        species: { standard: { textsHash: 1, keys: [] }, eph: { textsHash: 1, keys: [] } },
      }));
      // eslint-disable-next-line @typescript-eslint/no-require-imports
      const engine = require('../../src/engine') as typeof import('../../src/engine');
      const first = engine.builtinTable()[0]!;
      expect(first.reaction).toEqual(parsed(BUILTIN_POTENTIALS[0]!.halfReaction));
      // nor its index: every row is looked at
      // eslint-disable-next-line @typescript-eslint/no-require-imports
      const table = require('../../src/engine/table/potentialTable') as typeof import('../../src/engine/table/potentialTable');
      expect(table.builtinRowsHolding(['Zn|2'])).toBeNull();
      const cell = engine.resolveReaction('Zn | Zn2+ || Cu2+ | Cu', engine.defaultTable());
      // E° from the species data read without the stored keys: ΔfG°(Cu2+) = 65.49, ΔfG°(Zn2+) =
      // −2F·0.7618 V (the data's measured value), so E° = 0.339378 + 0.7618 V (NBS 1982 and
      // OpenStax Chemistry 2e, Appendix L, from memory; the data's own sources)
      expect(engine.standardPotentialV(cell, 25)).toBeCloseTo(0.339378 + 0.7618, 5);
      expect(engine.listSpecies().length).toBe(listSpecies().length);
    });
  });
});
