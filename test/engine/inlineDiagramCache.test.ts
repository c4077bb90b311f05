/**
 * Cell diagrams with inline activities are resolved once per diagram (numbers aside) and the
 * numbers of each call bound into that resolution: the compiled form must be exactly what a
 * full parse and resolution of the same text gives, for every number, unit and electrolyte.
 */
import { cacheStats, clearCaches, compiledReaction } from '../../src/engine/cache';
import { defaultTable } from '../../src/engine/table/potentialTable';
import { resolveReaction } from '../../src/engine/table/resolve';
import { nernstForm } from '../../src/engine/thermo/nernstForm';

/** The full path, without any cache: parse, resolve, compile. */
function fullForm(text: string) {
  return nernstForm(resolveReaction(text, defaultTable()));
}

const DIAGRAMS: [string, (a: string, b: string) => string][] = [
  ['Daniell, M', (a, b) => `Zn | Zn2+(aq, ${a} M) || Cu2+(aq, ${b} M) | Cu`],
  ['Daniell, mM and µM', (a, b) => `Zn(s) | Zn2+(aq, ${a} mM) || Cu2+(aq, ${b} µM) | Cu(s)`],
  ['hydrogen | silver chloride, no bridge', (a, b) => `Pt | H2(g, ${a} bar) | HCl(aq, ${b} m) | AgCl(s) | Ag(s)`],
  ['an electrolyte of two ions of one kind', (a, b) => `Zn | ZnCl2(aq, ${a} M) | Hg2Cl2(s) | Hg(l) || Cu2+(aq, ${b} M) | Cu`],
  ['a gas in atm', (a, b) => `Pt | H2(g, ${a} atm) | H+(aq, ${b} M) || Cu2+(aq, 0.1 M) | Cu`],
];
const AMOUNTS: [string, string][] = [
  ['0.1', '0.01'],
  ['0.0123', '0.1'],
  ['1', '1'],
  ['2.5e-3', '7E2'],
  ['.5', '3'],
];

describe('inline-activity diagrams through the cached resolution', () => {
  test.each(DIAGRAMS)('%s: the same compiled form as a full resolution, number by number', (_name, diagram) => {
    clearCaches();
    for (const [a, b] of AMOUNTS) {
      const text = diagram(a, b);
      expect(compiledReaction(text, null)).toEqual(fullForm(text));
    }
    // one template served all five texts: none of them was resolved on its own
    expect(cacheStats().find((c) => c.name === 'inlineDiagramTemplates')?.entries).toBe(1);
    expect(cacheStats().find((c) => c.name === 'resolvedReactions')?.entries).toBe(0);
  });

  test('two amounts that the diagram gives the same species keep the last, as the parser does', () => {
    clearCaches();
    const text = 'Zn | Zn2+(aq, 0.2 M) || Zn2+(aq, 0.002 M) | Zn';
    compiledReaction('Zn | Zn2+(aq, 0.3 M) || Zn2+(aq, 0.004 M) | Zn', null);
    expect(compiledReaction(text, null)).toEqual(fullForm(text));
  });

  test.each([
    ['a zero amount', 'Zn | Zn2+(aq, 0 M) || Cu2+(aq, 0.1 M) | Cu'],
    ['an unknown unit', 'Zn | Zn2+(aq, 0.1 furlong) || Cu2+(aq, 0.1 M) | Cu'],
    ['an unknown species', 'Zn | Zq2+(aq, 0.1 M) || Cu2+(aq, 0.1 M) | Cu'],
  ])('%s fails with the full parser\'s error', (_name, text) => {
    clearCaches();
    compiledReaction('Zn | Zn2+(aq, 0.5 M) || Cu2+(aq, 0.1 M) | Cu', null); // a template in place
    expect(() => compiledReaction(text, null)).toThrow();
    let full: unknown = null;
    try {
      fullForm(text);
    } catch (e) {
      full = e;
    }
    expect(full).not.toBeNull();
    expect(() => compiledReaction(text, null)).toThrow((full as Error).message);
  });
});
