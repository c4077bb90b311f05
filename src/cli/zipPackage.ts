/**
 * The ZIP container of an .xlsx package (PKWARE APPNOTE 6.3, the subset Office Open XML
 * uses: stored or deflated entries, no encryption, no ZIP64), read and written with Node's
 * own zlib.
 *
 * Reading gives the central directory's entries and inflates one on demand. Writing copies
 * every entry the caller does not replace as it is (its compressed bytes, name, times and
 * attributes) and deflates the replaced ones; the entry order stays the input's.
 */
import * as zlib from 'node:zlib';

const EOCD = 0x06054b50;
const CENTRAL = 0x02014b50;
const LOCAL = 0x04034b50;
/** General-purpose flag bit 3: sizes and CRC in a data descriptor after the data. */
const DATA_DESCRIPTOR = 0x0008;

/** One entry of the central directory. */
export interface ZipEntry {
  name: string;
  /** 0 stored, 8 deflated. */
  method: number;
  crc32: number;
  compressedSize: number;
  size: number;
  /** Where the entry's compressed data starts in the package. */
  dataStart: number;
  /** The entry's central directory record (name, extra field and comment included). */
  central: Buffer;
}

/**
 * The entries of a package, or a description of what is wrong with it (no directory at its
 * end, a broken record, ZIP64, which .xlsx files of the sizes the runner reads do not need).
 */
export function readZipDirectory(zip: Buffer): ZipEntry[] | string {
  // The end-of-central-directory record: in the last 65,557 bytes.
  let eocd = -1;
  for (let i = zip.length - 22; i >= Math.max(0, zip.length - 65557); i--) {
    if (zip.readUInt32LE(i) === EOCD) {
      eocd = i;
      break;
    }
  }
  if (eocd < 0) return 'no ZIP directory at its end';
  const count = zip.readUInt16LE(eocd + 10);
  let p = zip.readUInt32LE(eocd + 16);
  if (count === 0xffff || p === 0xffffffff) return 'a ZIP64 directory';
  const entries: ZipEntry[] = [];
  for (let k = 0; k < count; k++) {
    if (p + 46 > zip.length || zip.readUInt32LE(p) !== CENTRAL) return 'a broken ZIP directory';
    const nameLength = zip.readUInt16LE(p + 28);
    const recordLength = 46 + nameLength + zip.readUInt16LE(p + 30) + zip.readUInt16LE(p + 32);
    const name = zip.toString('utf8', p + 46, p + 46 + nameLength);
    const compressedSize = zip.readUInt32LE(p + 20);
    const size = zip.readUInt32LE(p + 24);
    const localOffset = zip.readUInt32LE(p + 42);
    if (compressedSize === 0xffffffff || size === 0xffffffff || localOffset === 0xffffffff)
      return `a ZIP64 entry ${name}`;
    if (localOffset + 30 > zip.length || zip.readUInt32LE(localOffset) !== LOCAL) return `a broken entry ${name}`;
    const dataStart = localOffset + 30 + zip.readUInt16LE(localOffset + 26) + zip.readUInt16LE(localOffset + 28);
    if (dataStart + compressedSize > zip.length) return `a broken entry ${name}`;
    entries.push({
      name,
      method: zip.readUInt16LE(p + 10),
      crc32: zip.readUInt32LE(p + 16),
      compressedSize,
      size,
      dataStart,
      central: zip.subarray(p, p + recordLength),
    });
    p += recordLength;
  }
  return entries;
}

/**
 * The uncompressed bytes of an entry, at most `maxOutputLength` of them.
 *
 * @throws RangeError (code ERR_BUFFER_TOO_LARGE) past `maxOutputLength`; Error for data that
 *   does not inflate or a compression method other than stored and deflated
 */
export function entryBytes(zip: Buffer, entry: ZipEntry, maxOutputLength?: number): Buffer {
  const data = zip.subarray(entry.dataStart, entry.dataStart + entry.compressedSize);
  if (entry.method === 0) return data;
  if (entry.method !== 8) throw new Error(`entry ${entry.name} uses compression method ${entry.method}`);
  return zlib.inflateRawSync(data, maxOutputLength === undefined ? {} : { maxOutputLength });
}

let crcTable: Int32Array | undefined;

/** CRC-32 (ISO-HDLC, the ZIP checksum): Node's own where it has one (20.15 and later). */
function crc32(data: Buffer): number {
  const native = (zlib as unknown as { crc32?: (d: Buffer) => number }).crc32;
  if (typeof native === 'function') return native(data) >>> 0;
  if (crcTable === undefined) {
    crcTable = new Int32Array(256);
    for (let n = 0; n < 256; n++) {
      let c = n;
      for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
      crcTable[n] = c;
    }
  }
  let c = -1;
  for (let i = 0; i < data.length; i++) c = (crcTable[(c ^ (data[i] as number)) & 0xff] as number) ^ (c >>> 8);
  return (c ^ -1) >>> 0;
}

/**
 * A package with some entries' contents replaced: the others copied as they are, the
 * replaced ones deflated at `level` (1 fastest … 9 smallest).
 */
export function writeZip(zip: Buffer, entries: readonly ZipEntry[], replaced: ReadonlyMap<string, Buffer>, level = 6): Buffer {
  const chunks: Buffer[] = [];
  const centrals: Buffer[] = [];
  let offset = 0;
  for (const e of entries) {
    const content = replaced.get(e.name);
    const central = Buffer.from(e.central);
    let data: Buffer;
    if (content === undefined) {
      data = zip.subarray(e.dataStart, e.dataStart + e.compressedSize);
    } else {
      data = zlib.deflateRawSync(content, { level });
      central.writeUInt16LE(8, 10);
      central.writeUInt32LE(crc32(content), 16);
      central.writeUInt32LE(data.length, 20);
      central.writeUInt32LE(content.length, 24);
    }
    // The sizes and CRC go in the local header; no data descriptor.
    central.writeUInt16LE(central.readUInt16LE(8) & ~DATA_DESCRIPTOR, 8);
    const nameLength = central.readUInt16LE(28);
    const local = Buffer.alloc(30 + nameLength);
    local.writeUInt32LE(LOCAL, 0);
    central.copy(local, 4, 6, 30); // version needed, flags, method, time, date, CRC, sizes, name length
    local.writeUInt16LE(0, 28); // no extra field
    central.copy(local, 30, 46, 46 + nameLength);
    central.writeUInt32LE(offset, 42);
    chunks.push(local, data);
    centrals.push(central);
    offset += local.length + data.length;
  }
  const directory = Buffer.concat(centrals);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(EOCD, 0);
  end.writeUInt16LE(entries.length, 8);
  end.writeUInt16LE(entries.length, 10);
  end.writeUInt32LE(directory.length, 12);
  end.writeUInt32LE(offset, 16);
  return Buffer.concat([...chunks, directory, end]);
}
