import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Response } from 'superagent';

/** Collects a binary answer (a PDF, an image) into a Buffer: `.buffer(true).parse(collect)`. */
export function collect(res: Response, cb: (err: Error | null, body: Buffer) => void) {
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (c: Buffer) => chunks.push(c));
  stream.on('end', () => cb(null, Buffer.concat(chunks)));
}

let n = 0;

/** Writes a PDF into `dir` (a test app's scratch folder) as `doc-N.pdf`; answers its path. */
export function pdfFile(dir: string, pdf: Buffer): string {
  const file = join(dir, `doc-${++n}.pdf`);
  writeFileSync(file, pdf);
  return file;
}

/**
 * What one of poppler's tools (pdftotext, pdfinfo, pdffonts; apt-get install poppler-utils)
 * says of a PDF, written into `dir` first. pdftotext prints to standard output.
 */
export function pdfTool(dir: string, tool: string, pdf: Buffer, args: string[] = []): string {
  const file = pdfFile(dir, pdf);
  return execFileSync(tool, [...args, file, ...(tool === 'pdftotext' ? ['-'] : [])]).toString();
}
