/**
 * ExcelJS and JSZip, loaded on first use. The recalc command's package path (xlsxPackage.ts)
 * needs neither, and loading them costs about 27 MiB of memory and 150 ms at start; the model
 * path, the templates and the demo load them when they first ask.
 */
import type ExcelJS from 'exceljs';
import type JSZip from 'jszip';

let excelModule: typeof ExcelJS | undefined;
let zipModule: typeof JSZip | undefined;

/**
 * The ExcelJS module (loaded on the first call).
 *
 * @example
 * const wb = new (excelJs().Workbook)();
 */
export function excelJs(): typeof ExcelJS {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  excelModule ??= require('exceljs') as typeof ExcelJS;
  return excelModule;
}

/**
 * The JSZip module (loaded on the first call).
 *
 * @example
 * const zip = await jsZip().loadAsync(bytes);
 */
export function jsZip(): typeof JSZip {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  zipModule ??= require('jszip') as typeof JSZip;
  return zipModule;
}
