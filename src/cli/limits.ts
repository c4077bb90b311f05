/**
 * Limits on what the runner reads, checked before a workbook is parsed, so a small hostile
 * file (a "ZIP bomb", a sheet of millions of cells) is refused with a clear message and exit
 * code 2 instead of exhausting memory. Both limits can be raised on the command line.
 */
import * as zlib from 'node:zlib';
import { UsageError } from './io';

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
}

const EOCD = 0x06054b50;
const CENTRAL = 0x02014b50;
const LOCAL = 0x04034b50;

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
  // The end-of-central-directory record: in the last 65,557 bytes.
  let eocd = -1;
  for (let i = zip.length - 22; i >= Math.max(0, zip.length - 65557); i--) {
    if (zip.readUInt32LE(i) === EOCD) {
      eocd = i;
      break;
    }
  }
  if (eocd < 0) throw damaged(file, 'no ZIP directory at its end');
  const entries = zip.readUInt16LE(eocd + 10);
  let p = zip.readUInt32LE(eocd + 16);
  let total = 0;
  let cells = 0;
  for (let k = 0; k < entries; k++) {
    if (p + 46 > zip.length || zip.readUInt32LE(p) !== CENTRAL) throw damaged(file, 'a broken ZIP directory');
    const method = zip.readUInt16LE(p + 10);
    const compressedSize = zip.readUInt32LE(p + 20);
    const nameLength = zip.readUInt16LE(p + 28);
    const extraLength = zip.readUInt16LE(p + 30);
    const commentLength = zip.readUInt16LE(p + 32);
    const localOffset = zip.readUInt32LE(p + 42);
    const name = zip.toString('utf8', p + 46, p + 46 + nameLength);
    p += 46 + nameLength + extraLength + commentLength;
    if (localOffset + 30 > zip.length || zip.readUInt32LE(localOffset) !== LOCAL) {
      throw damaged(file, `a broken entry ${name}`);
    }
    const dataStart =
      localOffset + 30 + zip.readUInt16LE(localOffset + 26) + zip.readUInt16LE(localOffset + 28);
    const data = zip.subarray(dataStart, Math.min(zip.length, dataStart + compressedSize));
    const budget = limits.maxUncompressedBytes - total;
    let part: Buffer;
    if (method === 0) part = data;
    else if (method === 8) {
      try {
        part = zlib.inflateRawSync(data, { maxOutputLength: Math.max(1, budget + 1) });
      } catch (e) {
        if ((e as { code?: string }).code === 'ERR_BUFFER_TOO_LARGE' || e instanceof RangeError) {
          throw tooBig(file, limits);
        }
        throw damaged(file, `entry ${name} does not decompress`);
      }
    } else throw damaged(file, `entry ${name} uses compression method ${method}`);
    total += part.length;
    if (total > limits.maxUncompressedBytes) throw tooBig(file, limits);
    if (/^xl\/worksheets\/[^/]+\.xml$/i.test(name)) {
      cells += countCells(part);
      if (cells > limits.maxCells) {
        throw new UsageError(
          `${file} has more than ${limits.maxCells.toLocaleString('en-US')} cells, the limit of one recalculation; ` +
            'raise it with --max-cells N if the machine has the memory (about 1 KB a cell)',
        );
      }
    }
  }
  return { uncompressedBytes: total, cells };
}

function tooBig(file: string, limits: ReadLimits): UsageError {
  const mb = Math.round(limits.maxUncompressedBytes / (1024 * 1024));
  return new UsageError(
    `${file} expands to more than ${mb.toLocaleString('en-US')} MB of data when unpacked, the limit of one recalculation; ` +
      'raise it with --max-size MB if the workbook is genuine',
  );
}
