/**
 * The reference is generated from functions.json: entries, anchors, signatures, examples,
 * and (after a build) the real metadata's help URLs pointing at the anchors the pane renders.
 */
import * as fs from 'fs';
import * as path from 'path';
import { BUILD_TIMEOUT_MS, ensureBuilt } from '../build/ensureBuilt';
import {
  anchorOf,
  extractExamples,
  idFromHash,
  planExampleSheet,
  readMetadata,
  referenceEntries,
} from '../../src/taskpane/reference';

const SAMPLE = {
  functions: [
    {
      id: 'NERNSTSLOPE',
      name: 'NERNSTSLOPE',
      description:
        'Nernst slope RT ln10/(nF) in V per decade of activity. Example: =ECHEM.NERNSTSLOPE(25, 1) gives 0.059159.',
      helpUrl: 'https://localhost:3000/taskpane.html#ref-nernstslope',
      parameters: [
        { name: 'temp_C', description: 'Temperature in °C (default 25)', type: 'any', optional: true },
        { name: 'n', description: 'Electrons (default 1)', type: 'any', optional: true },
      ],
      result: {},
    },
    {
      id: 'POTENTIAL',
      name: 'POTENTIAL',
      description:
        'Electrode potential in V vs SHE. Example: =ECHEM.POTENTIAL("Cu2+/Cu", "Cu2+", 0.01) gives 0.27784; ' +
        'also ECHEM.POTENTIAL("Zn | Zn2+ || Cu2+ | Cu") for a cell.',
      parameters: [
        { name: 'reaction', dimensionality: 'matrix', type: 'any' },
        { name: 'species', dimensionality: 'matrix', optional: true },
      ],
      result: { dimensionality: 'matrix' },
    },
  ],
};

describe('referenceEntries', () => {
  test('signature, anchor, parameters with their shape, result shape, examples', () => {
    const [slope, potential] = referenceEntries(SAMPLE);
    expect(slope).toEqual({
      id: 'NERNSTSLOPE',
      anchor: 'ref-nernstslope',
      qualifiedName: 'ECHEM.NERNSTSLOPE',
      signature: 'ECHEM.NERNSTSLOPE([temp_C], [n])',
      description: SAMPLE.functions[0]?.description,
      params: [
        { name: 'temp_C', optional: true, shape: 'one value', description: 'Temperature in °C (default 25)' },
        { name: 'n', optional: true, shape: 'one value', description: 'Electrons (default 1)' },
      ],
      returns: 'one value',
      examples: ['=ECHEM.NERNSTSLOPE(25, 1)'],
    });
    expect(potential?.signature).toBe('ECHEM.POTENTIAL(reaction, [species])');
    expect(potential?.params[0]?.shape).toBe('a value or a range');
    expect(potential?.returns).toBe('one value, or a spilled range for several cases');
    expect(potential?.examples).toEqual([
      '=ECHEM.POTENTIAL("Cu2+/Cu", "Cu2+", 0.01)',
      '=ECHEM.POTENTIAL("Zn | Zn2+ || Cu2+ | Cu")',
    ]);
  });

  test('examples keep parentheses and quotes inside strings', () => {
    expect(
      extractExamples('E.g. =ECHEM.SOURCE("Fe(OH)3(s) + e- -> Fe(OH)2(s) + OH-") names the row.'),
    ).toEqual(['=ECHEM.SOURCE("Fe(OH)3(s) + e- -> Fe(OH)2(s) + OH-")']);
    expect(extractExamples('=ECHEM.BALANCE("say ""hi"" (x)")')).toEqual(['=ECHEM.BALANCE("say ""hi"" (x)")']);
    expect(extractExamples('an unclosed =ECHEM.LOGK(1.1, 2 call')).toEqual([]);
  });

  test('anchors and hashes', () => {
    const entries = referenceEntries(SAMPLE);
    expect(anchorOf('POTENTIAL')).toBe('ref-potential');
    expect(idFromHash('#ref-potential', entries)?.id).toBe('POTENTIAL');
    expect(idFromHash('#REF-NERNSTSLOPE', entries)?.id).toBe('NERNSTSLOPE');
    expect(idFromHash('#reference', entries)).toBeNull();
  });

  test('a document that is not function metadata is refused with a reason', () => {
    expect(() => readMetadata({})).toThrow(/no "functions" list/);
    expect(() => readMetadata({ functions: [{ name: 'X' }] })).toThrow(/entry 1 has no id/);
  });
});

describe('planExampleSheet', () => {
  test('title, the formula as text and live, under a unique name', () => {
    const plan = planExampleSheet({ id: 'LOGK', qualifiedName: 'ECHEM.LOGK' }, '=ECHEM.LOGK(1.10, 2)', [
      'Example LOGK',
    ]);
    expect(plan.sheetName).toBe('Example LOGK (2)');
    expect(plan.blocks).toEqual([
      { address: 'A1', values: [['ECHEM.LOGK: example from the function reference']], bold: true },
      { address: 'A2:A3', values: [['Formula'], ['Result']], bold: true },
      { address: 'B2', values: [["'=ECHEM.LOGK(1.10, 2)"]], numberFormat: '@' },
      { address: 'B3', formulas: [['=ECHEM.LOGK(1.10, 2)']] },
    ]);
    expect(plan.summary).toBe(
      `Wrote =ECHEM.LOGK(1.10, 2) in 'Example LOGK (2)'!B3 of the new sheet "Example LOGK (2)" (its text in B2).`,
    );
  });
});

// The real metadata in dist/ (npm test builds first; a run on its own builds it here, or
// fails, never skips): every function's help URL points at the anchor the pane renders for
// it, and every function has an example.
const built = path.join(__dirname, '..', '..', 'dist', 'functions.json');
describe('the built functions.json', () => {
  beforeAll(() => ensureBuilt(), BUILD_TIMEOUT_MS);
  test('each help URL points at its reference anchor; each function has an example formula of its own', () => {
    const json: unknown = JSON.parse(fs.readFileSync(built, 'utf8'));
    const entries = referenceEntries(json);
    expect(entries.length).toBeGreaterThanOrEqual(20);
    for (const f of readMetadata(json)) {
      const entry = entries.find((e) => e.id === f.id);
      expect(entry).toBeDefined();
      expect(f.helpUrl?.endsWith(`taskpane.html#${entry?.anchor}`)).toBe(true);
      expect(entry?.examples.some((x) => x.startsWith(`=ECHEM.${f.name}(`))).toBe(true);
    }
  });
});
