/**
 * The E–pH diagram section's link to the engine, in one place. The section draws a
 * diagram with the engine's SVG renderer and writes one to a new sheet with the
 * worksheet function that spills its boundary lines; where the engine or the catalogue
 * lacks either, {@link ephSupport} says so and the page hides the section.
 *
 * The interface the section expects (adapt it here, and only here, to the engine's):
 * - `renderEphSvg(request: EphDrawRequest): string` exported by src/engine/index.ts:
 *   the diagram as SVG text (no script), E in V vs SHE on the left axis, pH along the
 *   bottom, and where `referenceScale` is given a second axis of E on that scale;
 * - the catalogue function `EPHLINES(element, [activity], [temp_C], [pH_min], [pH_max])`
 *   through `callFunction`: rows of boundary segments, first row a header.
 */
import * as engine from '../engine/index';
import { callFunction, isCellError } from '../functions/catalogue';
import type { SheetPlan } from './sheetPlan';
import { asCellText, uniqueSheetName } from './sheetNames';
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

/** The elements the section offers where the engine exports no list of its own (`EPH_ELEMENTS`). */
export const DEFAULT_EPH_ELEMENTS: readonly string[] = [
  'Fe',
  'Cu',
  'Zn',
  'Al',
  'Ni',
  'Cr',
  'Pb',
  'Sn',
  'Mg',
  'Ag',
];

/** What the engine and catalogue offer the section. */
export interface EphSupport {
  readonly render: EphRenderer | null;
  /** True where the catalogue has EPHLINES (the sheet the section writes uses it). */
  readonly lines: boolean;
  /** The element symbols to offer. */
  readonly elements: readonly string[];
}

/** The engine's renderer and the catalogue's EPHLINES, where present. */
export function ephSupport(
  source: Record<string, unknown> = engine as unknown as Record<string, unknown>,
): EphSupport {
  const r = source['renderEphSvg'];
  const probe = callFunction('EPHLINES', ['Fe'])[0]?.[0];
  const missing = isCellError(probe) && /There is no function/.test(probe.message);
  const list = source['EPH_ELEMENTS'];
  const elements =
    Array.isArray(list) && list.every((e) => typeof e === 'string')
      ? (list as string[])
      : DEFAULT_EPH_ELEMENTS;
  return { render: typeof r === 'function' ? (r as EphRenderer) : null, lines: !missing, elements };
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
  if (activity === null || !(activity > 0) || activity > 10) {
    errors.push({
      field: 'activity',
      label: 'Activity',
      message: `Give the activity of the dissolved species as a number above 0 and at most 10 (1e-6 is usual); "${form.activity}" is not one.`,
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

/**
 * A new sheet with the diagram's inputs and one spilled EPHLINES formula (the boundary
 * segments of the diagram, for the user's own XY chart), under a name no sheet has.
 */
export function ephSheetPlan(
  input: { element: string; activity: number; tempC: number },
  existingSheets: readonly string[],
): SheetPlan & { summary: string; formula: string } {
  const sheetName = uniqueSheetName(`E-pH ${input.element}`, existingSheets);
  const formula = `=ECHEM.EPHLINES(B1,B2,B3)`;
  return {
    sheetName,
    formula,
    blocks: [
      { address: 'A1:A4', values: [['Element'], ['Activity'], ['temp_C'], ['Caution']], bold: true },
      { address: 'B1', values: [[asCellText(input.element)]], numberFormat: '@' },
      { address: 'B2:B4', values: [[input.activity], [input.tempC], [CAUTIONS]] },
      {
        address: 'C2',
        values: [
          [
            'Activity of the dissolved species of the element (dimensionless; for a dilute ideal solution, mol/L divided by 1 mol/L).',
          ],
        ],
        italic: true,
      },
      { address: 'A6', values: [['Boundary lines (E in V vs SHE):']], bold: true },
      { address: 'A7', formulas: [[formula]] },
    ],
    freezeRows: 0,
    summary:
      `Created sheet "${sheetName}": the inputs in B1:B3 (${input.element}, activity ${formatValue(input.activity)}, ` +
      `${formatValue(input.tempC)} °C) and ${formula} in A7, spilling the diagram's boundary lines.`,
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
