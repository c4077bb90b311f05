/**
 * The E–pH SVG: a well-formed document whose regions, lines, labels, axes, title and caution
 * match the diagram. Checked by parsing the SVG (fast-xml-parser), not by string matching.
 */
import { XMLParser, XMLValidator } from 'fast-xml-parser';
import { ephDiagram, renderEphSvg } from '../../../src/engine';
import { engineErrorOf, expectNear } from '../../support';

type Node = Record<string, unknown>;
const parser = new XMLParser({
  ignoreAttributes: false,
  attributeNamePrefix: '@',
  isArray: (name) => ['g', 'polygon', 'line', 'text', 'pattern', 'rect', 'circle', 'path'].includes(name),
});

function parse(svg: string): Node {
  expect(XMLValidator.validate(svg)).toBe(true);
  return (parser.parse(svg) as { svg: Node }).svg;
}

function group(root: Node, cls: string): Node {
  const g = (root['g'] as Node[]).find((x) => String(x['@class']).split(' ').includes(cls));
  if (!g) throw new Error(`no group ${cls}`);
  return g;
}

function textOf(t: Node | string): string {
  return typeof t === 'string' ? t : String(t['#text'] ?? '');
}

describe('renderEphSvg', () => {
  const d = ephDiagram('Fe');
  const svg = renderEphSvg(d, { widthPx: 800, heightPx: 640, referenceScale: 'SCE' });
  const root = parse(svg);

  test('size and title carry the element, activity and temperature', () => {
    expect(root['@width']).toBe('800');
    expect(root['@height']).toBe('640');
    expect(String(root['title'])).toMatch(/iron \(Fe\).*activity 1e-6, 25 °C/);
  });
  test('one polygon per region, filled by class, in the element order', () => {
    const polys = group(root, 'regions')['polygon'] as Node[];
    expect(polys.map((p) => p['@data-species'])).toEqual(d.regions.map((r) => r.species));
    const byClass = Object.fromEntries(polys.map((p) => [p['@data-species'], p['@fill']]));
    expect(byClass['Fe(s)']).toMatch(/^#/);
    expect(byClass['Fe2+']).toBe('url(#eph-hatch)');
    expect(byClass['Fe2O3(s)']).toBe('url(#eph-dots)');
  });
  test('boundary lines and two dashed water lines', () => {
    const lines = group(root, 'boundaries')['line'] as Node[];
    expect(lines).toHaveLength(d.boundaries.length);
    const water = group(root, 'water');
    expect(water['@stroke-dasharray']).toBeDefined();
    expect((water['line'] as Node[]).map((l) => l['@data-couple'])).toEqual(['H+/H2(g)', 'O2(g)/H2O(l)']);
  });
  test('the hydrogen line is drawn at E = 0 at pH 0 (plot coordinates by hand)', () => {
    // window E −2…+2 V over a plot from y = 48 to 640 − 96 px: E = 0 is midway, y = 296
    const h = (group(root, 'water')['line'] as Node[])[0] as Node;
    expectNear(Number(h['@y1']), 48 + (640 - 48 - 96) / 2, 0.01);
    expectNear(Number(h['@x1']), 64, 0.01);
  });
  test('each region is labelled with its species', () => {
    const labels = (group(root, 'labels')['text'] as Node[]).map(textOf);
    expect(labels).toEqual(expect.arrayContaining(['Fe', 'Fe2+', 'Fe3+', 'Fe3O4', 'Fe2O3']));
  });
  test('axes: pH, V vs SHE, and the SCE axis shifted by −0.2412 V (Int. J. Corrosion 2010, Table 2)', () => {
    const axisTitles = (root['g'] as Node[])
      .filter((g) => String(g['@class']).startsWith('axis'))
      .flatMap((g) => (g['text'] as Node[]).filter((t) => t['@class'] === 'axis-title').map(textOf));
    expect(axisTitles).toEqual(['pH', 'E (V vs SHE)', 'E (V vs SCE)']);
    const ref = group(root, 'ref');
    expect(ref['@data-reference']).toBe('SCE');
    // a tick labelled 0 V vs SCE sits at +0.2412 V vs SHE: y = 48 + (2 − 0.2412)/4 · 496
    const ticks = (ref['text'] as Node[]).filter((t) => t['@class'] === 'tick');
    const zero = ticks.find((t) => textOf(t) === '0');
    expect(zero).toBeDefined();
    expectNear(Number(zero?.['@y']) - 4, 48 + ((2 - 0.2412) / 4) * 496, 0.6);
  });
  test('legend with the three classes and the caution', () => {
    const legend = (group(root, 'legend')['text'] as Node[]).map(textOf);
    expect(legend).toEqual(['immunity', 'corrosion', 'passivation']);
    const caution = (root['text'] as Node[]).find((t) => t['@class'] === 'caution');
    expect(textOf(caution as Node)).toMatch(
      /thermodynamic estimate; kinetics and local chemistry decide; follow applicable standards/i,
    );
  });
  test('a pH-dependent reference scale and bad sizes are refused', () => {
    expect(engineErrorOf(() => renderEphSvg(d, { referenceScale: 'RHE' })).message).toMatch(/depends on pH/);
    expect(engineErrorOf(() => renderEphSvg(d, { widthPx: 10 })).message).toMatch(
      /widthPx must be between 320 and 4000 px/,
    );
    expect(engineErrorOf(() => renderEphSvg(d, { referenceScale: 'nowhere' })).kind).toBe('notFound');
  });
  test('no reference axis unless asked; text is escaped', () => {
    const plain = parse(renderEphSvg(ephDiagram('Cu')));
    expect((plain['g'] as Node[]).some((g) => String(g['@class']).includes('ref'))).toBe(false);
    expect(renderEphSvg(ephDiagram('Cu'))).not.toMatch(/<text[^>]*>[^<]*&(?!amp;|lt;|gt;|quot;)/);
  });
});
