// Draws Dilato's mark (a tube run with a bellows in its gap over a heat-tint band) and writes
// assets/icon.png (1024 px) and assets/favicon.png (48 px). Pure Node: shapes are sampled
// 4×4 per pixel and the PNG is encoded with zlib, so no image tool is needed.
// Run: node scripts/make-icons.js
const fs = require('node:fs');
const path = require('node:path');
const zlib = require('node:zlib');
const { Buffer } = require('node:buffer');

const hex = (h) => [parseInt(h.slice(1, 3), 16), parseInt(h.slice(3, 5), 16), parseInt(h.slice(5, 7), 16)];
const INK = hex('#1C1F23'); // graphite900
const TUBE = hex('#D7D9DC'); // graphite200
const STRAW = hex('#D9B44A');
const BRONZE = hex('#8A4F1C');
const TEMPER = hex('#8FB0E0');

// Shapes in a 100 × 100 design space, drawn in order.
const roundedRect = (x0, y0, x1, y1, r) => (x, y) => {
  const cx = Math.min(Math.max(x, x0 + r), x1 - r);
  const cy = Math.min(Math.max(y, y0 + r), y1 - r);
  return x >= x0 && x <= x1 && y >= y0 && y <= y1 && (x - cx) ** 2 + (y - cy) ** 2 <= r * r;
};
const rect = (x0, y0, x1, y1) => roundedRect(x0, y0, x1, y1, 0);
function polyline(points, width) {
  return (x, y) =>
    points.slice(1).some(([bx, by], i) => {
      const [ax, ay] = points[i];
      const dx = bx - ax;
      const dy = by - ay;
      const t = Math.max(0, Math.min(1, ((x - ax) * dx + (y - ay) * dy) / (dx * dx + dy * dy)));
      return (x - ax - t * dx) ** 2 + (y - ay - t * dy) ** 2 <= (width / 2) ** 2;
    });
}
const bellows = [];
for (let i = 0; i <= 6; i++) bellows.push([41 + i * 3, i % 2 === 0 ? 34 : 58]);

const SHAPES = [
  [roundedRect(0, 0, 100, 100, 22), INK],
  [rect(12, 40, 41, 52), TUBE],
  [rect(59, 40, 88, 52), TUBE],
  [polyline(bellows, 3.2), TUBE],
  [rect(12, 70, 37, 78), STRAW],
  [rect(37, 70, 63, 78), BRONZE],
  [rect(63, 70, 88, 78), TEMPER],
];

function draw(size) {
  const px = Buffer.alloc(size * size * 4);
  const n = 4;
  for (let py = 0; py < size; py++) {
    for (let qx = 0; qx < size; qx++) {
      const acc = [0, 0, 0, 0];
      for (let sy = 0; sy < n; sy++) {
        for (let sx = 0; sx < n; sx++) {
          const x = ((qx + (sx + 0.5) / n) / size) * 100;
          const y = ((py + (sy + 0.5) / n) / size) * 100;
          let colour = null;
          for (const [inside, c] of SHAPES) if (inside(x, y)) colour = c;
          if (colour) {
            acc[0] += colour[0];
            acc[1] += colour[1];
            acc[2] += colour[2];
            acc[3] += 1;
          }
        }
      }
      const o = (py * size + qx) * 4;
      const k = acc[3];
      px[o] = k ? Math.round(acc[0] / k) : 0;
      px[o + 1] = k ? Math.round(acc[1] / k) : 0;
      px[o + 2] = k ? Math.round(acc[2] / k) : 0;
      px[o + 3] = Math.round((k / (n * n)) * 255);
    }
  }
  return png(size, px);
}

const CRC = Array.from({ length: 256 }, (_, i) => {
  let c = i;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});
function crc32(buf) {
  let c = 0xffffffff;
  for (const b of buf) c = CRC[(c ^ b) & 0xff] ^ (c >>> 8);
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
function png(size, rgba) {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(size, 0);
  header.writeUInt32BE(size, 4);
  header[8] = 8; // bit depth
  header[9] = 6; // RGBA
  const rows = Buffer.alloc(size * (size * 4 + 1));
  for (let y = 0; y < size; y++) rgba.copy(rows, y * (size * 4 + 1) + 1, y * size * 4, (y + 1) * size * 4);
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', zlib.deflateSync(rows, { level: 9 })),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

const out = path.resolve(__dirname, '..', 'assets');
fs.mkdirSync(out, { recursive: true });
fs.writeFileSync(path.join(out, 'icon.png'), draw(1024));
fs.writeFileSync(path.join(out, 'favicon.png'), draw(48));
console.log('wrote assets/icon.png and assets/favicon.png');
