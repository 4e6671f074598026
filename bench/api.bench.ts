/**
 * Tour page API benchmark: GET /api/tours/:id/watch (tour + stops + tree cards + tracks in one
 * response) under 100 concurrent connections with autocannon on loopback, against a bare Express
 * endpoint in the same run; requests/s, latency percentiles (p95 computed from every response time),
 * the ratio between the two, and the number of SQL queries per request. Prints figures; asserts
 * nothing.
 *
 *   npm run bench:api [-- --seconds 10] [-- --port 3409]
 *
 * Self-contained: starts a private MariaDB under .data/bench (port 3409 unless --port or
 * BENCH_DB_PORT says otherwise), a fresh database with an invented corpus, and the app in process.
 */
import autocannon from 'autocannon';
import express from 'express';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import { countQueries } from '../tests/support/query-counter';
import { buildCorpus } from './bench-corpus';
import { benchArg, percentile, startBench } from './support';

const DURATION = Number(benchArg('seconds')) || 10;
const CONNECTIONS = 100;

let served = 0;

async function listen(app: http.RequestListener): Promise<{ server: http.Server; url: string }> {
  const server = http.createServer((req, res) => {
    served++; // counted on arrival: a request cut off when autocannon stops still runs its queries
    app(req, res);
  });
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()));
  return { server, url: `http://127.0.0.1:${(server.address() as AddressInfo).port}` };
}

async function close(server: http.Server): Promise<void> {
  // Let requests autocannon left in flight finish before the database goes away.
  await new Promise<void>((r) => {
    server.close(() => r());
    setTimeout(() => server.closeAllConnections(), 1000);
  });
}

interface Run {
  rps: number;
  total: number;
  non2xx: number;
  errors: number;
  p50: number;
  p95: number;
  p99: number;
  bytes: number;
}

async function hammer(url: string): Promise<Run> {
  const times: number[] = [];
  let bytes = 0;
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon({ url, connections: CONNECTIONS, duration: DURATION }, (err, res) => (err ? reject(err) : resolve(res)));
    instance.on('response', (_client, _status, resBytes, responseTime) => {
      times.push(responseTime);
      bytes = resBytes;
    });
  });
  times.sort((a, b) => a - b);
  return {
    rps: result.requests.average,
    total: result.requests.total,
    non2xx: result.non2xx,
    errors: result.errors,
    p50: percentile(times, 50),
    p95: percentile(times, 95),
    p99: percentile(times, 99),
    bytes,
  };
}

const bench = await startBench();
try {
  const ds = bench.dataSource;
  // A modest invented corpus: the watch endpoint reads one tour, so the total size matters little.
  const corpus = await buildCorpus(ds, { recordCount: 500, cueCount: 20_000, publishedTours: 100, draftTours: 4 });
  const tourId = corpus.tourIds[0]!;
  await ds.query('INSERT INTO caption_tracks (tour_id, lang, label, version) VALUES (?, ?, ?, 1)', [tourId, 'fr', 'Français (invented)']);
  const [{ n: stopCount }] = await ds.query('SELECT COUNT(*) AS n FROM stops WHERE tour_id = ?', [tourId]);

  const loadBefore = os.loadavg()[0]!;
  const handle = bench.createApp();
  const appServer = await listen(handle.app);
  const bare = express();
  bare.disable('x-powered-by');
  bare.get('/bare', (_req, res) => res.json({ ok: true }));
  const bareServer = await listen(bare);

  const counter = countQueries(ds);
  const watchUrl = `${appServer.url}/api/tours/${tourId}/watch`;
  const one = await fetch(watchUrl);
  const body = (await one.json()) as { stops: unknown[] };
  const perRequest = counter.count;

  console.log(`Tour page API — ${CONNECTIONS} connections, ${DURATION} s each, loopback; tour with ${stopCount} stops (${body.stops.length} in the response), 2 caption tracks (invented data)`);
  const bareRun = await hammer(`${bareServer.url}/bare`);
  await close(bareServer.server);
  counter.reset();
  served = 0;
  const watchRun = await hammer(watchUrl);
  // Requests still in flight when autocannon stops finish their queries here, so both counts match up.
  await close(appServer.server);
  await new Promise((r) => setTimeout(r, 1000));
  const queriesPerRequest = counter.count / Math.max(1, served);
  counter.restore();
  await handle.close();

  const line = (label: string, r: Run) =>
    console.log(
      `  ${label.padEnd(28)} ${r.rps.toFixed(0).padStart(7)} req/s   p50 ${r.p50.toFixed(1).padStart(7)} ms   p95 ${r.p95.toFixed(1).padStart(7)} ms   p99 ${r.p99.toFixed(1).padStart(7)} ms   ` +
        `${r.total} requests, non-2xx ${r.non2xx}, errors ${r.errors}, ${(r.bytes / 1024).toFixed(1)} KiB each`,
    );
  line('bare Express endpoint', bareRun);
  line('GET /api/tours/:id/watch', watchRun);
  console.log(`  ratio watch / bare: requests/s ${(watchRun.rps / bareRun.rps).toFixed(3)}, p95 latency ${(watchRun.p95 / Math.max(1, bareRun.p95)).toFixed(1)}×`);
  console.log(`  SQL queries per watch request: ${perRequest} for one anonymous request; ${queriesPerRequest.toFixed(2)} on average over ${served} requests received under load (independent of the number of stops)`);
  // Other work on the machine slows every figure; say how busy it was.
  console.log(`  machine: ${os.cpus().length} cores, 1-minute load average ${loadBefore.toFixed(1)} before the runs, ${os.loadavg()[0]!.toFixed(1)} after (this benchmark adds about 1–2)`);
} finally {
  await bench.close();
}
