/**
 * Range-serving benchmark: 50 concurrent HTTP Range requests against one rendition through the
 * real media route (visibility check included), on loopback. Prints figures; asserts nothing.
 *
 *   npm run bench range [-- --seconds 10] [-- --port 3409]
 *
 * Self-contained: starts a private MariaDB under .data/bench (port 3409 unless --port or
 * BENCH_DB_PORT says otherwise), a fresh database, and an in-process app; the rendition is a
 * generated clip (never downloaded media).
 */
import autocannon from 'autocannon';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { mkdir, stat } from 'node:fs/promises';
import path from 'node:path';
import { Tour } from '../server/db/entities/tour.entity';
import { User } from '../server/db/entities/user.entity';
import { MediaStorage } from '../server/media/storage';
import { generateClip } from '../tests/support/make-clip';
import { benchArg, startBench } from './support';

const DURATION = Number(benchArg('seconds')) || 10;
const CONNECTIONS = 50;

const bench = await startBench();
const { config, dataSource } = bench;
try {
  const storage = new MediaStorage(config.mediaDir);
  const dir = path.join(config.mediaDir, 'renditions', '1', 'j1');
  await mkdir(dir, { recursive: true });
  const file = await generateClip(path.join(dir, 'rendition-720p.mp4'), { seconds: 20, width: 1280, height: 720, audio: true });
  const { size } = await stat(file);
  const user = await dataSource.getRepository(User).save({ email: 'bench@bench.example', displayName: 'Bench (invented)', passwordHash: 'x', role: 'author' });
  const tour = await dataSource.getRepository(Tour).save({
    authorId: user.id,
    title: 'Bench tour (invented)',
    descriptionHtml: '',
    state: 'published',
    publishedAt: new Date(),
    mediaDir: storage.relative(dir),
    renditions: [{ height: 720, width: 1280, file: 'rendition-720p.mp4', bytes: size, videoBitrate: null, copied: false }],
  });
  const handle = bench.createApp();
  const server = http.createServer(handle.app);
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()));
  const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}/media/tours/${tour.id}/rendition-720p.mp4`;

  // Players ask for ~1 MiB windows at scattered offsets; vary them so no single range is cached.
  const chunk = 1024 * 1024;
  let i = 0;
  const result = await autocannon({
    url,
    connections: CONNECTIONS,
    duration: DURATION,
    requests: [
      {
        setupRequest: (req) => {
          const start = ((i++ * 7919 * 4096) % Math.max(1, size - chunk)) | 0;
          return { ...req, headers: { ...req.headers, range: `bytes=${start}-${start + chunk - 1}` } };
        },
      },
    ],
  });
  // Let requests autocannon left in flight finish before the database goes away.
  await new Promise<void>((r) => server.close(() => r()));
  await new Promise((r) => setTimeout(r, 1000));
  server.closeAllConnections();
  await handle.close();
  const ok206 = result['2xx'];
  console.log(`Range serving — ${CONNECTIONS} connections, ${DURATION} s, 1 MiB ranges of a ${(size / 1e6).toFixed(1)} MB rendition`);
  console.log(`  requests/s: mean ${result.requests.average.toFixed(0)}, p50 ${result.requests.p50}`);
  console.log(`  latency: p50 ${result.latency.p50} ms, p97.5 ${result.latency.p97_5} ms, p99 ${result.latency.p99} ms (autocannon reports p97.5, not p95)`);
  console.log(`  throughput: ${(result.throughput.average / 1e6).toFixed(1)} MB/s; 2xx ${ok206}, non-2xx ${result.non2xx}, errors ${result.errors}`);
} finally {
  await bench.close();
}
