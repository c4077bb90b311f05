/**
 * Spills written as dynamic arrays. ExcelJS writes a formula over a range as a legacy array
 * formula (`<f t="array" ref="…">`), which other spreadsheet programs may recompute as a
 * fixed block. A dynamic array is the same formula element with the anchor cell pointing at
 * the dynamic-array cell metadata (`cm="1"`), declared in the workbook's metadata part
 * (xl/metadata.xml, metadata type XLDAPR with the dynamicArrayProperties extension; Office
 * Open XML, ECMA-376 Part 1 §18.9, and the Excel 2017 dynamic-array extension). This module
 * adds that part, its relationship and content type, and the `cm` attribute on the anchors.
 *
 * Recalculation on open (`calcPr fullCalcOnLoad`): an output keeps its input's setting. The
 * shipped templates set it (they are made to be opened in Excel with the add-in, which then
 * computes every cell); the values cached in an output are what the runner computed, for
 * readers that do not calculate. Excel also recalculates any file saved by an older
 * calculation engine (a lower `calcId`) on open.
 */
import { jsZip } from './excelModel';

const MAIN_NS = 'http://schemas.openxmlformats.org/spreadsheetml/2006/main';
const METADATA_REL = 'http://schemas.openxmlformats.org/officeDocument/2006/relationships/sheetMetadata';
const METADATA_TYPE = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml';

/** The metadata part: one dynamic-array cell metadata record, index 1 for `cm="1"`. */
export const METADATA_XML =
  '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n' +
  `<metadata xmlns="${MAIN_NS}" xmlns:xda="http://schemas.microsoft.com/office/spreadsheetml/2017/dynamicarray">` +
  '<metadataTypes count="1"><metadataType name="XLDAPR" minSupportedVersion="120000" copy="1" pasteAll="1" ' +
  'pasteValues="1" merge="1" splitFirst="1" rowColShift="1" clearFormats="1" clearComments="1" assign="1" ' +
  'coerce="1" cellMeta="1"/></metadataTypes>' +
  '<futureMetadata name="XLDAPR" count="1"><bk><extLst><ext uri="{bdbb8cdc-fa1e-496e-a857-3c3f30c029c3}">' +
  '<xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"/></ext></extLst></bk></futureMetadata>' +
  '<cellMetadata count="1"><bk><rc t="1" v="0"/></bk></cellMetadata></metadata>';

/** Anchor cells ("E7") of the spills on each sheet, by sheet name. */
export type SpillAnchors = ReadonlyMap<string, ReadonlySet<string>>;

function attr(tag: string, name: string): string | undefined {
  return new RegExp(`\\s${name}="([^"]*)"`).exec(tag)?.[1];
}

/** Text with the five predefined XML entities resolved. */
export function unescapeXml(s: string): string {
  return s
    .replace(/&quot;/g, '"')
    .replace(/&apos;/g, "'")
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&amp;/g, '&');
}

/** The part name of each sheet, by sheet name, from the workbook part and its relationships. */
export function sheetParts(workbookXml: string, relsXml: string): Map<string, string> {
  const targets = new Map<string, string>();
  for (const m of relsXml.matchAll(/<Relationship\b[^>]*>/g)) {
    const id = attr(m[0], 'Id');
    const target = attr(m[0], 'Target');
    if (id !== undefined && target !== undefined) {
      targets.set(id, target.startsWith('/') ? target.slice(1) : `xl/${target}`);
    }
  }
  const parts = new Map<string, string>();
  for (const m of workbookXml.matchAll(/<sheet\b[^>]*>/g)) {
    const name = attr(m[0], 'name');
    const id = attr(m[0], 'r:id');
    const part = id === undefined ? undefined : targets.get(id);
    if (name !== undefined && part !== undefined) parts.set(unescapeXml(name), part);
  }
  return parts;
}

/**
 * Marks the anchors' array formulas as dynamic arrays in the .xlsx `data`; returns the new
 * package (the same bytes where there is nothing to mark). Only cells holding an array
 * formula are marked.
 */
export async function withDynamicArrays(data: Uint8Array, anchors: SpillAnchors): Promise<Uint8Array> {
  const zip = await jsZip().loadAsync(data);
  const workbookXml = await zip.file('xl/workbook.xml')?.async('string');
  const relsXml = await zip.file('xl/_rels/workbook.xml.rels')?.async('string');
  const typesXml = await zip.file('[Content_Types].xml')?.async('string');
  if (workbookXml === undefined || relsXml === undefined || typesXml === undefined) return data;
  let marked = 0;
  const parts = sheetParts(workbookXml, relsXml);
  for (const [sheet, cells] of anchors) {
    const part = parts.get(sheet);
    const xml = part === undefined ? undefined : await zip.file(part)?.async('string');
    if (part === undefined || xml === undefined || cells.size === 0) continue;
    const updated = xml.replace(
      /<c\b([^>]*)>(\s*<f\b[^>]*\bt="array")/g,
      (whole, attrs: string, f: string) => {
        const r = attr(attrs, 'r');
        if (r === undefined || !cells.has(r) || /\scm="/.test(attrs)) return whole;
        marked++;
        return `<c${attrs} cm="1">${f}`;
      },
    );
    zip.file(part, updated);
  }
  if (marked === 0) return data;
  zip.file('xl/metadata.xml', METADATA_XML);
  if (!relsXml.includes(METADATA_REL)) {
    zip.file(
      'xl/_rels/workbook.xml.rels',
      relsXml.replace(
        '</Relationships>',
        `<Relationship Id="rIdPotentiaMetadata" Type="${METADATA_REL}" Target="metadata.xml"/></Relationships>`,
      ),
    );
  }
  if (!typesXml.includes('/xl/metadata.xml')) {
    zip.file(
      '[Content_Types].xml',
      typesXml.replace(
        '</Types>',
        `<Override PartName="/xl/metadata.xml" ContentType="${METADATA_TYPE}"/></Types>`,
      ),
    );
  }
  return zip.generateAsync({ type: 'uint8array', compression: 'DEFLATE' });
}
