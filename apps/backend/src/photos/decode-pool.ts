import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';

/**
 * Photos are decoded off the event loop, in worker threads, a bounded number at a time: a
 * 40-megapixel PNG blocked every other request for about 3 s when it was decoded on the
 * main thread.
 */

export interface DecodeJob {
  data: Buffer;
  mimeType: 'image/png' | 'image/jpeg';
  /** PNG: the bytes the image data must inflate to, and where its IDAT chunks are. */
  png?: { rawBytes: number; idat: [number, number][] };
  thumbnailPx: number;
  jpegMaxMemoryMb: number;
}

export type DecodeResult =
  | { ok: true; width: number; height: number; thumbnail: Uint8Array; threadId: number }
  | { ok: false; reason: 'inflates' | 'corrupt'; inflatedPast?: number; threadId: number };

/** Too many photos are waiting: the caller answers 503 and the client retries later. */
export class DecodePoolBusyError extends Error {}
/** The decode ran past its time and its worker was stopped. */
export class DecodeTimeoutError extends Error {}

/**
 * The worker's whole program. It is sent to the thread as source text (`toString()`), so it
 * must not use anything from this module's scope: it requires what it needs itself (the
 * image library by the path the main thread resolved), and works the same whether this file
 * runs built or from its TypeScript source under the test runner.
 */
function workerMain() {
  /* eslint-disable @typescript-eslint/no-require-imports */
  const { parentPort, workerData, threadId } =
    require('node:worker_threads') as typeof import('node:worker_threads');
  const zlib = require('node:zlib') as typeof import('node:zlib');
  const { Jimp } = require(workerData.jimp as string) as typeof import('jimp');
  /* eslint-enable @typescript-eslint/no-require-imports */

  /** Inflates the IDAT data counting bytes, keeping none; stops as soon as it passes `limit`. */
  function inflatedSize(data: Buffer, idat: [number, number][], limit: number) {
    return new Promise<number>((resolve) => {
      const inflate = zlib.createInflate();
      let total = 0;
      let done = false;
      const finish = (n: number) => {
        if (done) return;
        done = true;
        resolve(n);
      };
      inflate.on('data', (c: Buffer) => {
        total += c.length;
        if (total > limit) {
          inflate.destroy();
          finish(total);
        }
      });
      inflate.on('end', () => finish(total));
      inflate.on('error', () => finish(-1));
      for (const [s, e] of idat) inflate.write(data.subarray(s, e));
      inflate.end();
    });
  }

  parentPort!.on('message', async (job: DecodeJob) => {
    try {
      const data = Buffer.from(job.data.buffer, job.data.byteOffset, job.data.byteLength);
      if (job.png) {
        const size = await inflatedSize(data, job.png.idat, job.png.rawBytes);
        if (size > job.png.rawBytes) {
          parentPort!.postMessage({ ok: false, reason: 'inflates', inflatedPast: size, threadId });
          return;
        }
        if (size !== job.png.rawBytes) {
          parentPort!.postMessage({ ok: false, reason: 'corrupt', threadId });
          return;
        }
      }
      const image = await Jimp.fromBuffer(data, {
        'image/jpeg': { maxMemoryUsageInMB: job.jpegMaxMemoryMb, maxResolutionInMP: 100 },
      });
      const width = image.bitmap.width;
      const height = image.bitmap.height;
      if (Math.max(width, height) > job.thumbnailPx) {
        image.scaleToFit({ w: job.thumbnailPx, h: job.thumbnailPx });
      }
      const thumb =
        job.mimeType === 'image/jpeg'
          ? await image.getBuffer('image/jpeg', { quality: 80 })
          : await image.getBuffer('image/png');
      const out = new Uint8Array(thumb);
      parentPort!.postMessage({ ok: true, width, height, thumbnail: out, threadId }, [out.buffer]);
    } catch {
      parentPort!.postMessage({ ok: false, reason: 'corrupt', threadId });
    }
  });
}

interface Slot {
  worker: Worker;
}

export interface DecodePoolOptions {
  /** Decodes at once (threads). */
  size: number;
  /** Photos that may wait for a thread; one more is refused at once. */
  maxWaiting: number;
  /** A decode running longer is stopped (its thread ended) and the photo refused. */
  timeoutMs: number;
}

export class DecodePool {
  private readonly idle: Slot[] = [];
  private running = 0;
  private readonly waiting: (() => void)[] = [];
  private closed = false;

  constructor(readonly options: DecodePoolOptions) {}

  /** Runs one decode; refuses at once (DecodePoolBusyError) when the queue is full. */
  async run(job: DecodeJob): Promise<DecodeResult> {
    if (this.closed) throw new Error('the decode pool is closed');
    if (this.running >= this.options.size) {
      if (this.waiting.length >= this.options.maxWaiting) throw new DecodePoolBusyError();
      await new Promise<void>((resolve) => this.waiting.push(resolve));
    }
    this.running++;
    try {
      return await this.onWorker(job);
    } finally {
      this.running--;
      this.waiting.shift()?.();
    }
  }

  /** Photos decoding now and waiting (for tests and the bench). */
  load() {
    return { running: this.running, waiting: this.waiting.length };
  }

  async close() {
    this.closed = true;
    await Promise.all(this.idle.splice(0).map((s) => s.worker.terminate()));
  }

  private spawn(): Slot {
    const worker = new Worker(`(${workerMain.toString()})()`, {
      eval: true,
      workerData: { jimp: require.resolve('jimp') },
      // The JS heap of a decode thread; pixel buffers live outside it and are bounded by
      // the checks before decoding (megapixels, inflated size, JPEG frame).
      resourceLimits: { maxOldGenerationSizeMb: 256 },
    });
    worker.unref();
    return { worker };
  }

  private onWorker(job: DecodeJob): Promise<DecodeResult> {
    const slot = this.idle.pop() ?? this.spawn();
    return new Promise<DecodeResult>((resolve, reject) => {
      const { worker } = slot;
      const cleanup = () => {
        clearTimeout(timer);
        worker.off('message', onMessage);
        worker.off('error', onError);
        worker.off('exit', onExit);
      };
      const onMessage = (result: DecodeResult) => {
        cleanup();
        if (this.closed) void worker.terminate();
        else this.idle.push(slot);
        resolve(result);
      };
      const onError = () => {
        cleanup();
        void worker.terminate();
        resolve({ ok: false, reason: 'corrupt', threadId: worker.threadId });
      };
      const onExit = () => {
        cleanup();
        resolve({ ok: false, reason: 'corrupt', threadId: worker.threadId });
      };
      const timer = setTimeout(() => {
        cleanup();
        void worker.terminate();
        reject(new DecodeTimeoutError());
      }, this.options.timeoutMs);
      worker.on('message', onMessage);
      worker.on('error', onError);
      worker.on('exit', onExit);
      worker.postMessage(job);
    });
  }
}

let shared: DecodePool | undefined;

/**
 * The server's pool: one decode thread per core beyond the first (at least one, at most 2),
 * 16 photos waiting, 30 s per decode (our choices, no source). Threads are kept between
 * photos and do not keep the process alive.
 */
export function decodePool(): DecodePool {
  shared ??= new DecodePool({
    size: Math.max(1, Math.min(2, availableParallelism() - 1)),
    maxWaiting: 16,
    timeoutMs: 30_000,
  });
  return shared;
}
