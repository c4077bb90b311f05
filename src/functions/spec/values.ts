/**
 * Reading the arguments that are not one cell: species headers (with the one header grammar,
 * src/engine/notation/speciesHeader.ts), values matrices, lists and the potentials table.
 * See docs/design.md, "Sweeps".
 */
import { EngineError, canonicalSpeciesHeader, cellOf } from '../../engine';
import { isInputErrorText, type Arg, type Grid, type Scalar, type TableCells } from '../cellTypes';
import { asGrid, asList, isBlank, isBlankGrid, isEmptyTextGrid, readNumber, shapeOf } from '../args';
import { inputErrorOf } from './kinds';

export type { TableCells } from '../cellTypes';

/** A table argument: its cells, or null where it is absent or empty. */
export function tableCells(arg: Arg): TableCells {
  const g = asGrid(arg);
  return isEmptyTextGrid(g) ? null : (g as TableCells);
}

/** Species headers from a row or column of names, in canonical spelling. */
export function readHeaders(arg: Arg, name: string): string[] {
  const sg = asGrid(arg);
  const names = isEmptyTextGrid(sg) ? [] : asList(sg, name);
  return names.map((s, i) => {
    if (isInputErrorText(s)) throw inputErrorOf(`${name} entry ${i + 1}`, String(s));
    if (typeof s !== 'string' || s.trim() === '') {
      throw new EngineError(
        'argument',
        `${name} entry ${i + 1} must be a species name such as "Cu2+" or "pH"; got ${isBlank(s) ? 'an empty cell' : String(s)}.`,
        name,
      );
    }
    return canonicalSpeciesHeader(s);
  });
}

/** A values matrix checked against its headers: one row per case (null where no species). */
export function readValueRows(
  headers: readonly string[],
  valuesArg: Arg,
  valuesName: string,
  headerName: string,
): Grid | null {
  const vg = asGrid(valuesArg);
  if (headers.length === 0) {
    if (!isBlankGrid(vg))
      throw new EngineError(
        'argument',
        `${valuesName} are given but ${headerName} is empty: name the species of each ${valuesName} column.`,
        headerName,
      );
    return null;
  }
  if (!vg)
    throw new EngineError(
      'argument',
      `${valuesName} is missing: give one value per species (${headers.join(', ')}).`,
      valuesName,
    );
  const k = headers.length;
  const width = vg[0]?.length ?? 0;
  if (width === k) return vg;
  if (k > 1 && vg.length === k && vg.every((r) => r.length === 1)) return [vg.map((r) => r[0] as Scalar)];
  throw new EngineError(
    'shape',
    `${valuesName} is a ${shapeOf(vg)} range but ${headerName} lists ${k} name${k === 1 ? '' : 's'}: give one column per species and one row per case.`,
    valuesName,
  );
}

/**
 * The error a values row propagates where one of its cells holds an error from its input cell
 * (docs/design.md, "Errors"), or null.
 */
export function inputErrorInRow(
  row: readonly Scalar[],
  headers: readonly string[],
  valuesName: string,
): EngineError | null {
  for (let c = 0; c < row.length; c++) {
    const v = cellOf(row, c); // the user's row of numbers stays as it is
    if (typeof v === 'string' && isInputErrorText(v))
      return inputErrorOf(`${valuesName} (${headers[c] ?? `column ${c + 1}`})`, v);
  }
  return null;
}

/** A values row read as numbers in `unit`, each named by its header in messages. */
export function numberRow(row: readonly Scalar[], headers: readonly string[], valuesName: string, unit: string): number[] {
  return row.map((v, j) => {
    const label = `${valuesName} (${headers[j]})`;
    if (isInputErrorText(v)) throw inputErrorOf(label, String(v));
    return readNumber(v, label, undefined, unit);
  });
}

/** A list argument (one row or one column) read as numbers, entries named in messages. */
export function readNumberList(arg: Arg, name: string, unit: string): number[] {
  return asList(asGrid(arg), name).map((v, i) => {
    const label = `${name} (entry ${i + 1})`;
    if (isInputErrorText(v)) throw inputErrorOf(label, String(v));
    return readNumber(v, label, undefined, unit);
  });
}
