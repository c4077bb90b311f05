/**
 * Writes src/engine/data/storedParse.json: every built-in half-reaction of
 * src/engine/data/potentials.ts and every species of the species data
 * (src/engine/data/species/) as the notation parser reads them, so that the engine builds
 * the built-in table and the species registry without parsing them on its first call (see
 * src/engine/data/storedParseReader.ts). A list whose texts have changed since is parsed at run
 * time; test/engine/tableStoredTerms.test.ts fails until this is rerun.
 *
 *   npm run gen:terms
 */
import * as fs from 'fs';
import * as path from 'path';
import { BUILTIN_POTENTIALS } from '../src/engine/data/potentials';
import { standardSpecies } from '../src/engine/data/species/standard';
import { EPH_SPECIES } from '../src/engine/data/species/ephSpecies';
import { rowInputsHash, textsHash } from '../src/engine/data/storedParseReader';
import { builtinThermoFromSpecies } from '../src/engine/table/potentialTable';
import { parseNotation } from '../src/engine/notation/notation';
import { parseSpecies, phaseOf, speciesKey, speciesPhaseKey } from '../src/engine/notation/species';
import { checkBalance } from '../src/engine/balance/balance';
import { MEDIUM_KEYS, reactionMap } from '../src/engine/table/halfReaction';
import type { Term } from '../src/engine/notation/reaction';

const ROOT = path.resolve(__dirname, '..');
const OUT = 'src/engine/data/storedParse.json';

/** `[coefficient ]formula[ charge[ phase]]`: coefficient left out where 1, charge where 0 and no phase; the electron `e`. */
function encodeTerm(t: Term): string {
  if (t.activity !== null) throw new Error('a built-in row carries an inline activity');
  const s = t.species;
  if (/[ ,>]/.test(s.formula) || /^\d/.test(s.formula)) throw new Error(`formula ${s.formula} cannot be stored`);
  if (s.formula === 'e' && !(s.isElectron && s.charge === -1 && s.phase === null))
    throw new Error('a species named e that is not the electron');
  const c = t.coefficient;
  const fields = c.num === 1n && c.den === 1n ? [] : [c.den === 1n ? String(c.num) : `${c.num}/${c.den}`];
  if (s.isElectron) fields.push('e');
  else {
    fields.push(s.formula);
    if (s.charge !== 0 || s.phase !== null) fields.push(String(s.charge));
    if (s.phase !== null) fields.push(s.phase);
  }
  return fields.join(' ');
}

/**
 * The rows (0-based, increasing) whose terms hold each species key (`speciesKey`) other than
 * the medium's (MEDIUM_KEYS: the electron, H+, OH-, H2O), keys in order of first use. Every
 * row's map holds at least one such species (checked here), so a lookup that needs the row's
 * species other than the medium's finds the row under each of them.
 */
const rowsByKey = new Map<string, number[]>();
const potentials = BUILTIN_POTENTIALS.map((r, i) => {
  const n = parseNotation(r.halfReaction, 'half-reaction');
  if (n.kind !== 'half') throw new Error(`built-in row ${r.halfReaction} is not a half-reaction`);
  const bal = checkBalance(n.reaction);
  if (!bal.balanced) throw new Error(`built-in row ${r.halfReaction} does not balance: ${bal.problems.join('; ')}`);
  if ([...reactionMap(n.reaction).keys()].every((key) => MEDIUM_KEYS.has(key)))
    throw new Error(`built-in row ${r.halfReaction} holds only the medium's species: the index cannot list it`);
  const keys = [...n.reaction.reactants, ...n.reaction.products].map((t) => speciesKey(t.species));
  for (const key of keys) {
    if (MEDIUM_KEYS.has(key)) continue;
    const rows = rowsByKey.get(key) ?? rowsByKey.set(key, []).get(key)!;
    if (rows[rows.length - 1] !== i) rows.push(i);
  }
  return `${n.reaction.reactants.map(encodeTerm).join(',')}>${n.reaction.products.map(encodeTerm).join(',')}`;
});
const index = `{\n${[...rowsByKey].map(([k, rows]) => `      ${JSON.stringify(k)}: ${JSON.stringify(rows)}`).join(',\n')}\n    }`;

function speciesKeys(texts: readonly string[]): string[] {
  return texts.map((t) => {
    const s = parseSpecies(t, 'species');
    const key = speciesPhaseKey({ ...s, phase: phaseOf(s) });
    if (key.split('|').length !== 3) throw new Error(`species key ${key} holds a separator`);
    return key;
  });
}

/** Each built-in row's E° at 25 °C from the species data (null where it gives none: the row's own is used). */
const e0Rows = builtinThermoFromSpecies().map((t, i) => {
  const given = BUILTIN_POTENTIALS[i]!;
  if (t.speciesE0V === null) {
    if (t.e0V !== given.e0V) throw new Error(`built-in row ${given.halfReaction}: E° neither the species data's nor the row's`);
    return null;
  }
  if (t.speciesE0V !== t.e0V || !Number.isFinite(t.e0V))
    throw new Error(`built-in row ${given.halfReaction}: E° is not the species data's finite value`);
  if (Object.is(t.e0V, -0)) throw new Error(`built-in row ${given.halfReaction}: E° −0 would be stored as 0`);
  return t.e0V;
});

const list = (rows: readonly string[]) => `[\n${rows.map((r) => `      ${JSON.stringify(r)}`).join(',\n')}\n    ]`;
const standardTexts = standardSpecies().map((r) => r.species);
const ephTexts = EPH_SPECIES.map((r) => r.species);
const text = `{
  "//": "Generated by npm run gen:terms (scripts/gen-potential-terms.ts); do not edit. potentials: each built-in half-reaction of src/engine/data/potentials.ts as parsed, reactants > products, terms '[coefficient ]formula[ charge[ phase]]' (coefficient 1 and charge 0 left out, the electron e). rowsByKey: for each species key formula|charge other than the medium's (e, H+, OH-, H2O), the rows (0-based) whose terms hold it (every row holds one). e0V: each built-in row's E° at 25 °C (V) from the species data, null where it gives none. inputsHash: FNV-1a of the rows' texts, E° and dE°/dT. species: the key formula|charge|phase of each species-data record; textsHash: FNV-1a of the texts each list was made from.",
  "potentials": {
    "inputsHash": ${rowInputsHash(BUILTIN_POTENTIALS)},
    "rows": ${list(potentials)},
    "rowsByKey": ${index},
    "e0V": [\n${e0Rows.map((r) => `      ${JSON.stringify(r)}`).join(',\n')}\n    ]
  },
  "species": {
    "standard": {
      "textsHash": ${textsHash(standardTexts)},
      "keys": ${list(speciesKeys(standardTexts)).replace(/\n/g, '\n  ')}
    },
    "eph": {
      "textsHash": ${textsHash(ephTexts)},
      "keys": ${list(speciesKeys(ephTexts)).replace(/\n/g, '\n  ')}
    }
  }
}
`;
const file = path.join(ROOT, OUT);
if (!fs.existsSync(file) || fs.readFileSync(file, 'utf8') !== text) {
  fs.writeFileSync(file, text);
  process.stdout.write(`wrote ${OUT}\n`);
}
