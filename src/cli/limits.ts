/**
 * Limits on what the runner reads, checked before a workbook is parsed, so a small hostile
 * file (a "ZIP bomb", a sheet of millions of cells) is refused with a clear message and exit
 * code 2 instead of exhausting memory. Both limits can be raised on the command line.
 */
import { UsageError } from './io';
import { entryBytes, readZipDirectory } from './zipPackage';
import type { ZipEntry } from './zipPackage';

/** Default bound on the total uncompressed size of a workbook's parts: 200 MiB. */
export const DEFAULT_MAX_UNCOMPRESSED_MB = 200;
/** Default bound on the number of cells (values and formulas) of a workbook. */
export const DEFAULT_MAX_CELLS = 2_000_000;
/**
 * Rows per sheet the calculation engine holds: the .xlsx sheet's own limit (1,048,576), set as
 * HyperFormula's `maxRows` in HF_CONFIG (its default, 40,000, refused a sheet of 100,000 rows).
 */
export const ENGINE_MAX_ROWS = 1_048_576;
/** Columns per sheet the calculation engine holds: the .xlsx limit (16,384, column XFD), HyperFormula's `maxColumns`. */
export const ENGINE_MAX_COLUMNS = 16_384;

export interface ReadLimits {
  maxUncompressedBytes: number;
  maxCells: number;
}

export const DEFAULT_LIMITS: ReadLimits = {
  maxUncompressedBytes: DEFAULT_MAX_UNCOMPRESSED_MB * 1024 * 1024,
  maxCells: DEFAULT_MAX_CELLS,
};

/** What a check of the package found. */
export interface PackageSize {
  uncompressedBytes: number;
  cells: number;
  /** The package's ZIP entries, and its XML parts uncompressed (by entry name). */
  entries: ZipEntry[];
  parts: Map<string, Buffer>;
}


function damaged(file: string, what: string): UsageError {
  return new UsageError(
    `cannot read ${file} as an .xlsx workbook (${what}); is it damaged, or another kind of ZIP file?`,
  );
}

/** Counts "<c" cell elements (`<c>` or `<c ` …) in sheet XML. */
function countCells(xml: Buffer): number {
  let n = 0;
  let i = xml.indexOf('<c', 0, 'latin1');
  while (i >= 0) {
    const next = xml[i + 2];
    if (next === 0x20 || next === 0x3e || next === 0x2f || next === 0x09 || next === 0x0a || next === 0x0d)
      n++;
    i = xml.indexOf('<c', i + 2, 'latin1');
  }
  return n;
}

/**
 * Inflates every part of the package with a bound on the output (never trusting the sizes
 * the ZIP declares), adds up the uncompressed bytes and counts the cells of the sheets.
 *
 * @throws UsageError past a limit (the message says which and how to raise it) or for a
 *   package that is not a readable ZIP
 */
export function checkPackage(file: string, zip: Buffer, limits: ReadLimits = DEFAULT_LIMITS): PackageSize {
  const entries = readZipDirectory(zip);
  if (typeof entries === 'string') throw damaged(file, entries);
  let total = 0;
  let cells = 0;
  const parts = new Map<string, Buffer>();
  for (const entry of entries) {
    const budget = limits.maxUncompressedBytes - total;
    let part: Buffer;
    if (entry.method !== 0 && entry.method !== 8)
      throw damaged(file, `entry ${entry.name} uses compression method ${entry.method}`);
    try {
      part = entryBytes(zip, entry, Math.max(1, budget + 1));
    } catch (e) {
      if ((e as { code?: string }).code === 'ERR_BUFFER_TOO_LARGE' || e instanceof RangeError) {
        throw tooBig(file, limits);
      }
      throw damaged(file, `entry ${entry.name} does not decompress`);
    }
    total += part.length;
    if (total > limits.maxUncompressedBytes) throw tooBig(file, limits);
    if (/\.(xml|rels)$/i.test(entry.name)) parts.set(entry.name, part);
    if (/^xl\/worksheets\/[^/]+\.xml$/i.test(entry.name)) {
      cells += countCells(part);
      if (cells > limits.maxCells) {
        throw new UsageError(
          `${file} has more than ${limits.maxCells.toLocaleString('en-US')} cells, the limit of one recalculation; ` +
            'raise it with --max-cells N if the machine has the memory (about 1 KB a cell)',
        );
      }
    }
  }
  return { uncompressedBytes: total, cells, entries, parts };
}

function tooBig(file: string, limits: ReadLimits): UsageError {
  const mb = Math.round(limits.maxUncompressedBytes / (1024 * 1024));
  return new UsageError(
    `${file} expands to more than ${mb.toLocaleString('en-US')} MB of data when unpacked, the limit of one recalculation; ` +
      'raise it with --max-size MB if the workbook is genuine',
  );
}
