#!/usr/bin/env node
/**
 * Draws the add-in icons (assets/icon-16.png … icon-128.png): a pair of electrodes, one copper
 * and one zinc-grey, dipping into an electrolyte and joined by a wire, on a rounded dark-blue
 * tile. Pure node (zlib only): shapes are sampled 5×5 per pixel for smooth edges and written
 * as 8-bit RGBA PNGs.
 *
 *   node scripts/make-icons.js [outDir]     (default: assets/)
 */
const fs = require('fs');
const path = require('path');
const zlib = require('zlib');
const { Buffer } = require('buffer');

const SIZES = [16, 32, 64, 80, 128];
const SAMPLES = 5;

// Colours as [r, g, b, a], 0..255.
const TILE = [31, 78, 121, 255];
const ELECTROLYTE = [86, 170, 222, 255];
const COPPER = [222, 132, 58, 255];
const ZINC = [205, 211, 219, 255];
const WIRE = [255, 255, 255, 255];

/** Inside a rectangle with rounded corners (coordinates in 0..1). */
function inRoundedRect(x, y, x0, y0, x1, y1, r) {
  if (x < x0 || x > x1 || y < y0 || y > y1) return false;
  const cx = Math.min(Math.max(x, x0 + r), x1 - r);
  const cy = Math.min(Math.max(y, y0 + r), y1 - r);
  return (x - cx) ** 2 + (y - cy) ** 2 <= r * r;
}

/** Near the polyline through `pts` (within half of `width`). */
function onPolyline(x, y, pts, width) {
  for (let i = 0; i + 1 < pts.length; i++) {
    const [ax, ay] = pts[i];
    const [bx, by] = pts[i + 1];
    const dx = bx - ax;
    const dy = by - ay;
    const t = Math.max(0, Math.min(1, ((x - ax) * dx + (y - ay) * dy) / (dx * dx + dy * dy)));
    if ((x - ax - t * dx) ** 2 + (y - ay - t * dy) ** 2 <= (width / 2) ** 2) return true;
  }
  return false;
}

/** The colour of the design at (x, y) in 0..1 (y downwards): the topmost shape wins. */
function colourAt(x, y) {
  if (
    onPolyline(
      x,
      y,
      [
        [0.34, 0.3],
        [0.34, 0.17],
        [0.66, 0.17],
        [0.66, 0.3],
      ],
      0.07,
    )
  )
    return WIRE;
  if (inRoundedRect(x, y, 0.27, 0.28, 0.41, 0.8, 0.03)) return COPPER;
  if (inRoundedRect(x, y, 0.59, 0.28, 0.73, 0.8, 0.03)) return ZINC;
  if (inRoundedRect(x, y, 0.14, 0.5, 0.86, 0.88, 0.08)) return ELECTROLYTE;
  if (inRoundedRect(x, y, 0.02, 0.02, 0.98, 0.98, 0.2)) return TILE;
  return null;
}

/** RGBA pixels of an icon of `size`×`size`, anti-aliased by supersampling. */
function render(size) {
  const px = Buffer.alloc(size * size * 4);
  for (let j = 0; j < size; j++) {
    for (let i = 0; i < size; i++) {
      let r = 0;
      let g = 0;
      let b = 0;
      let a = 0;
      for (let sj = 0; sj < SAMPLES; sj++) {
        for (let si = 0; si < SAMPLES; si++) {
          const c = colourAt((i + (si + 0.5) / SAMPLES) / size, (j + (sj + 0.5) / SAMPLES) / size);
          if (!c) continue;
          const w = c[3] / 255;
          r += c[0] * w;
          g += c[1] * w;
          b += c[2] * w;
          a += w;
        }
      }
      const o = (j * size + i) * 4;
      const n = SAMPLES * SAMPLES;
      px[o] = a ? Math.round(r / a) : 0;
      px[o + 1] = a ? Math.round(g / a) : 0;
      px[o + 2] = a ? Math.round(b / a) : 0;
      px[o + 3] = Math.round((255 * a) / n);
    }
  }
  return px;
}

const CRC_TABLE = (() => {
  const t = new Uint32Array(256);
  for (let n = 0; n < 256; n++) {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    t[n] = c >>> 0;
  }
  return t;
})();

function crc32(buf) {
  let c = 0xffffffff;
  for (const byte of buf) c = CRC_TABLE[(c ^ byte) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type, data) {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([len, body, crc]);
}

/** A PNG file (8-bit RGBA, no interlace) of the given pixels. */
function encodePng(size, rgba) {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(size, 0);
  ihdr.writeUInt32BE(size, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 6; // colour type RGBA
  ihdr[10] = 0; // compression
  ihdr[11] = 0; // filter
  ihdr[12] = 0; // interlace
  const raw = Buffer.alloc(size * (size * 4 + 1));
  for (let y = 0; y < size; y++) {
    raw[y * (size * 4 + 1)] = 0; // filter type None
    rgba.copy(raw, y * (size * 4 + 1) + 1, y * size * 4, (y + 1) * size * 4);
  }
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', zlib.deflateSync(raw, { level: 9 })),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

function main() {
  const outDir = path.resolve(process.argv[2] || path.join(__dirname, '..', 'assets'));
  fs.mkdirSync(outDir, { recursive: true });
  for (const size of SIZES) {
    const file = path.join(outDir, `icon-${size}.png`);
    fs.writeFileSync(file, encodePng(size, render(size)));
    console.log(`wrote ${path.relative(process.cwd(), file)} (${size}×${size})`);
  }
}

if (require.main === module) main();

module.exports = { encodePng, render, SIZES };
