/**
 * The reference's one data source: entries from the function metadata with their result
 * units, and the search over them.
 */
import * as fs from 'fs';
import * as path from 'path';
import { BUILD_TIMEOUT_MS, ensureBuilt } from '../build/ensureBuilt';
import { CATALOGUE } from '../../src/functions/catalogue';
import {
  loadReference,
  referenceItems,
  RESULT_UNITS,
  resultUnit,
  searchReference,
} from '../../src/taskpane/referenceData';

const metadata = {
  functions: [
    {
      id: 'NERNSTSLOPE',
      name: 'NERNSTSLOPE',
      description:
        'Nernst slope RT ln10/(nF) in V per decade of activity. Example: =ECHEM.NERNSTSLOPE(25, 1) gives 0.059159.',
      parameters: [{ name: 'temp_C', description: 'Temperature in °C', optional: true }],
      result: { dimensionality: 'matrix' },
    },
    { id: 'IONICSTR', name: 'IONICSTR', description: 'Ionic strength I in mol/kg.', parameters: [] },
    { id: 'NEWONE', name: 'NEWONE', description: 'A function the unit table does not know.' },
  ],
};

describe('referenceItems', () => {
  test('each item carries its result unit; an unknown id points to the description', () => {
    const items = referenceItems(metadata);
    expect(items.map((i) => i.unit)).toEqual(['V per decade of activity', 'mol/kg', 'see the description']);
    expect(items[0]?.qualifiedName).toBe('ECHEM.NERNSTSLOPE');
  });

  test('every catalogue function has a unit', () => {
    expect(CATALOGUE.map((f) => f.id).filter((id) => !(id in RESULT_UNITS))).toEqual([]);
    expect(resultUnit('potential')).toContain('V');
  });

  test("a function without the pane's own wording shows its spec's result description", () => {
    // OVERPOTENTIAL's spec: returns "Overpotential in V, one row per case"
    expect(resultUnit('OVERPOTENTIAL')).toBe('Overpotential in V');
    expect(resultUnit('THERMONEUTRAL')).toBe('V');
  });

  test('malformed metadata is an error that says so', () => {
    expect(() => referenceItems({ nope: true })).toThrow('no "functions" list');
  });
});

describe('searchReference', () => {
  const items = referenceItems(metadata);
  test.each([
    ['', ['NERNSTSLOPE', 'IONICSTR', 'NEWONE']],
    ['slope', ['NERNSTSLOPE']],
    ['MOL/KG', ['IONICSTR']],
    ['temperature slope', ['NERNSTSLOPE']], // every word, in any field (here an argument)
    ['slope ionic', []],
  ])('"%s" → %j', (query, ids) => {
    expect(searchReference(items, query).map((i) => i.id)).toEqual(ids);
  });
});

describe('loadReference', () => {
  test('fetches functions.json from the page origin and reads it', async () => {
    const asked: string[] = [];
    const items = await loadReference(async (url, init) => {
      asked.push(`${url} ${init.credentials}`);
      return { ok: true, status: 200, statusText: 'OK', json: async () => metadata };
    });
    expect(asked).toEqual(['functions.json same-origin']);
    expect(items).toHaveLength(3);
  });

  test('an HTTP failure says what answered', async () => {
    await expect(
      loadReference(async () => ({
        ok: false,
        status: 404,
        statusText: 'Not Found',
        json: async () => null,
      })),
    ).rejects.toThrow('functions.json answered 404 Not Found');
  });

  // dist/ is built first where it is missing (test/build/ensureBuilt.ts): never skipped
  const built = path.join(__dirname, '..', '..', 'dist', 'functions.json');
  test(
    'the built metadata gives one item with a known unit per catalogue function',
    async () => {
      await ensureBuilt();
      const items = referenceItems(JSON.parse(fs.readFileSync(built, 'utf8')));
      expect(items.map((i) => i.id).sort()).toEqual(CATALOGUE.map((f) => f.id).sort());
      expect(items.filter((i) => i.unit === 'see the description')).toEqual([]);
    },
    BUILD_TIMEOUT_MS,
  );
});
