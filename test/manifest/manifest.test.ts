/**
 * The add-in manifest, checked offline (the Office validator service needs the network):
 * well-formed XML, a GUID id, the ECHEM namespace, a shared runtime, every resid defined and
 * of the right kind, minimal permissions, and every URL pointing at a file of the build.
 */
import * as fs from 'fs';
import * as path from 'path';
import { XMLParser, XMLValidator } from 'fast-xml-parser';
import { BUILD_TIMEOUT_MS, DIST, ROOT, ensureBuilt } from '../build/ensureBuilt';

const MANIFEST = path.join(ROOT, 'manifest', 'manifest.xml');
const DEV_ORIGIN = 'https://localhost:3000/';

type Node = { [key: string]: unknown };
interface Element {
  name: string;
  attrs: Record<string, string>;
  node: Node;
}

const xml = fs.readFileSync(MANIFEST, 'utf8');
const doc = new XMLParser({
  ignoreAttributes: false,
  attributeNamePrefix: '@_',
  parseAttributeValue: false,
}).parse(xml) as Node;
const app = doc.OfficeApp as Node;

/** Every element of the tree, depth first, with its attributes. */
function elements(node: unknown, name = '', out: Element[] = []): Element[] {
  if (Array.isArray(node)) {
    for (const n of node) elements(n, name, out);
    return out;
  }
  if (typeof node !== 'object' || node === null) {
    if (name) out.push({ name, attrs: {}, node: {} });
    return out;
  }
  const obj = node as Node;
  const attrs: Record<string, string> = {};
  for (const [k, v] of Object.entries(obj)) if (k.startsWith('@_')) attrs[k.slice(2)] = String(v);
  if (name) out.push({ name, attrs, node: obj });
  for (const [k, v] of Object.entries(obj)) if (!k.startsWith('@_') && k !== '#text') elements(v, k, out);
  return out;
}

const all = elements(app, 'OfficeApp');
/** Every URL the manifest gives (attribute values other than XML namespace names). */
const manifestUrls = all.flatMap((e) =>
  Object.entries(e.attrs)
    .filter(([k, v]) => !k.startsWith('xmlns') && /^[a-z]+:\/\//i.test(v))
    .map(([, v]) => v),
);
const resources = ((app.VersionOverrides as Node).Resources ?? {}) as Node;

const duplicateIds: string[] = [];
/** Resource ids by kind (Images, Urls, ShortStrings, LongStrings) → id → DefaultValue. */
function resourceTable(kind: string, item: string): Map<string, string> {
  const table = new Map<string, string>();
  for (const e of elements(resources[kind], kind)) {
    if (e.name === item && e.attrs.id !== undefined) {
      if (table.has(e.attrs.id)) duplicateIds.push(e.attrs.id);
      table.set(e.attrs.id, e.attrs.DefaultValue ?? '');
    }
  }
  return table;
}
const images = resourceTable('bt:Images', 'bt:Image');
const urls = resourceTable('bt:Urls', 'bt:Url');
const shortStrings = resourceTable('bt:ShortStrings', 'bt:String');
const longStrings = resourceTable('bt:LongStrings', 'bt:String');

function firstElement(name: string, pred: (e: Element) => boolean = () => true): Element {
  const e = all.find((x) => x.name === name && pred(x));
  if (!e) throw new Error(`manifest has no <${name}>`);
  return e;
}
const customFunctions = firstElement('ExtensionPoint', (e) => e.attrs['xsi:type'] === 'CustomFunctions');
const cfElements = elements(customFunctions.node, 'ExtensionPoint');
const sourceResid = (section: string) => {
  const loc = (customFunctions.node[section] as Node).SourceLocation as Node;
  return String(loc['@_resid']);
};

/** The dist/ file a development URL stands for. */
function distFile(url: string): string {
  expect(url.startsWith(DEV_ORIGIN)).toBe(true);
  return path.join(DIST, url.slice(DEV_ORIGIN.length).replace(/[#?].*$/, ''));
}

/** Width and height of a PNG file (from its IHDR chunk). */
function pngSize(file: string): [number, number] {
  const b = fs.readFileSync(file);
  expect(b.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
  expect(b.subarray(12, 16).toString('ascii')).toBe('IHDR');
  return [b.readUInt32BE(16), b.readUInt32BE(20)];
}

describe('manifest/manifest.xml', () => {
  it('is well-formed XML with an OfficeApp task pane root', () => {
    expect(XMLValidator.validate(xml)).toBe(true);
    expect(app['@_xsi:type']).toBe('TaskPaneApp');
    expect((app.Hosts as Node).Host).toEqual({ '@_Name': 'Workbook' });
  });

  it('has a GUID for its Id and a four-part version', () => {
    expect(String(app.Id)).toMatch(
      /^[0-9a-f]{8}-[0-9a-f]{4}-[1-5][0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/i,
    );
    expect(String(app.Version)).toMatch(/^\d+\.\d+\.\d+\.\d+$/);
  });

  it('puts the custom functions in the ECHEM namespace', () => {
    const ns = customFunctions.node.Namespace as Node;
    expect(shortStrings.get(String(ns['@_resid']))).toBe('ECHEM');
  });

  it('declares a shared runtime: functions and task pane run in the same long-lived page', () => {
    const runtime = firstElement('Runtime');
    expect(runtime.attrs.lifetime).toBe('long');
    expect(runtime.attrs.resid).toBe('Taskpane.Url');
    expect(sourceResid('Page')).toBe(runtime.attrs.resid);
    expect(firstElement('FunctionFile').attrs.resid).toBe(runtime.attrs.resid);
    const action = firstElement('Action', (e) => e.attrs['xsi:type'] === 'ShowTaskpane');
    expect(((action.node.SourceLocation as Node)['@_resid'] as string) ?? '').toBe(runtime.attrs.resid);
    const sets = elements((app.Requirements as Node).Sets, 'Sets').filter((e) => e.name === 'Set');
    expect(sets.map((s) => s.attrs.Name)).toContain('SharedRuntime');
  });

  it('asks for no more than ReadWriteDocument (the task pane creates sheets)', () => {
    expect(app.Permissions).toBe('ReadWriteDocument');
  });

  it('defines every resid it uses, with a resource of the right kind', () => {
    const used = all.filter((e) => e.attrs.resid !== undefined);
    expect(used.length).toBeGreaterThan(10);
    expect(duplicateIds).toEqual([]);
    const defined = new Set([
      ...images.keys(),
      ...urls.keys(),
      ...shortStrings.keys(),
      ...longStrings.keys(),
    ]);
    for (const e of used)
      expect({ element: e.name, resid: e.attrs.resid, defined: defined.has(e.attrs.resid!) }).toEqual({
        element: e.name,
        resid: e.attrs.resid,
        defined: true,
      });
    const kindOf: Record<string, Map<string, string>> = {
      SourceLocation: urls,
      Runtime: urls,
      FunctionFile: urls,
      LearnMoreUrl: urls,
      'bt:Image': images,
      Namespace: shortStrings,
      Label: shortStrings,
      Title: shortStrings,
      Description: longStrings,
    };
    for (const e of used) {
      const table = kindOf[e.name];
      expect({ element: e.name, known: table !== undefined }).toEqual({ element: e.name, known: true });
      expect({ element: e.name, resid: e.attrs.resid, ok: table!.has(e.attrs.resid!) }).toEqual({
        element: e.name,
        resid: e.attrs.resid,
        ok: true,
      });
    }
  });

  it('keeps short strings within 125 characters and long strings within 250', () => {
    for (const [id, s] of shortStrings) expect({ id, length: s.length <= 125 }).toEqual({ id, length: true });
    for (const [id, s] of longStrings) expect({ id, length: s.length <= 250 }).toEqual({ id, length: true });
  });

  it('points only at the add-in’s own origin (no other host is contacted)', () => {
    expect(manifestUrls.length).toBeGreaterThan(5);
    expect(manifestUrls.filter((v) => !v.startsWith(DEV_ORIGIN))).toEqual([]);
  });

  describe('after the build', () => {
    beforeAll(ensureBuilt, BUILD_TIMEOUT_MS);

    it('is copied unchanged into dist/', () => {
      expect(fs.readFileSync(path.join(DIST, 'manifest.xml'), 'utf8')).toBe(xml);
    });

    it('has its functions script, metadata and page in dist/', () => {
      const script = urls.get(sourceResid('Script'))!;
      const metadata = urls.get(sourceResid('Metadata'))!;
      const page = urls.get(sourceResid('Page'))!;
      expect(path.basename(distFile(script))).toBe('functions.js');
      expect(path.basename(distFile(metadata))).toBe('functions.json');
      expect(path.basename(distFile(page))).toBe('taskpane.html');
      for (const url of [script, metadata, page]) expect(fs.existsSync(distFile(url))).toBe(true);
      expect(cfElements.filter((e) => e.name === 'SourceLocation')).toHaveLength(3);
    });

    it('resolves every URL to a file of dist/', () => {
      const values = all.flatMap((e) => Object.values(e.attrs)).filter((v) => v.startsWith(DEV_ORIGIN));
      for (const v of values)
        expect({ url: v, exists: fs.existsSync(distFile(v)) }).toEqual({ url: v, exists: true });
    });

    it('has icons that are PNGs of the sizes it declares', () => {
      expect(pngSize(distFile(String((app.IconUrl as Node)['@_DefaultValue'])))).toEqual([32, 32]);
      expect(pngSize(distFile(String((app.HighResolutionIconUrl as Node)['@_DefaultValue'])))).toEqual([
        64, 64,
      ]);
      const sized = all.filter((e) => e.name === 'bt:Image' && e.attrs.size !== undefined);
      expect(sized.length).toBeGreaterThanOrEqual(3);
      for (const e of sized) {
        const n = Number(e.attrs.size);
        expect(pngSize(distFile(images.get(e.attrs.resid!)!))).toEqual([n, n]);
      }
      for (const n of [16, 32, 64, 80, 128])
        expect(pngSize(path.join(DIST, 'assets', `icon-${n}.png`))).toEqual([n, n]);
    });
  });
});
