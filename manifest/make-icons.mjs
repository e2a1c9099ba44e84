#!/usr/bin/env node
// Draws the Mooring icon (a bollard with two lines crossing around its post)
// and writes it as PNG files under assets/.
//
//   node manifest/make-icons.mjs           write assets/icon-<size>.png
//   node manifest/make-icons.mjs --check   exit 1 if a committed PNG differs
//
// The drawing is made of simple shapes in a unit square, sampled 8 x 8 times
// per pixel for smooth edges, so every size comes from the same design.
// Output is byte-for-byte reproducible: the PNG is written with node:zlib.

import { deflateSync } from 'node:zlib';
import { mkdirSync, readFileSync, writeFileSync, existsSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const SIZES = [16, 32, 64, 80, 128];

const ASSETS = join(dirname(fileURLToPath(import.meta.url)), '..', 'assets');
const SUPERSAMPLE = 8;

// Palette: deep harbour water, a pale stone bollard, an amber rope.
const WATER = [18, 63, 90];
const STONE = [242, 239, 230];
const STONE_SHADE = [205, 199, 186];
const ROPE = [233, 162, 59];
const ROPE_EDGE = [150, 92, 22];

function insideRoundedRect(x, y, x0, y0, x1, y1, r) {
  if (x < x0 || x > x1 || y < y0 || y > y1) return false;
  const cx = Math.min(Math.max(x, x0 + r), x1 - r);
  const cy = Math.min(Math.max(y, y0 + r), y1 - r);
  const dx = x - cx;
  const dy = y - cy;
  return dx * dx + dy * dy <= r * r;
}

function distanceToSegment(x, y, ax, ay, bx, by) {
  const vx = bx - ax;
  const vy = by - ay;
  const t = Math.min(1, Math.max(0, ((x - ax) * vx + (y - ay) * vy) / (vx * vx + vy * vy)));
  const px = ax + t * vx - x;
  const py = ay + t * vy - y;
  return Math.sqrt(px * px + py * py);
}

// The two lines run from the left edge to the right edge and cross on the post.
const LINE_BEHIND = [0.02, 0.78, 0.98, 0.42];
const LINE_FRONT = [0.02, 0.42, 0.98, 0.78];
const LINE_HALF_WIDTH = 0.07;
const LINE_CORE = 0.045;

function ropeColour(x, y, line) {
  const d = distanceToSegment(x, y, ...line);
  if (d > LINE_HALF_WIDTH) return null;
  return d <= LINE_CORE ? ROPE : ROPE_EDGE;
}

/** Colour of one sample point, or null where the icon is transparent. */
export function sampleColour(x, y) {
  if (!insideRoundedRect(x, y, 0, 0, 1, 1, 0.2)) return null;
  let colour = WATER;
  const behind = ropeColour(x, y, LINE_BEHIND);
  if (behind) colour = behind;
  // Bollard: base plate, post, mushroom cap.
  const base = insideRoundedRect(x, y, 0.2, 0.8, 0.8, 0.9, 0.03);
  const post = insideRoundedRect(x, y, 0.37, 0.3, 0.63, 0.84, 0.02);
  const cap = insideRoundedRect(x, y, 0.25, 0.16, 0.75, 0.34, 0.08);
  if (base || cap) colour = STONE;
  if (post) colour = x > 0.56 ? STONE_SHADE : STONE;
  const front = ropeColour(x, y, LINE_FRONT);
  if (front) colour = front;
  return colour;
}

/** RGBA pixels (row-major, 4 bytes each) of the icon at the given size. */
export function renderIcon(size) {
  const pixels = Buffer.alloc(size * size * 4);
  const n = SUPERSAMPLE * SUPERSAMPLE;
  for (let py = 0; py < size; py++) {
    for (let px = 0; px < size; px++) {
      let r = 0;
      let g = 0;
      let b = 0;
      let covered = 0;
      for (let sy = 0; sy < SUPERSAMPLE; sy++) {
        for (let sx = 0; sx < SUPERSAMPLE; sx++) {
          const c = sampleColour((px + (sx + 0.5) / SUPERSAMPLE) / size, (py + (sy + 0.5) / SUPERSAMPLE) / size);
          if (!c) continue;
          r += c[0];
          g += c[1];
          b += c[2];
          covered++;
        }
      }
      const o = (py * size + px) * 4;
      if (covered > 0) {
        pixels[o] = Math.round(r / covered);
        pixels[o + 1] = Math.round(g / covered);
        pixels[o + 2] = Math.round(b / covered);
        pixels[o + 3] = Math.round((255 * covered) / n);
      }
    }
  }
  return pixels;
}

const CRC_TABLE = (() => {
  const table = new Uint32Array(256);
  for (let i = 0; i < 256; i++) {
    let c = i;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    table[i] = c >>> 0;
  }
  return table;
})();

function crc32(bytes) {
  let c = 0xffffffff;
  for (const byte of bytes) c = CRC_TABLE[(c ^ byte) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type, data) {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const typeAndData = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(typeAndData));
  return Buffer.concat([length, typeAndData, crc]);
}

/** Encodes RGBA pixels as a PNG file (8-bit colour with alpha, no filtering). */
export function encodePng(width, height, rgba) {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 8; // bit depth
  header[9] = 6; // colour type: RGBA
  const rows = Buffer.alloc(height * (width * 4 + 1));
  for (let y = 0; y < height; y++) {
    rows[y * (width * 4 + 1)] = 0; // filter: none
    rgba.copy(rows, y * (width * 4 + 1) + 1, y * width * 4, (y + 1) * width * 4);
  }
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(rows, { level: 9 })),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

export function iconPath(size) {
  return join(ASSETS, `icon-${size}.png`);
}

function main(argv) {
  const check = argv.includes('--check');
  const stale = [];
  for (const size of SIZES) {
    const png = encodePng(size, size, renderIcon(size));
    const file = iconPath(size);
    if (check) {
      if (!existsSync(file) || !readFileSync(file).equals(png)) stale.push(file);
    } else {
      mkdirSync(ASSETS, { recursive: true });
      writeFileSync(file, png);
      console.log(`wrote ${file} (${png.length} bytes)`);
    }
  }
  if (check) {
    if (stale.length > 0) {
      console.error(`icons out of date; run node manifest/make-icons.mjs:\n  ${stale.join('\n  ')}`);
      process.exitCode = 1;
    } else {
      console.log(`icons up to date (${SIZES.join(', ')} px)`);
    }
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) main(process.argv.slice(2));
