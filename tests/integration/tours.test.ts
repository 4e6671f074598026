import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Job } from '../../server/db/entities/job.entity';
import { Tour } from '../../server/db/entities/tour.entity';
import { jobHandlers } from '../../server/jobs/handlers';
import { JobRunner } from '../../server/jobs/runner';
import { readTopLevelBoxes } from '../../server/media/mp4-boxes';
import { MediaStorage } from '../../server/media/storage';
import { agentAs } from '../support/fixtures';
import { resetTables, startTestServer, type Agent, type TestServer } from '../support/http';
import { generateBadFiles, generateClip } from '../support/make-clip';

let server: TestServer;
let author: Agent;
let storage: MediaStorage;
let runner: JobRunner;
const tmp = mkdtempSync(path.join(os.tmpdir(), 'grovewalk-tours-'));

/** ffprobe's own view of a file (an outside check, not the app's probe code). */
function ffprobe(file: string) {
  const out = execFileSync('ffprobe', ['-v', 'error', '-show_entries', 'stream=codec_type,codec_name,profile,level,pix_fmt,width,height:format=format_name', '-of', 'json', file]);
  return JSON.parse(out.toString()) as { streams: Record<string, string | number>[]; format: { format_name: string } };
}

async function waitForTour(id: number, states: string[], timeoutMs = 60_000): Promise<Tour> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const t = await server.dataSource.getRepository(Tour).findOneByOrFail({ id });
    if (states.includes(t.state) && !(await server.dataSource.getRepository(Job).countBy({ subjectId: id, state: 'running' }))) {
      const queued = await server.dataSource.getRepository(Job).countBy({ subjectId: id, state: 'queued' });
      if (!queued) return t;
    }
    if (Date.now() > until) throw new Error(`tour ${id} stuck in ${t.state}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  storage = new MediaStorage(server.config.mediaDir);
  await storage.ensure();
  author = (await agentAs(server, 'author')).agent;
  runner = new JobRunner(server.dataSource, jobHandlers(server.dataSource, storage), { pollMs: 100, heartbeatMs: 300, log: () => undefined });
  runner.start();
}, 120_000);
afterAll(async () => {
  await runner.stop();
  await server.close();
});

describe('upload → transcode job → web-ready renditions', () => {
  it('makes H.264 yuv420p + AAC-LC faststart MP4s, never above the source, stream-copying a web-ready top rung', async () => {
    const clip = await generateClip(path.join(tmp, 'web-ready.mp4'), { seconds: 3, width: 854, height: 480, audio: true, label: 'Fernhollow demo' });
    const up = await author.upload('/api/tours', clip, { title: 'Spring walk (test)', garden: 'Test garden' });
    expect(up.status).toBe(202);
    expect(up.body.tour).toMatchObject({ title: 'Spring walk (test)', state: 'processing', width: 854, height: 480 });
    const tour = await waitForTour(up.body.tour.id, ['ready', 'failed']);
    expect(tour.failureReason).toBeNull();
    expect(tour.state).toBe('ready');
    expect(tour.renditions!.map((r) => r.height)).toEqual([480, 360]);
    expect(tour.renditions![0].copied).toBe(true);

    for (const r of tour.renditions!) {
      const file = storage.resolve(`${tour.mediaDir}/${r.file}`);
      const info = ffprobe(file);
      const v = info.streams.find((s) => s.codec_type === 'video')!;
      const a = info.streams.find((s) => s.codec_type === 'audio')!;
      // ffmpeg documentation: yuv420p for players outside ffmpeg; `aac` encoder default profile is LC.
      expect(v).toMatchObject({ codec_name: 'h264', pix_fmt: 'yuv420p' });
      expect(Number(v.height)).toBeLessThanOrEqual(480);
      expect(a).toMatchObject({ codec_name: 'aac', profile: 'LC' });
      // ffmpeg-formats, mov muxer, +faststart: the moov box precedes mdat.
      const types = (await readTopLevelBoxes(file)).map((b) => b.type);
      expect(types.indexOf('moov')).toBeGreaterThan(-1);
      expect(types.indexOf('moov')).toBeLessThan(types.indexOf('mdat'));
    }
    expect(existsSync(storage.resolve(`${tour.mediaDir}/${tour.posterFile}`))).toBe(true);
    expect(tour.thumbStrip!.sheets.length).toBeGreaterThan(0);

    const api = await author.get(`/api/tours/${tour.id}`);
    expect(api.body.tour.renditions.map((r: { label: string }) => r.label)).toEqual(['480p', '360p']);
    expect(JSON.stringify(api.body)).not.toContain(server.config.mediaDir);
  });

  it('re-encodes a source that is not web-ready (MPEG-4 Part 2 in Matroska)', async () => {
    const clip = await generateClip(path.join(tmp, 'old-camera.mkv'), { seconds: 2, width: 320, height: 240, audio: true, codec: 'mpeg4' });
    const up = await author.upload('/api/tours', clip);
    expect(up.status).toBe(202);
    const tour = await waitForTour(up.body.tour.id, ['ready', 'failed']);
    expect(tour.state).toBe('ready');
    expect(tour.renditions).toHaveLength(1);
    expect(tour.renditions![0]).toMatchObject({ height: 240, copied: false });
    const v = ffprobe(storage.resolve(`${tour.mediaDir}/${tour.renditions![0].file}`)).streams.find((s) => s.codec_type === 'video')!;
    expect(v).toMatchObject({ codec_name: 'h264', pix_fmt: 'yuv420p' });
  });
});

describe('bad uploads are refused with a clear message and leave nothing behind', () => {
  it('refuses each broken file', async () => {
    const bad = await generateBadFiles(path.join(tmp, 'bad'));
    const before = await server.dataSource.getRepository(Tour).count();
    const expected: Record<string, RegExp> = {
      text: /upload_not_media/,
      empty: /upload_empty_file/,
      truncated: /upload_truncated|upload_unknown_format|upload_not_media/,
      truncatedFaststart: /upload_truncated/,
      truncatedMkv: /upload_truncated/,
      audioOnly: /upload_audio_only/,
      stillPng: /upload_still_image/,
      randomBytes: /upload_unknown_format|upload_not_media/,
    };
    for (const [kind, file] of Object.entries(bad)) {
      const r = await author.upload('/api/tours', file, {}, `${kind}.mp4`);
      expect(r.status, kind).toBe(422);
      expect(r.body.error.code, kind).toMatch(expected[kind]);
      expect(r.body.error.message.length, kind).toBeGreaterThan(15);
    }
    expect(await server.dataSource.getRepository(Tour).count()).toBe(before);
    expect(readdirSync(storage.incomingDir)).toEqual([]);
  });

  it('asks for a file when none was sent, and lets only authors upload', async () => {
    const none = await author.call('POST', '/api/tours', undefined);
    expect(none.status).toBe(400);
    const clip = path.join(tmp, 'web-ready.mp4');
    const viewer = (await agentAs(server, 'viewer')).agent;
    expect((await viewer.upload('/api/tours', clip)).status).toBe(403);
    expect((await server.agent().upload('/api/tours', clip)).status).toBe(401);
    expect(readdirSync(storage.incomingDir)).toEqual([]);
  });
});

describe('streaming with HTTP Range and visibility', () => {
  it('serves 206 with the right bytes, 416 for a bad range, and hides drafts', async () => {
    const clip = path.join(tmp, 'web-ready.mp4');
    const up = await author.upload('/api/tours', clip, { title: 'Range test tour' });
    expect(up.status, JSON.stringify(up.body)).toBe(202);
    const tour = await waitForTour(up.body.tour.id, ['ready', 'failed'], 40_000);
    expect(tour.failureReason).toBeNull();
    const url = (await author.get(`/api/tours/${tour.id}`)).body.tour.renditions[0].url as string;
    const file = storage.resolve(`${tour.mediaDir}/${tour.renditions![0].file}`);
    const bytes = readFileSync(file);

    const part = await author.raw('GET', url, { headers: { range: 'bytes=100-199' } });
    expect(part.status).toBe(206);
    expect(part.headers.get('content-range')).toBe(`bytes 100-199/${bytes.length}`);
    expect(part.headers.get('content-type')).toBe('video/mp4');
    expect(Buffer.from(await part.arrayBuffer()).equals(bytes.subarray(100, 200))).toBe(true);

    const tail = await author.raw('GET', url, { headers: { range: 'bytes=-50' } });
    expect(Buffer.from(await tail.arrayBuffer()).equals(bytes.subarray(bytes.length - 50))).toBe(true);

    const bad = await author.raw('GET', url, { headers: { range: `bytes=${bytes.length + 10}-` } });
    expect(bad.status).toBe(416);
    expect(bad.headers.get('content-range')).toBe(`bytes */${bytes.length}`);

    // Not published: strangers and other viewers get nothing.
    expect((await server.agent().raw('GET', url)).status).toBe(404);
    const viewer = (await agentAs(server, 'viewer')).agent;
    expect((await viewer.raw('GET', url)).status).toBe(404);
    expect((await viewer.get(`/api/tours/${tour.id}`)).status).toBe(404);

    // No path games.
    expect((await author.raw('GET', `/media/tours/${tour.id}/..%2F..%2Fdb-password`)).status).toBe(404);
    expect((await author.raw('GET', `/media/tours/${tour.id}/`)).status).toBe(404);

    expect((await author.post(`/api/tours/${tour.id}/publish`)).status).toBe(200);
    const pub = await server.agent().raw('GET', url);
    expect(pub.status).toBe(200);
    expect(pub.headers.get('cache-control')).toContain('public');
    expect((await server.agent().get('/api/tours')).body.items.map((t: { id: number }) => t.id)).toContain(tour.id);
  });
});

describe('tour lifecycle', () => {
  it('edits with sanitised HTML, unpublishes, deletes with its files', async () => {
    const up = await author.upload('/api/tours', path.join(tmp, 'web-ready.mp4'));
    const tour = await waitForTour(up.body.tour.id, ['ready']);
    const edit = await author.patch(`/api/tours/${tour.id}`, {
      descriptionHtml: '<p>Hello <strong>maples</strong><script>alert(1)</script><a href="javascript:alert(1)">x</a><img src=x onerror=alert(1)></p>',
      filmedOn: '2026-04-18',
    });
    expect(edit.status).toBe(200);
    expect(edit.body.tour.descriptionHtml).toBe('<p>Hello <strong>maples</strong><a rel="noopener noreferrer nofollow" target="_blank">x</a></p>');
    const future = await author.patch(`/api/tours/${tour.id}`, { filmedOn: '2999-01-01' });
    expect(future.status).toBe(400);

    const other = (await agentAs(server, 'author')).agent;
    expect((await other.patch(`/api/tours/${tour.id}`, { title: 'Not mine' })).status).toBe(404);
    const mod = (await agentAs(server, 'moderator')).agent;
    expect((await mod.patch(`/api/tours/${tour.id}`, { title: 'Moderated title' })).status).toBe(200);

    expect((await author.del(`/api/tours/${tour.id}`)).status).toBe(204);
    expect(await server.dataSource.getRepository(Tour).countBy({ id: tour.id })).toBe(0);
    expect(existsSync(storage.uploadsDir(tour.id))).toBe(false);
    expect(existsSync(storage.tourRenditionsRoot(tour.id))).toBe(false);
  });
});
