/**
 * The function reference, built from the functions.json that the build generates from
 * the custom functions' JSDoc, so that the pane's reference cannot drift from what Excel
 * registers. DOM-free: {@link referenceEntries} turns the metadata into entries; the page
 * renders them (taskpane.ts) and the insert-example action writes their examples.
 *
 * Examples are taken from the descriptions: every `=ECHEM.ID(…)` (or `ECHEM.ID(…)`) written
 * there, with its parentheses, quotes and braces balanced, is one example.
 */
import type { SheetPlan } from './sheetPlan';
import { asCellText, sheetRef, uniqueSheetName } from './sheetNames';

/** The add-in's custom-function namespace (fixed in the manifest). */
export const NAMESPACE = 'ECHEM';

/** A parameter as functions.json describes it. */
export interface MetadataParameter {
  readonly name: string;
  readonly description?: string;
  readonly type?: string;
  readonly dimensionality?: string;
  readonly optional?: boolean;
  readonly repeating?: boolean;
}

/** A function as functions.json describes it. */
export interface MetadataFunction {
  readonly id: string;
  readonly name: string;
  readonly description?: string;
  readonly helpUrl?: string;
  readonly parameters?: readonly MetadataParameter[];
  readonly result?: { readonly type?: string; readonly dimensionality?: string };
}

/** One parameter of a reference entry. */
export interface ReferenceParam {
  readonly name: string;
  readonly optional: boolean;
  /** "one value" or "a value or a range" (a range argument also takes one cell) */
  readonly shape: string;
  readonly description: string;
}

/** One function of the reference. */
export interface ReferenceEntry {
  readonly id: string;
  /** The element id of its section, `ref-<lowercase id>`; functions' helpurl points here. */
  readonly anchor: string;
  /** e.g. "ECHEM.POTENTIAL" */
  readonly qualifiedName: string;
  /** e.g. "ECHEM.POTENTIAL(reaction, [species], [values], [temp_C], [table])" */
  readonly signature: string;
  /** The description as functions.json gives it (examples included). */
  readonly description: string;
  readonly params: readonly ReferenceParam[];
  /** "one value" or "one value, or a spilled range for several cases" */
  readonly returns: string;
  /** Example formulas, each starting with "=". */
  readonly examples: readonly string[];
}

/** The anchor of a function's reference entry. */
export function anchorOf(id: string): string {
  return `ref-${id.toLowerCase()}`;
}

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/**
 * Check the parsed functions.json and return its functions; throws an Error whose
 * message says what is wrong where the document is not custom-function metadata.
 */
export function readMetadata(json: unknown): MetadataFunction[] {
  if (!isObject(json) || !Array.isArray(json.functions)) {
    throw new Error(
      'functions.json has no "functions" list: the build did not generate the function metadata.',
    );
  }
  const out: MetadataFunction[] = [];
  json.functions.forEach((f: unknown, i: number) => {
    if (!isObject(f) || typeof f.id !== 'string' || typeof f.name !== 'string') {
      throw new Error(`functions.json entry ${i + 1} has no id or name.`);
    }
    const params: MetadataParameter[] = [];
    if (Array.isArray(f.parameters)) {
      for (const p of f.parameters as unknown[]) {
        if (!isObject(p) || typeof p.name !== 'string') continue;
        params.push({
          name: p.name,
          description: typeof p.description === 'string' ? p.description : undefined,
          type: typeof p.type === 'string' ? p.type : undefined,
          dimensionality: typeof p.dimensionality === 'string' ? p.dimensionality : undefined,
          optional: p.optional === true,
          repeating: p.repeating === true,
        });
      }
    }
    const result = isObject(f.result)
      ? {
          type: typeof f.result.type === 'string' ? f.result.type : undefined,
          dimensionality: typeof f.result.dimensionality === 'string' ? f.result.dimensionality : undefined,
        }
      : undefined;
    out.push({
      id: f.id,
      name: f.name,
      description: typeof f.description === 'string' ? f.description : undefined,
      helpUrl: typeof f.helpUrl === 'string' ? f.helpUrl : undefined,
      parameters: params,
      result,
    });
  });
  return out;
}

/**
 * The end (exclusive) of a formula call whose opening parenthesis is at `open`, or −1
 * where the parentheses never balance. Double-quoted strings (with `""` escapes) are
 * skipped, so a `)` inside a reaction text does not end the call.
 */
function callEnd(text: string, open: number): number {
  let depth = 0;
  for (let i = open; i < text.length; i++) {
    const ch = text[i];
    if (ch === '"') {
      i++;
      while (i < text.length) {
        if (text[i] === '"') {
          if (text[i + 1] === '"') i += 2;
          else break;
        } else i++;
      }
      continue;
    }
    if (ch === '(') depth++;
    else if (ch === ')') {
      depth--;
      if (depth === 0) return i + 1;
    }
  }
  return -1;
}

/**
 * The example formulas written in a description, in order.
 *
 * @example
 * extractExamples('Nernst slope in V per decade. Example: =ECHEM.NERNSTSLOPE(25, 1) gives 0.05916.')
 * // ['=ECHEM.NERNSTSLOPE(25, 1)']
 */
export function extractExamples(description: string): string[] {
  const examples: string[] = [];
  const call = new RegExp(`=?${NAMESPACE}\\.[A-Za-z][A-Za-z0-9_.]*\\(`, 'g');
  let m: RegExpExecArray | null;
  while ((m = call.exec(description))) {
    const open = m.index + m[0].length - 1;
    const end = callEnd(description, open);
    if (end < 0) continue;
    const formula = description.slice(m.index, end);
    examples.push(formula.startsWith('=') ? formula : `=${formula}`);
    call.lastIndex = end;
  }
  return examples;
}

/**
 * Reference entries from the parsed functions.json, in the order the build lists them.
 *
 * @throws Error where the document is not custom-function metadata
 */
export function referenceEntries(json: unknown): ReferenceEntry[] {
  return readMetadata(json).map((f) => {
    const params: ReferenceParam[] = (f.parameters ?? []).map((p) => ({
      name: p.name,
      optional: p.optional === true,
      shape: p.dimensionality === 'matrix' ? 'a value or a range' : 'one value',
      description: p.description ?? '',
    }));
    const args = params.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(', ');
    const description = f.description ?? '';
    return {
      id: f.id,
      anchor: anchorOf(f.id),
      qualifiedName: `${NAMESPACE}.${f.name}`,
      signature: `${NAMESPACE}.${f.name}(${args})`,
      description,
      params,
      returns:
        f.result?.dimensionality === 'matrix'
          ? 'one value, or a spilled range for several cases'
          : 'one value',
      examples: extractExamples(description),
    };
  });
}

/** The id a URL hash such as "#ref-potential" points at, or null. */
export function idFromHash(hash: string, entries: readonly ReferenceEntry[]): ReferenceEntry | null {
  const anchor = decodeURIComponent(hash.replace(/^#/, '')).toLowerCase();
  return entries.find((e) => e.anchor === anchor) ?? null;
}

/** The plan of an example sheet, with what the pane says after writing it. */
export interface ExampleSheetPlan extends SheetPlan {
  /** The cell holding the live formula (its result spills from there). */
  readonly formulaCell: string;
  readonly summary: string;
}

/**
 * A new sheet holding one example: its title in A1, the formula as text in B2, the live
 * formula in B3 (a spill grows down and right from there). Named "Example <ID>", made
 * unique against `existingSheets`.
 */
export function planExampleSheet(
  entry: Pick<ReferenceEntry, 'id' | 'qualifiedName'>,
  formula: string,
  existingSheets: readonly string[],
): ExampleSheetPlan {
  const sheetName = uniqueSheetName(`Example ${entry.id}`, existingSheets);
  const formulaCell = 'B3';
  return {
    sheetName,
    blocks: [
      {
        address: 'A1',
        values: [[`${entry.qualifiedName}: example from the function reference`]],
        bold: true,
      },
      { address: 'A2:A3', values: [['Formula'], ['Result']], bold: true },
      { address: 'B2', values: [[asCellText(formula)]], numberFormat: '@' },
      { address: formulaCell, formulas: [[formula]] },
    ],
    freezeRows: 0,
    formulaCell,
    summary: `Wrote ${formula} in ${sheetRef(sheetName)}!${formulaCell} of the new sheet "${sheetName}" (its text in B2).`,
  };
}
