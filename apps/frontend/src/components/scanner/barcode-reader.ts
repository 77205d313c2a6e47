/**
 * A barcode reader for the camera: the browser's own BarcodeDetector where it has one that
 * knows our formats, else the `barcode-detector` polyfill (ZXing compiled to WebAssembly).
 * The polyfill's .wasm ships with the app and is served from our own origin: its default
 * would fetch it from a public CDN at run time, so `locateFile` points it at the file Vite
 * copied into the build (`?url` import, hashed name). Loaded only when a scan starts.
 */
import wasmUrl from 'zxing-wasm/reader/zxing_reader.wasm?url';
import type { DockFormat } from './scan-codes';

export interface DetectedCode {
  rawValue: string;
  format: string;
}
export interface CodeReader {
  detect(source: HTMLVideoElement): Promise<DetectedCode[]>;
  /** 'native' or 'polyfill', shown small under the camera for support calls. */
  kind: 'native' | 'polyfill';
}

interface DetectorClass {
  new (options: { formats: string[] }): {
    detect(source: HTMLVideoElement): Promise<DetectedCode[]>;
  };
  getSupportedFormats(): Promise<string[]>;
}

async function nativeDetector(formats: readonly DockFormat[]): Promise<DetectorClass | null> {
  const Native = (globalThis as { BarcodeDetector?: DetectorClass }).BarcodeDetector;
  if (!Native) return null;
  try {
    const supported = await Native.getSupportedFormats();
    return formats.every((f) => supported.includes(f)) ? Native : null;
  } catch {
    return null;
  }
}

export async function createCodeReader(formats: readonly DockFormat[]): Promise<CodeReader> {
  const Native = await nativeDetector(formats);
  if (Native) {
    const detector = new Native({ formats: [...formats] });
    return { kind: 'native', detect: (source) => detector.detect(source) };
  }
  const { BarcodeDetector, prepareZXingModule } = await import('barcode-detector/ponyfill');
  prepareZXingModule({
    overrides: {
      locateFile: (path: string, prefix: string) =>
        path.endsWith('.wasm') ? wasmUrl : prefix + path,
    },
  });
  const detector = new BarcodeDetector({ formats: [...formats] });
  return { kind: 'polyfill', detect: (source) => detector.detect(source) };
}
