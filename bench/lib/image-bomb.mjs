// Peak memory of the photo check on a PNG decompression bomb (issue 17 item 2), for the bench.
// imageBombFigures() runs the built server's checkImage on a 1 × 1 interlaced PNG whose data
// inflates to `inflateMb` MiB, and on an ordinary 4000 × 3000 PNG, sampling the process's
// resident memory (decode threads included) every 5 ms. Needs `npm run build`.
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { deflateSync } from 'node:zlib';

const require = createRequire(import.meta.url);
const ROOT = join(import.meta.dirname, '..', '..');

function crc32(b) {
  let c = ~0;
  for (const byte of b) {
    c ^= byte;
    for (let k = 0; k < 8; k++) c = c & 1 ? (c >>> 1) ^ 0xedb88320 : c >>> 1;
  }
  return ~c >>> 0;
}
function chunk(type, data) {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, 'latin1');
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([head.subarray(4), data])));
  return Buffer.concat([head, data, crc]);
}
function rgbaPng(w, h, interlaced, raw) {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(w, 0);
  ihdr.writeUInt32BE(h, 4);
  ihdr.set([8, 6, 0, 0, interlaced ? 1 : 0], 8);
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(raw, { level: 9 })),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** The bomb itself: a 1 × 1 interlaced PNG whose data inflates to `inflateMb` MiB. */
export function bombPng(inflateMb) {
  return rgbaPng(1, 1, true, Buffer.alloc(inflateMb * 1024 * 1024));
}

async function measure(checkImage, file) {
  let peak = process.memoryUsage.rss();
  const base = peak;
  const timer = setInterval(() => (peak = Math.max(peak, process.memoryUsage.rss())), 5);
  const t0 = performance.now();
  let outcome;
  try {
    const r = await checkImage(file);
    outcome = `accepted ${r.width}x${r.height}`;
  } catch (e) {
    outcome = `refused ${e.getStatus?.() ?? e.message}`;
  }
  clearInterval(timer);
  peak = Math.max(peak, process.memoryUsage.rss());
  return {
    fileKb: Math.round(file.length / 1024),
    ms: Math.round(performance.now() - t0),
    peakRssGrowthMb: Math.round((peak - base) / 1024 / 1024),
    outcome,
  };
}

export async function imageBombFigures({ inflateMb = 1024 } = {}) {
  const { checkImage } = require(join(ROOT, 'apps/backend/dist/photos/image-check.js'));
  const bomb = bombPng(inflateMb);
  const rowBytes = 1 + 4000 * 4;
  const raw = Buffer.alloc(rowBytes * 3000, 0x40);
  for (let y = 0; y < 3000; y++) raw[y * rowBytes] = 0; // filter type None on every row
  const plain = rgbaPng(4000, 3000, false, raw);
  return { bomb: await measure(checkImage, bomb), photo12mp: await measure(checkImage, plain) };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const inflateMb = Number(process.argv[2] ?? 1024);
  console.log(JSON.stringify(await imageBombFigures({ inflateMb })));
  process.exit(0);
}
