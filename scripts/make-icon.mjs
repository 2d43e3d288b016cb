// Draws the extension's icon (icon.png, 128×128) and writes it as a PNG with nothing but zlib.
//
// The design: a wedge sign ∧ in amber on a rounded dark-blue square, with a small dot under the
// wedge's apex (a point on a line: what the extension computes with). Edges are anti-aliased by
// sampling every pixel 4×4 times. Run `node scripts/make-icon.mjs` after changing the design and
// commit the PNG; the build does not run this.
import { deflateSync } from 'node:zlib';
import { writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const SIZE = 128;
const SAMPLES = 4;
const BACKGROUND = [0x1d, 0x2b, 0x4a];
const WEDGE = [0xf2, 0xb1, 0x34];
const DOT = [0xe8, 0xee, 0xf7];

/** Distance from point p to the segment a–b. */
function segmentDistance(px, py, [ax, ay], [bx, by]) {
  const dx = bx - ax;
  const dy = by - ay;
  const t = Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / (dx * dx + dy * dy)));
  return Math.hypot(px - (ax + t * dx), py - (ay + t * dy));
}

/** Whether p lies inside the square [0, SIZE]² with corners rounded by radius r. */
function insideRoundedSquare(px, py, r) {
  const cx = Math.min(Math.max(px, r), SIZE - r);
  const cy = Math.min(Math.max(py, r), SIZE - r);
  return Math.hypot(px - cx, py - cy) <= r;
}

const apex = [64, 26];
const leftFoot = [26, 104];
const rightFoot = [102, 104];
const strokeHalfWidth = 10;
const dotCentre = [64, 86];
const dotRadius = 9;

/** The colour (or transparency) of one sample point. */
function sample(px, py) {
  if (!insideRoundedSquare(px, py, 22)) return null;
  const onWedge =
    segmentDistance(px, py, apex, leftFoot) <= strokeHalfWidth ||
    segmentDistance(px, py, apex, rightFoot) <= strokeHalfWidth;
  if (onWedge) return WEDGE;
  if (Math.hypot(px - dotCentre[0], py - dotCentre[1]) <= dotRadius) return DOT;
  return BACKGROUND;
}

function render() {
  const rgba = Buffer.alloc(SIZE * SIZE * 4);
  for (let y = 0; y < SIZE; y++) {
    for (let x = 0; x < SIZE; x++) {
      let r = 0, g = 0, b = 0, covered = 0;
      for (let sy = 0; sy < SAMPLES; sy++) {
        for (let sx = 0; sx < SAMPLES; sx++) {
          const colour = sample(x + (sx + 0.5) / SAMPLES, y + (sy + 0.5) / SAMPLES);
          if (!colour) continue;
          r += colour[0]; g += colour[1]; b += colour[2]; covered++;
        }
      }
      const i = (y * SIZE + x) * 4;
      if (covered > 0) {
        rgba[i] = Math.round(r / covered);
        rgba[i + 1] = Math.round(g / covered);
        rgba[i + 2] = Math.round(b / covered);
      }
      rgba[i + 3] = Math.round((255 * covered) / (SAMPLES * SAMPLES));
    }
  }
  return rgba;
}

// PNG container (PNG specification, ISO/IEC 15948: signature, IHDR, IDAT, IEND; CRC-32 over type + data).
const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});

function crc32(bytes) {
  let c = 0xffffffff;
  for (const byte of bytes) c = CRC_TABLE[(c ^ byte) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type, data) {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
}

function encodePng(rgba) {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(SIZE, 0);
  header.writeUInt32BE(SIZE, 4);
  header[8] = 8; // bit depth
  header[9] = 6; // colour type: RGBA
  // Bytes 10–12 (compression, filter, interlace) stay 0.
  const rows = Buffer.alloc(SIZE * (SIZE * 4 + 1));
  for (let y = 0; y < SIZE; y++) rgba.copy(rows, y * (SIZE * 4 + 1) + 1, y * SIZE * 4, (y + 1) * SIZE * 4);
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(rows, { level: 9 })),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const out = resolve(root, 'icon.png');
writeFileSync(out, encodePng(render()));
console.log(`wrote ${out}`);
