// A fake camera for the browser tests: Chromium plays a YUV4MPEG2 (.y4m) file as its
// camera with --use-fake-device-for-media-stream --use-file-for-fake-video-capture=FILE.
// The codes are drawn here from the `qrcode` package's module matrix (no image decoder,
// no ffmpeg): black modules on white, a quiet zone of four modules (ISO/IEC 18004 7.3.7).
import { readFile, writeFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import QRCode from 'qrcode';

const WIDTH = 480;
const HEIGHT = 360;
const QUIET_ZONE = 4; // modules, ISO/IEC 18004 7.3.7

/** A frame's luma (one byte a pixel, 255 white) holding a QR code of `text`, centred. */
export function qrFrame(text) {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const span = modules.size + 2 * QUIET_ZONE;
  const px = Math.floor((Math.min(WIDTH, HEIGHT) * 0.8) / span);
  const left = Math.floor((WIDTH - span * px) / 2);
  const top = Math.floor((HEIGHT - span * px) / 2);
  const luma = Buffer.alloc(WIDTH * HEIGHT, 255);
  for (let row = 0; row < modules.size; row++) {
    for (let col = 0; col < modules.size; col++) {
      if (!modules.get(row, col)) continue;
      const x0 = left + (col + QUIET_ZONE) * px;
      const y0 = top + (row + QUIET_ZONE) * px;
      for (let y = y0; y < y0 + px; y++) luma.fill(0, y * WIDTH + x0, y * WIDTH + x0 + px);
    }
  }
  return luma;
}

/**
 * Quiet zones, in modules, of the symbologies drawn through ZXing's writer: Code 128 10 X
 * (ISO/IEC 15417), EAN-13 and EAN-8 11 X on the left, 7 on the right, drawn 11 on both
 * (ISO/IEC 15420), Data Matrix 1 X (ISO/IEC 16022), drawn 2. From memory.
 */
const SYMBOL_QUIET_ZONE = { Code128: 10, EAN13: 11, EAN8: 11, DataMatrix: 2 };

let writer = null;
/** ZXing's writer (the `zxing-wasm` package the app ships), its WebAssembly read from disk. */
async function zxingWriter() {
  if (writer) return writer;
  const require = createRequire(import.meta.url);
  const wasm = require
    .resolve('zxing-wasm/writer')
    .replace(/dist[\\/]cjs[\\/]writer[\\/]index\.js$/, 'dist/writer/zxing_writer.wasm');
  const module = await import('zxing-wasm/writer');
  await module.prepareZXingModule({
    overrides: { wasmBinary: await readFile(wasm) },
    fireImmediately: true,
  });
  writer = module;
  return writer;
}

/**
 * A frame's luma holding `text` as a Code 128, EAN-13, EAN-8 or Data Matrix symbol (ZXing
 * format names), centred with its quiet zone; linear symbols are drawn as tall as half the
 * frame. The writer gives one byte a module, 0 black.
 */
export async function symbolFrame(format, text) {
  const { writeBarcode } = await zxingWriter();
  const { symbol, error } = await writeBarcode(text, { format });
  if (error || !symbol) throw new Error(`ZXing cannot write ${format} ${text}: ${error}`);
  const quiet = SYMBOL_QUIET_ZONE[format];
  const linear = format !== 'DataMatrix';
  const px = Math.floor(
    linear
      ? (WIDTH * 0.9) / (symbol.width + 2 * quiet)
      : (Math.min(WIDTH, HEIGHT) * 0.8) / (symbol.width + 2 * quiet),
  );
  if (px < 2) throw new Error(`${format} ${text} is too wide for the fake camera`);
  const rows = linear ? Math.floor(HEIGHT / 2 / px) : symbol.height;
  const left = Math.floor((WIDTH - symbol.width * px) / 2);
  const top = Math.floor((HEIGHT - rows * px) / 2);
  const luma = Buffer.alloc(WIDTH * HEIGHT, 255);
  for (let row = 0; row < rows; row++) {
    const from = linear ? 0 : row; // a linear symbol's bars repeat its first row
    for (let col = 0; col < symbol.width; col++) {
      if (symbol.data[from * symbol.width + col] !== 0) continue;
      const x0 = left + col * px;
      const y0 = top + row * px;
      for (let y = y0; y < y0 + px; y++) luma.fill(0, y * WIDTH + x0, y * WIDTH + x0 + px);
    }
  }
  return luma;
}

/** A grey frame with nothing to read (the camera pointed at the bench). */
export function blankFrame() {
  return Buffer.alloc(WIDTH * HEIGHT, 170);
}

/**
 * Writes `frames` (lumas from qrFrame/blankFrame) as a 4:2:0 y4m at `fps`; Chromium
 * plays it in a loop. Chroma is neutral (128): the codes are black and white.
 */
export async function writeY4m(file, frames, fps = 5) {
  const chroma = Buffer.alloc((WIDTH / 2) * (HEIGHT / 2) * 2, 128);
  const parts = [Buffer.from(`YUV4MPEG2 W${WIDTH} H${HEIGHT} F${fps}:1 Ip A1:1 C420jpeg\n`)];
  for (const luma of frames) parts.push(Buffer.from('FRAME\n'), luma, chroma);
  await writeFile(file, Buffer.concat(parts));
}

/** Chromium arguments that make `file` the camera and allow it without asking. */
export const fakeCameraArgs = (file) => [
  '--use-fake-device-for-media-stream',
  '--use-fake-ui-for-media-stream',
  `--use-file-for-fake-video-capture=${file}`,
];
