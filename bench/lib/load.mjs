// HTTP load with autocannon; latencies recorded per response so any percentile can be read.
import autocannon from 'autocannon';

export function percentile(sorted, p) {
  if (sorted.length === 0) return NaN;
  const i = Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1);
  return sorted[Math.max(0, i)];
}

export function median(values) {
  return percentile(
    [...values].sort((a, b) => a - b),
    50,
  );
}

/**
 * Runs `connections` clients for `seconds` (or until `amount` requests are answered)
 * against one request (or `nextRequest()` per request) and returns requests per second over
 * 2xx answers, latency percentiles in ms and the count of answers that were not 2xx (a
 * broken path: the caller treats them as failure).
 */
export function load({
  url,
  connections,
  seconds,
  amount,
  method = 'GET',
  headers,
  body,
  nextRequest,
}) {
  const latencies = [];
  const statuses = new Map();
  let firstError = null;
  const instance = autocannon({
    url,
    connections,
    ...(amount ? { amount } : { duration: seconds }),
    // Slow answers are measured, not dropped: only past 30 s does one count as a timeout.
    timeout: 30,
    method,
    headers,
    body,
    requests: nextRequest ? [{ setupRequest: (req) => ({ ...req, ...nextRequest() }) }] : undefined,
  });
  instance.on('response', (client, statusCode, resBytes, responseTime) => {
    statuses.set(statusCode, (statuses.get(statusCode) ?? 0) + 1);
    if (statusCode >= 200 && statusCode < 300) latencies.push(responseTime);
  });
  instance.on('reqError', (e) => (firstError ??= e));
  const started = performance.now();
  const finished = summarise();
  // `stop()` ends the load early (a phase that lasts as long as something else does).
  finished.stop = () => instance.stop();
  return finished;

  async function summarise() {
    const result = await instance;
    const elapsed = (performance.now() - started) / 1000;
    const window = amount ? elapsed : Math.min(elapsed, result.duration || seconds) || seconds;
    latencies.sort((a, b) => a - b);
    const ok = latencies.length;
    const refused = [...statuses]
      .filter(([s]) => s < 200 || s >= 300)
      .reduce((n, [, c]) => n + c, 0);
    return {
      rps: ok / window,
      p50: percentile(latencies, 50),
      p95: percentile(latencies, 95),
      p99: percentile(latencies, 99),
      ok,
      // Answers other than 2xx, or none at all: a broken path, the caller gives up on it.
      failed: refused + (ok === 0 ? 1 : 0),
      timeouts: result.timeouts,
      statuses: Object.fromEntries(statuses),
      firstError,
      latencies,
      elapsed: window,
    };
  }
}

/** Loads run one after another, as one: answers over their summed time, pooled latencies. */
function merged(parts) {
  const latencies = parts.flatMap((p) => p.latencies).sort((a, b) => a - b);
  const elapsed = parts.reduce((t, p) => t + p.elapsed, 0);
  const statuses = {};
  for (const p of parts)
    for (const [k, n] of Object.entries(p.statuses)) statuses[k] = (statuses[k] ?? 0) + n;
  const refused = Object.entries(statuses)
    .filter(([k]) => Number(k) < 200 || Number(k) >= 300)
    .reduce((n, [, c]) => n + c, 0);
  return {
    rps: latencies.length / elapsed,
    p50: percentile(latencies, 50),
    p95: percentile(latencies, 95),
    p99: percentile(latencies, 99),
    ok: latencies.length,
    failed: refused + (latencies.length === 0 ? 1 : 0),
    timeouts: parts.reduce((n, p) => n + p.timeouts, 0),
    statuses,
    firstError: parts.find((p) => p.firstError)?.firstError ?? null,
    latencies,
    elapsed,
  };
}

/**
 * Loads (`load` options without `seconds`; two: the API and its ceiling) in turns, a b a b …, each turn `perTurn`
 * requests per connection, all answered before the other side's turn, until each side has
 * had `seconds`; each side's turns merged. One load alone is run the same way (the growth
 * runs), so its figures compare with those taken in turns. On a machine others share, the load from outside
 * drifts over a run: measured one after the other, the API and its ceiling met different
 * weather and their ratio moved with it; in turns, both meet it. Turns end when their last
 * answer is in (not after a time), so no request of one side is still being worked on in
 * the other's turn.
 */
export async function inTurns(specs, { seconds, perTurn = 4 }) {
  const sides = specs.map(() => []);
  const spent = specs.map(() => 0);
  while (spent.some((t) => t < seconds)) {
    for (const k of specs.keys()) {
      const r = await load({ ...specs[k], amount: specs[k].connections * perTurn });
      sides[k].push(r);
      spent[k] += r.elapsed;
    }
  }
  return sides.map(merged);
}
