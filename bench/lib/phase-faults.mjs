// Faults as figures (the readings import is bench/lib/phase-import.mjs): a backup of the
// bench set while readings keep coming, and the server's peak memory when it is handed a
// PNG that inflates to a huge bitmap. Their budgets (bench/lib/budgets.mjs) ask only that
// the fault is survived: the backup finishes, the PNG is refused within the server's
// memory ceiling, the import finishes while the server keeps answering.
import { spawn } from 'node:child_process';
import { request } from 'node:http';
import { join } from 'node:path';
import { bombPng } from './image-bomb.mjs';
import { readingBody, sampleWithRoom } from './phase-writes.mjs';
import { peakRssMb } from './server.mjs';

const ROOT = join(import.meta.dirname, '..', '..');

/**
 * `npm run backup` (ops/backup.ts: `VACUUM INTO`, one read transaction that writers in WAL
 * mode never restart) of the bench file while one reading a second is posted through the
 * API; the time until the backup finishes (or that it had not after `limitS` seconds), and
 * the readings answered meanwhile.
 */
export async function backupPhase({
  base,
  token,
  dbPath,
  uploadDir,
  samples,
  instruments,
  out,
  limitS,
}) {
  let posting = true;
  let answered = 0;
  const failures = [];
  const turn = { i: 0 };
  const poster = (async () => {
    while (posting) {
      const t = performance.now();
      // Each sample holds at most 20 readings: the next one with room takes it.
      const sample = sampleWithRoom(samples, turn);
      const res = await fetch(`${base}/api/samples/${sample.id}/readings`, {
        method: 'POST',
        headers: { authorization: `Bearer ${token}`, 'content-type': 'application/json' },
        // A mass that fits the sample's conductor, as the readings phase posts.
        body: readingBody(sample, turn.i, instruments),
      });
      if (res.status === 201) answered++;
      else failures.push(`${res.status} ${(await res.text()).slice(0, 200)}`);
      await new Promise((r) => setTimeout(r, Math.max(0, 1000 - (performance.now() - t))));
    }
  })();
  const t0 = performance.now();
  const code = await new Promise((resolve) => {
    const child = spawn(
      process.execPath,
      [join(ROOT, 'apps/backend/dist/ops/backup.js'), '--to', out],
      {
        cwd: ROOT,
        env: { ...process.env, DB_PATH: dbPath, UPLOAD_DIR: uploadDir, LOG_LEVEL: 'warn' },
        stdio: ['ignore', 'ignore', 'inherit'],
      },
    );
    // The online backup used before restarted at every write and never finished on the
    // 50 000-lot file; a backup that hangs again is stopped after `limitS` seconds.
    const timer = setTimeout(() => child.kill('SIGTERM'), limitS * 1000);
    child.on('exit', (exitCode) => {
      clearTimeout(timer);
      resolve(exitCode);
    });
  });
  const ms = performance.now() - t0;
  posting = false;
  await poster;
  const finished = code === 0;
  if (!finished && ms < limitS * 1000) throw new Error(`backup exited with ${code}`);
  if (failures.length) throw new Error(`readings during the backup failed: ${failures[0]}`);
  return { ms, finished, readingsDuring: answered };
}

/**
 * POST of a multipart form with node:http, reading the answer even when the server
 * answers and closes before the upload is through (fetch then fails with EPIPE).
 */
async function postForm(url, token, form) {
  const encoded = new Response(form);
  const body = Buffer.from(await encoded.arrayBuffer());
  return new Promise((resolve, reject) => {
    const req = request(url, {
      method: 'POST',
      agent: false,
      headers: {
        authorization: `Bearer ${token}`,
        'content-type': encoded.headers.get('content-type'),
        'content-length': body.length,
      },
    });
    req.on('response', (res) => {
      res.resume();
      res.on('end', () => resolve(res.statusCode));
    });
    req.on('error', (e) => (e.code === 'EPIPE' || e.code === 'ECONNRESET' ? null : reject(e)));
    req.end(body);
  });
}

/**
 * The server's peak memory (VmHWM) before and after it is handed a PNG whose data inflates
 * to `inflateMb` MiB (bench/lib/image-bomb.mjs), and its answer.
 */
export async function pngPhase({ base, token, pid, lotId, inflateMb }) {
  const png = bombPng(inflateMb);
  const before = peakRssMb(pid);
  const form = new FormData();
  form.append('file', new Blob([png], { type: 'image/png' }), 'inflating.png');
  const t0 = performance.now();
  const status = await postForm(`${base}/api/lots/${lotId}/photos`, token, form);
  const ms = performance.now() - t0;
  return {
    status,
    ms,
    fileKb: png.length / 1000,
    peakBeforeMb: before,
    peakAfterMb: peakRssMb(pid),
  };
}
