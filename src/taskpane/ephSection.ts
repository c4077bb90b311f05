/**
 * The E–pH diagram section's link to the engine, in one place. The section draws a
 * diagram with the engine's SVG renderer and writes one to a new sheet with the
 * worksheet function that spills its boundary lines; where the engine or the catalogue
 * lacks either, {@link ephSupport} says so and the page hides the section (or disables
 * the write button).
 *
 * What the section uses, all through the engine's index and the catalogue:
 * - `ephDiagram(element, activity, tempC)` and `renderEphSvg(diagram, { widthPx, heightPx,
 *   referenceScale })`: the diagram as SVG text, E in V vs SHE on the left axis, pH along
 *   the bottom, and a second E axis on the chosen reference scale;
 * - `EPH_ELEMENTS` (`{ symbol, name }`): the elements offered;
 * - the worksheet function `EPHLINES(element, [activity], [temp_C], [pH_min], [pH_max])`
 *   through `callFunction`: a header row, then segments species A | species B | pH1 | E1 |
 *   pH2 | E2 (E in V vs SHE), the water lines last.
 */
import { EPH_ELEMENTS, ephDiagram, renderEphSvg } from '../engine/index';
import { callFunction, isCellError, type Result } from '../functions/catalogue';
import type { CellBlock, SheetPlan } from './sheetPlan';
import { asCellText, cellAddress, uniqueSheetName } from './sheetNames';
import { CAUTIONS, formatValue, readNumber } from './sweepPlan';

/** What the section asks the renderer to draw. */
export interface EphDrawRequest {
  /** Element symbol, e.g. "Fe". */
  readonly element: string;
  /** Activity of the dissolved species of the element (dimensionless; 1e-6 is usual in corrosion work). */
  readonly activity: number;
  readonly tempC: number;
  /** A reference electrode for a second E axis ("SCE", "Ag/AgCl 3.5 M KCl", "Cu/CuSO4"…), or null. */
  readonly referenceScale: string | null;
  /** Size of the drawing in CSS pixels. */
  readonly widthPx: number;
  readonly heightPx: number;
}

/** The renderer the section calls. */
export type EphRenderer = (request: EphDrawRequest) => string;

/** The elements the section offers where the engine lists none (`EPH_ELEMENTS`). */
export const DEFAULT_EPH_ELEMENTS: readonly { symbol: string; name: string }[] = [];

/** What the engine and catalogue offer the section. */
export interface EphSupport {
  readonly render: EphRenderer | null;
  /** True where the catalogue has EPHLINES (the sheet the section writes uses it). */
  readonly lines: boolean;
  /** The elements to offer: symbol and name. */
  readonly elements: readonly { readonly symbol: string; readonly name: string }[];
}

/** The smallest drawing the renderer makes, in px. */
export const EPH_MIN_WIDTH_PX = 320;

/**
 * What the section takes from the engine, by name (a namespace import of the engine would keep
 * every engine export in dist/functions.js, used or not).
 */
const ENGINE_EPH: Record<string, unknown> = { renderEphSvg, ephDiagram, EPH_ELEMENTS };

/**
 * The engine's renderer (wrapped so that the section passes one request), its element
 * list, and whether the catalogue has EPHLINES.
 */
export function ephSupport(source: Record<string, unknown> = ENGINE_EPH): EphSupport {
  const renderSvg = source['renderEphSvg'];
  const diagram = source['ephDiagram'];
  const list = source['EPH_ELEMENTS'];
  const elements = Array.isArray(list)
    ? (list as unknown[]).flatMap((e) =>
        typeof e === 'object' && e !== null && typeof (e as { symbol?: unknown }).symbol === 'string'
          ? [{ symbol: (e as { symbol: string }).symbol, name: String((e as { name?: unknown }).name ?? '') }]
          : [],
      )
    : DEFAULT_EPH_ELEMENTS;
  const render: EphRenderer | null =
    typeof renderSvg === 'function' && typeof diagram === 'function' && elements.length > 0
      ? (r) =>
          (renderSvg as (d: unknown, o: unknown) => string)(
            (diagram as (e: string, a: number, t: number) => unknown)(r.element, r.activity, r.tempC),
            {
              widthPx: Math.max(EPH_MIN_WIDTH_PX, Math.round(r.widthPx)),
              heightPx: Math.max(280, Math.round(r.heightPx)),
              referenceScale: r.referenceScale ?? undefined,
            },
          )
      : null;
  const probe = callFunction('EPHLINES', [elements[0]?.symbol ?? 'Fe'])[0]?.[0];
  const missing = isCellError(probe) && /There is no function/.test(probe.message);
  return { render, lines: !missing, elements };
}

/** The E–pH form as typed. */
export interface EphForm {
  readonly element: string;
  readonly activity: string;
  readonly tempC: string;
  readonly referenceScale: string;
}

/** The checked inputs, or one message per problem. */
export function readEphForm(
  form: EphForm,
  decimalComma = false,
):
  | { ok: true; element: string; activity: number; tempC: number; referenceScale: string | null }
  | { ok: false; errors: { field: string; label: string; message: string }[] } {
  const errors: { field: string; label: string; message: string }[] = [];
  const element = form.element.trim();
  if (!/^[A-Z][a-z]?$/.test(element)) {
    errors.push({
      field: 'element',
      label: 'Element',
      message:
        element === '' ? 'Choose an element.' : `"${element}" is not an element symbol (for example Fe).`,
    });
  }
  const activity = readNumber(form.activity, decimalComma);
  if (activity === null || !(activity > 0) || activity > 1) {
    errors.push({
      field: 'activity',
      label: 'Activity',
      message: `Give the activity of the dissolved species as a number above 0 and at most 1 (1e-6 is usual); "${form.activity}" is not one.`,
    });
  }
  const tempC = readNumber(form.tempC, decimalComma);
  if (tempC === null || tempC < 0 || tempC > 100) {
    errors.push({
      field: 'tempC',
      label: 'Temperature',
      message: `Give the temperature in °C, from 0 to 100; "${form.tempC}" is not one.`,
    });
  }
  if (errors.length > 0) return { ok: false, errors };
  return {
    ok: true,
    element,
    activity: activity as number,
    tempC: tempC as number,
    referenceScale: form.referenceScale === '' || form.referenceScale === 'SHE' ? null : form.referenceScale,
  };
}

/** The diagram's lines from EPHLINES (header row first), or the function's message. */
export function ephLines(input: { element: string; activity: number; tempC: number }): Result | string {
  const r = callFunction('EPHLINES', [input.element, input.activity, input.tempC]);
  const first = r[0]?.[0];
  return isCellError(first) ? first.message : r;
}

/**
 * A new sheet with the diagram: the inputs in B1:B3, one spilled EPHLINES formula at A7
 * (header, then one boundary segment per row), an x–y block in H:I that lists each
 * segment's two ends with an empty row between segments (so one chart series draws every
 * segment apart), and an XY chart of E against pH. Named "E-pH <element>", made unique.
 * `lineRows` is the number of segment rows EPHLINES gives for these inputs.
 */
export function ephSheetPlan(
  input: { element: string; activity: number; tempC: number },
  lineRows: number,
  existingSheets: readonly string[],
): SheetPlan & { summary: string; formula: string } {
  const sheetName = uniqueSheetName(`E-pH ${input.element}`, existingSheets);
  const formula = '=ECHEM.EPHLINES(B1,B2,B3)';
  const firstLine = 8; // A7 holds the header of the spill
  const xyTop = 7;
  const xy: string[][] = [];
  for (let i = 0; i < lineRows; i++) {
    const r = firstLine + i;
    xy.push([`=C${r}`, `=D${r}`], [`=E${r}`, `=F${r}`]);
  }
  const xyLast = xyTop + 3 * lineRows - 1;
  const blocks: CellBlock[] = [
    { address: 'A1:A4', values: [['Element'], ['Activity'], ['temp_C'], ['Caution']], bold: true },
    { address: 'B1', values: [[asCellText(input.element)]], numberFormat: '@' },
    { address: 'B2:B4', values: [[input.activity], [input.tempC], [CAUTIONS]] },
    {
      address: 'C2:C3',
      values: [
        [
          'Activity of the dissolved species (dimensionless; for a dilute ideal solution, mol/L divided by 1 mol/L).',
        ],
        ['°C'],
      ],
      italic: true,
    },
    { address: 'A6', values: [['Boundary lines (E in V vs SHE), spilled by:']], bold: true },
    { address: 'A7', formulas: [[formula]] },
    { address: 'H6:I6', values: [['pH', 'E / V vs SHE']], bold: true },
  ];
  for (let i = 0; i < lineRows; i++) {
    const row = xyTop + 3 * i;
    blocks.push({ address: `H${row}:I${row + 1}`, formulas: xy.slice(2 * i, 2 * i + 2) });
  }
  const plan: SheetPlan & { summary: string; formula: string } = {
    sheetName,
    formula,
    blocks,
    freezeRows: 0,
    summary:
      `Created sheet "${sheetName}": the inputs in B1:B3 (${input.element}, activity ${formatValue(input.activity)}, ` +
      `${formatValue(input.tempC)} °C), ${formula} in A7 spilling ${lineRows} boundary lines, ` +
      `their end points in H7:I${xyLast}, and a chart of E against pH.`,
  };
  if (lineRows === 0) return plan;
  return {
    ...plan,
    chart: {
      type: 'XYScatterLines',
      source: `I6:I${xyLast}`,
      xValues: `H7:H${xyLast}`,
      yValues: `I7:I${xyLast}`,
      seriesName: 'Boundaries',
      title: `E–pH diagram of ${input.element}, activity ${formatValue(input.activity)}, ${formatValue(input.tempC)} °C`,
      xTitle: 'pH',
      yTitle: 'E / V vs SHE',
      topLeft: cellAddress(11, 6),
      bottomRight: cellAddress(19, 30),
    },
  };
}

/**
 * The renderer's SVG text as an element safe to put in the page: parsed as SVG, with any
 * script, foreignObject, event-handler attribute and non-local link dropped.
 */
export function sanitizedSvg(svgText: string, doc: Document): SVGSVGElement | null {
  const parsed = new DOMParser().parseFromString(svgText, 'image/svg+xml');
  const root = parsed.documentElement;
  if (root.nodeName.toLowerCase() !== 'svg' || parsed.getElementsByTagName('parsererror').length > 0)
    return null;
  for (const bad of Array.from(root.querySelectorAll('script, foreignObject'))) bad.remove();
  for (const el of [root, ...Array.from(root.querySelectorAll('*'))]) {
    for (const attr of Array.from(el.attributes)) {
      const name = attr.name.toLowerCase();
      if (name.startsWith('on')) el.removeAttribute(attr.name);
      if ((name === 'href' || name === 'xlink:href') && !attr.value.startsWith('#'))
        el.removeAttribute(attr.name);
    }
  }
  return doc.importNode(root, true) as unknown as SVGSVGElement;
}
