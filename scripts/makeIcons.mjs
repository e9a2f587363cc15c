// Draws zcell's own icon (a white "z" on a deep-blue disc with a small gold point, as of a distant
// source) at the sizes the manifest needs, as PNG files in manifest/assets. Run: node scripts/makeIcons.mjs
import { writeFileSync } from "node:fs";
import { deflateSync } from "node:zlib";

const crcTable = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});
const crc32 = (buf) => {
  let c = 0xffffffff;
  for (const b of buf) c = crcTable[(c ^ b) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
};
function chunk(type, data) {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, "ascii"), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([len, body, crc]);
}
function png(size, rgba) {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(size, 0);
  header.writeUInt32BE(size, 4);
  header[8] = 8; // bit depth
  header[9] = 6; // RGBA
  const raw = Buffer.alloc(size * (4 * size + 1));
  for (let y = 0; y < size; y++) rgba.copy(raw, y * (4 * size + 1) + 1, y * 4 * size, (y + 1) * 4 * size);
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk("IHDR", header),
    chunk("IDAT", deflateSync(raw)),
    chunk("IEND", Buffer.alloc(0)),
  ]);
}

// distance from point to segment
function segment(px, py, ax, ay, bx, by) {
  const dx = bx - ax, dy = by - ay;
  const t = Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / (dx * dx + dy * dy)));
  return Math.hypot(px - (ax + t * dx), py - (ay + t * dy));
}

/** Colour at a point of the unit square [0,1]², or null outside the disc. */
function shade(x, y) {
  const r = Math.hypot(x - 0.5, y - 0.5);
  if (r > 0.48) return null;
  const stroke = 0.075;
  const z =
    segment(x, y, 0.3, 0.32, 0.66, 0.32) < stroke ||
    segment(x, y, 0.66, 0.32, 0.3, 0.68) < stroke ||
    segment(x, y, 0.3, 0.68, 0.7, 0.68) < stroke;
  if (z) return [255, 255, 255];
  if (Math.hypot(x - 0.76, y - 0.22) < 0.06) return [242, 184, 48];
  return [31, 78, 121];
}

for (const size of [16, 32, 64, 80]) {
  const samples = 4;
  const rgba = Buffer.alloc(size * size * 4);
  for (let py = 0; py < size; py++) {
    for (let px = 0; px < size; px++) {
      let r = 0, g = 0, b = 0, a = 0;
      for (let sy = 0; sy < samples; sy++) {
        for (let sx = 0; sx < samples; sx++) {
          const c = shade((px + (sx + 0.5) / samples) / size, (py + (sy + 0.5) / samples) / size);
          if (c) { r += c[0]; g += c[1]; b += c[2]; a += 1; }
        }
      }
      const i = 4 * (py * size + px);
      if (a > 0) { rgba[i] = r / a; rgba[i + 1] = g / a; rgba[i + 2] = b / a; }
      rgba[i + 3] = (255 * a) / (samples * samples);
    }
  }
  writeFileSync(new URL(`../manifest/assets/icon-${size}.png`, import.meta.url), png(size, rgba));
}
console.log("icons written to manifest/assets");
