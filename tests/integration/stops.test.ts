// Stops through the HTTP API against a real MariaDB: the no-overlap, inside-the-video and
// approved-record rules (product rules from the "Captions and stops" issue, no outside source),
// the chapters and metadata tracks (W3C WebVTT, read back with the npm webvtt-parser library),
// suggestions from names heard in the captions, and keyframes at stop starts. The garden club,
// its tours and every cultivar epithet here are invented for the tests.
import webvtt from 'webvtt-parser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Job } from '../../server/db/entities/job.entity';
import { Cultivar } from '../../server/db/entities/cultivar.entity';
import { Stop } from '../../server/db/entities/stop.entity';
import type { Tour } from '../../server/db/entities/tour.entity';
import type { User } from '../../server/db/entities/user.entity';
import { makeCultivarRow, makeTourRow } from '../support/caption-fixtures';
import { agentAs } from '../support/fixtures';
import { resetTables, startTestServer, type Agent, type TestServer } from '../support/http';

let server: TestServer;
let author: Agent;
let authorUser: User;
let otherAuthor: Agent;
let viewer: Agent;
let moderator: Agent;
let anonymous: Agent;
// Invented epithets (fictional records).
let flame: Cultivar;
let lace: Cultivar;
let proposed: Cultivar;

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  ({ agent: author, user: authorUser } = await agentAs(server, 'author'));
  otherAuthor = (await agentAs(server, 'author')).agent;
  viewer = (await agentAs(server, 'viewer')).agent;
  moderator = (await agentAs(server, 'moderator')).agent;
  anonymous = server.agent();
  flame = await makeCultivarRow(server.dataSource, 'Brindlewick Flame', ['Brindelwick Flame']);
  lace = await makeCultivarRow(server.dataSource, 'Quillmere Lace');
  proposed = await makeCultivarRow(server.dataSource, 'Tansy Hollow', [], { status: 'proposed' });
});
afterAll(async () => server.close());

const tourOf = (patch: Partial<Tour> = {}) => makeTourRow(server.dataSource, authorUser.id, { durationMs: 120_000, ...patch });
const stopCount = (tourId: number) => server.dataSource.getRepository(Stop).countBy({ tourId });

describe('stop rules', () => {
  it('adds stops, lists them by start, and refuses an overlapping one with 409 naming the other stop’s range', async () => {
    const tour = await tourOf();
    const a = await author.post(`/api/tours/${tour.id}/stops`, { startMs: 10_000, endMs: 40_000, title: 'By the gate', cultivarId: flame.id });
    expect(a.status).toBe(201);
    expect(a.body.stop).toMatchObject({ tourId: tour.id, startMs: 10_000, endMs: 40_000, title: 'By the gate', cultivar: { id: flame.id, acceptedName: "Acer palmatum 'Brindlewick Flame'", fictional: true } });
    // Printed as the RHS "Recommended style for printing plant names" (a summary of the ICNCP, 9th
    // edition) sets it: genus and species italic, the cultivar epithet roman in single quotes; the
    // segments read as the accepted name.
    const segments = a.body.stop.cultivar.nameSegments as { text: string; italic: boolean }[];
    expect(segments.map((x) => x.text).join('')).toBe("Acer palmatum 'Brindlewick Flame'");
    expect(segments.filter((x) => x.italic).map((x) => x.text.trim())).toEqual(['Acer palmatum']);

    const overlap = await author.post(`/api/tours/${tour.id}/stops`, { startMs: 30_000, endMs: 50_000, cultivarId: lace.id });
    expect(overlap.status).toBe(409);
    expect(overlap.body.error.code).toBe('stop_overlap');
    expect(overlap.body.error.message).toContain('0:10');
    expect(overlap.body.error.message).toContain('0:40');
    const inside = await author.post(`/api/tours/${tour.id}/stops`, { startMs: 15_000, endMs: 20_000, cultivarId: null });
    expect(inside.status).toBe(409);

    // Touching is not overlapping: one stop may start where the last one ends.
    const touching = await author.post(`/api/tours/${tour.id}/stops`, { startMs: 40_000, endMs: 45_000, cultivarId: null });
    expect(touching.status).toBe(201);
    const early = await author.post(`/api/tours/${tour.id}/stops`, { startMs: 0, endMs: 5000, title: 'Entrance', cultivarId: null });
    expect(early.status).toBe(201);

    const list = await author.get(`/api/tours/${tour.id}/stops`);
    expect(list.body.items.map((s: { startMs: number }) => s.startMs)).toEqual([0, 10_000, 40_000]);
    expect(await stopCount(tour.id)).toBe(3);
  });

  it('lets only one of several simultaneous overlapping stops in', async () => {
    const tour = await tourOf();
    await Promise.all([author, moderator].map((a) => a.refreshCsrf()));
    const results = await Promise.all(
      Array.from({ length: 6 }, (_, i) => (i % 2 ? moderator : author).post(`/api/tours/${tour.id}/stops`, { startMs: 1000 * i, endMs: 1000 * i + 8000, cultivarId: null })),
    );
    expect(results.map((r) => r.status).sort()).toEqual([201, 409, 409, 409, 409, 409]);
    expect(await stopCount(tour.id)).toBe(1);
  });

  it('refuses a stop that ends past the video (400) but accepts one ending exactly at the end', async () => {
    const tour = await tourOf();
    const past = await author.post(`/api/tours/${tour.id}/stops`, { startMs: 110_000, endMs: 125_000, cultivarId: null });
    expect(past.status).toBe(400);
    expect(past.body.error.code).toBe('stop_past_end');
    expect(past.body.error.message).toContain('2:00');
    const atEnd = await author.post(`/api/tours/${tour.id}/stops`, { startMs: 110_000, endMs: 120_000, cultivarId: null });
    expect(atEnd.status).toBe(201);
  });

  it('refuses a missing or unapproved cultivar record with 400 "cultivar_missing" and stores nothing', async () => {
    const tour = await tourOf();
    const missing = await author.post(`/api/tours/${tour.id}/stops`, { startMs: 0, endMs: 5000, cultivarId: 999_999 });
    expect(missing.status).toBe(400);
    expect(missing.body.error.code).toBe('cultivar_missing');
    const notApproved = await author.post(`/api/tours/${tour.id}/stops`, { startMs: 0, endMs: 5000, cultivarId: proposed.id });
    expect(notApproved.status).toBe(400);
    expect(notApproved.body.error.code).toBe('cultivar_missing');
    expect(await stopCount(tour.id)).toBe(0);
  });

  it('keeps a stop editable after its record is retired, but will not link a stop to a retired record anew', async () => {
    const tour = await tourOf();
    const retiring = await makeCultivarRow(server.dataSource, 'Ashcombe Veil');
    const s = (await author.post(`/api/tours/${tour.id}/stops`, { startMs: 0, endMs: 5000, cultivarId: retiring.id })).body.stop;
    await server.dataSource.getRepository(Cultivar).update({ id: retiring.id }, { status: 'retired' });
    const retitled = await author.patch(`/api/stops/${s.id}`, { title: 'Veil by the shed', endMs: 6000 });
    expect(retitled.status).toBe(200);
    expect(retitled.body.stop).toMatchObject({ title: 'Veil by the shed', endMs: 6000, cultivar: { id: retiring.id } });
    const other = (await author.post(`/api/tours/${tour.id}/stops`, { startMs: 7000, endMs: 9000, cultivarId: null })).body.stop;
    const relink = await author.patch(`/api/stops/${other.id}`, { cultivarId: retiring.id });
    expect(relink.status).toBe(400);
    expect(relink.body.error.code).toBe('cultivar_missing');
  });

  it('checks the shape: end after start and at least one second long', async () => {
    const tour = await tourOf();
    const backwards = await author.post(`/api/tours/${tour.id}/stops`, { startMs: 5000, endMs: 4000, cultivarId: null });
    expect(backwards.status).toBe(400);
    expect(backwards.body.error.fields.endMs).toBeTruthy();
    const short = await author.post(`/api/tours/${tour.id}/stops`, { startMs: 5000, endMs: 5500, cultivarId: null });
    expect(short.status).toBe(400);
  });

  it('edits a stop with the same rules (the stop does not overlap itself) and deletes it', async () => {
    const tour = await tourOf();
    const a = (await author.post(`/api/tours/${tour.id}/stops`, { startMs: 10_000, endMs: 20_000, cultivarId: null })).body.stop;
    const b = (await author.post(`/api/tours/${tour.id}/stops`, { startMs: 30_000, endMs: 40_000, cultivarId: null })).body.stop;
    const grow = await author.patch(`/api/stops/${a.id}`, { endMs: 25_000, cultivarId: lace.id });
    expect(grow.status).toBe(200);
    expect(grow.body.stop).toMatchObject({ startMs: 10_000, endMs: 25_000, cultivar: { id: lace.id } });
    const clash = await author.patch(`/api/stops/${a.id}`, { endMs: 35_000 });
    expect(clash.status).toBe(409);
    expect(clash.body.error.message).toContain('0:30');
    const inverted = await author.patch(`/api/stops/${b.id}`, { startMs: 41_000 });
    expect(inverted.status).toBe(400);
    const unlinked = await author.patch(`/api/stops/${a.id}`, { cultivarId: null, title: 'Mystery maple' });
    expect(unlinked.body.stop).toMatchObject({ cultivar: null, title: 'Mystery maple', endMs: 25_000 });
    expect((await author.del(`/api/stops/${b.id}`)).status).toBe(204);
    expect(await stopCount(tour.id)).toBe(1);
  });

  it('only the tour’s author, moderators and admins change stops; drafts are invisible to others', async () => {
    const draft = await tourOf({ state: 'ready' });
    const s = (await author.post(`/api/tours/${draft.id}/stops`, { startMs: 0, endMs: 5000, cultivarId: null })).body.stop;
    expect((await anonymous.get(`/api/tours/${draft.id}/stops`)).status).toBe(404);
    expect((await otherAuthor.get(`/api/tours/${draft.id}/stops`)).status).toBe(404);
    expect((await viewer.get(`/api/tours/${draft.id}/stops`)).status).toBe(404);
    expect((await anonymous.raw('GET', `/api/tours/${draft.id}/chapters.vtt`)).status).toBe(404);
    expect((await viewer.post(`/api/tours/${draft.id}/stops`, { startMs: 6000, endMs: 9000, cultivarId: null })).status).toBe(403);
    expect((await otherAuthor.post(`/api/tours/${draft.id}/stops`, { startMs: 6000, endMs: 9000, cultivarId: null })).status).toBe(404);
    expect((await otherAuthor.patch(`/api/stops/${s.id}`, { title: 'mine now' })).status).toBe(404);
    expect((await moderator.patch(`/api/stops/${s.id}`, { title: 'Checked by a moderator' })).status).toBe(200);

    const published = await tourOf({ state: 'published', publishedAt: new Date() });
    const p = (await author.post(`/api/tours/${published.id}/stops`, { startMs: 0, endMs: 5000, cultivarId: null })).body.stop;
    expect((await anonymous.get(`/api/tours/${published.id}/stops`)).body.items).toHaveLength(1);
    expect((await otherAuthor.post(`/api/tours/${published.id}/stops`, { startMs: 6000, endMs: 9000, cultivarId: null })).status).toBe(403);
    expect((await otherAuthor.del(`/api/stops/${p.id}`)).status).toBe(403);
    expect((await viewer.del(`/api/stops/${p.id}`)).status).toBe(403);
    expect(await stopCount(published.id)).toBe(1);
  });
});

describe('chapters and metadata tracks', () => {
  it('serves stops as a WebVTT chapters track (text/vtt) that the webvtt-parser library reads without errors', async () => {
    const tour = await tourOf({ state: 'published', publishedAt: new Date() });
    const titled = (await author.post(`/api/tours/${tour.id}/stops`, { startMs: 5000, endMs: 15_000, title: 'Gate & path', cultivarId: flame.id })).body.stop;
    const named = (await author.post(`/api/tours/${tour.id}/stops`, { startMs: 20_000, endMs: 30_000, cultivarId: lace.id })).body.stop;
    const unknown = (await author.post(`/api/tours/${tour.id}/stops`, { startMs: 64_500, endMs: 70_000, cultivarId: null })).body.stop;

    const res = await anonymous.raw('GET', `/api/tours/${tour.id}/chapters.vtt`);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('text/vtt; charset=utf-8');
    const text = await res.text();
    const parsed = new webvtt.WebVTTParser().parse(text, 'chapters');
    expect(parsed.errors).toEqual([]);
    expect(parsed.cues.map((c) => [c.id, c.startTime, c.endTime, c.text])).toEqual([
      [`stop-${titled.id}`, 5, 15, 'Gate &amp; path'],
      [`stop-${named.id}`, 20, 30, "Acer palmatum 'Quillmere Lace'"],
      [`stop-${unknown.id}`, 64.5, 70, 'Unidentified tree'],
    ]);
  });

  it('serves a metadata track whose cue payloads are JSON naming the cultivar record', async () => {
    const tour = await tourOf();
    const a = (await author.post(`/api/tours/${tour.id}/stops`, { startMs: 1000, endMs: 9000, cultivarId: flame.id })).body.stop;
    const b = (await author.post(`/api/tours/${tour.id}/stops`, { startMs: 9000, endMs: 12_000, cultivarId: null })).body.stop;
    const res = await author.raw('GET', `/api/tours/${tour.id}/metadata.vtt`);
    expect(res.headers.get('content-type')).toBe('text/vtt; charset=utf-8');
    const parsed = new webvtt.WebVTTParser().parse(await res.text(), 'metadata');
    expect(parsed.errors).toEqual([]);
    expect(parsed.cues.map((c) => JSON.parse(c.text))).toEqual([
      { stopId: a.id, cultivarId: flame.id, acceptedName: "Acer palmatum 'Brindlewick Flame'", slug: flame.slug },
      { stopId: b.id, cultivarId: null, acceptedName: null, slug: null },
    ]);
    expect((await otherAuthor.raw('GET', `/api/tours/${tour.id}/metadata.vtt`)).status).toBe(404);
  });
});

describe('stop suggestions from names heard in the captions', () => {
  // Invented narration for the fictional club's tour; names spelt right, as a recorded variant,
  // with one letter missing, and one record that is only proposed.
  const cues = [
    { startMs: 2000, endMs: 5000, text: 'Welcome to the Fernhollow garden.' },
    { startMs: 6000, endMs: 9000, text: 'This is <i>Brindlewick Flame</i>, grown in a buried pot.' },
    { startMs: 9500, endMs: 12_000, text: 'Brindlewick Flame colours early.' },
    { startMs: 20_000, endMs: 24_000, text: 'Next, Quilmere Lace by the pond.' },
    { startMs: 40_000, endMs: 43_000, text: 'Tansy Hollow is still being checked.' },
    { startMs: 50_000, endMs: 53_000, text: 'Back to Brindelwick Flame again.' },
    { startMs: 100_000, endMs: 103_000, text: 'And once more, Quillmere Lace.' },
  ];

  async function tourWithCaptions() {
    const tour = await tourOf();
    const r = await author.post(`/api/tours/${tour.id}/tracks/import`, { lang: 'en', label: 'English', cues });
    expect(r.status).toBe(201);
    return tour;
  }

  it('proposes a stop per heard name, from its cue to the next heard name (or 30 s / the video end), merging repeats', async () => {
    const tour = await tourWithCaptions();
    const r = await author.get(`/api/tours/${tour.id}/stop-suggestions?lang=en`);
    expect(r.status).toBe(200);
    const items = r.body.items as { startMs: number; endMs: number; cultivar: { id: number }; heard: string; score: number; kind: string; cueStartMs: number }[];
    expect(items.map((s) => [s.startMs, s.endMs, s.cultivar.id, s.kind])).toEqual([
      [6000, 20_000, flame.id, 'exact'],
      [20_000, 50_000, lace.id, 'fuzzy'],
      [50_000, 100_000, flame.id, 'variant'],
      [100_000, 120_000, lace.id, 'exact'], // +30 s would pass the 2:00 video end
    ]);
    expect(items[0]!.heard).toBe('Brindlewick Flame');
    expect(items[1]!.heard).toBe('Quilmere Lace');
    expect(items[0]!.score).toBe(1);
    expect(items[1]!.score).toBeGreaterThan(0.75);
    expect(items[1]!.score).toBeLessThan(1);
    expect(items.some((s) => s.cultivar.id === proposed.id)).toBe(false);

    // Every suggestion is a valid stop as it stands.
    for (const s of items) {
      const created = await author.post(`/api/tours/${tour.id}/stops`, { startMs: s.startMs, endMs: s.endMs, cultivarId: s.cultivar.id });
      expect(created.status).toBe(201);
    }
    // Once every range is a stop, nothing is left to suggest.
    expect((await author.get(`/api/tours/${tour.id}/stop-suggestions`)).body.items).toEqual([]);
  });

  it('skips time already covered by a stop and cuts a proposal short where the next stop begins', async () => {
    const tour = await tourWithCaptions();
    await author.post(`/api/tours/${tour.id}/stops`, { startMs: 45_000, endMs: 60_000, title: 'Already marked', cultivarId: flame.id });
    const r = await author.get(`/api/tours/${tour.id}/stop-suggestions?lang=en`);
    expect(r.body.items.map((s: { startMs: number; endMs: number }) => [s.startMs, s.endMs])).toEqual([
      [6000, 20_000],
      [20_000, 45_000],
      [100_000, 120_000],
    ]);
  });

  it('is for the tour’s editors only, and needs a caption track', async () => {
    const tour = await tourWithCaptions();
    expect((await viewer.get(`/api/tours/${tour.id}/stop-suggestions`)).status).toBe(403);
    expect((await otherAuthor.get(`/api/tours/${tour.id}/stop-suggestions`)).status).toBe(404);
    expect((await moderator.get(`/api/tours/${tour.id}/stop-suggestions`)).body.items).toHaveLength(4);
    const missing = await author.get(`/api/tours/${tour.id}/stop-suggestions?lang=de`);
    expect(missing.status).toBe(404);
    expect(missing.body.error.code).toBe('no_captions');
  });
});

describe('keyframes at stop starts', () => {
  it('queues a re-transcode (202) whose keyframe times are the stop starts in seconds', async () => {
    const tour = await tourOf({ sourceFile: 'uploads/fictional/source.mp4' });
    await author.post(`/api/tours/${tour.id}/stops`, { startMs: 45_500, endMs: 50_000, cultivarId: null });
    await author.post(`/api/tours/${tour.id}/stops`, { startMs: 10_000, endMs: 20_000, cultivarId: flame.id });
    const r = await author.post(`/api/tours/${tour.id}/keyframes`);
    expect(r.status).toBe(202);
    expect(r.body.job).toMatchObject({ state: 'queued' });
    const job = await server.dataSource.getRepository(Job).findOneByOrFail({ id: r.body.job.id });
    expect(job.subjectId).toBe(tour.id);
    expect(job.payload).toMatchObject({ keyframeTimesSec: [10, 45.5] });
    expect((await viewer.post(`/api/tours/${tour.id}/keyframes`)).status).toBe(403);
    expect((await otherAuthor.post(`/api/tours/${tour.id}/keyframes`)).status).toBe(404);
  });

  it('answers 409 when the tour has no video to transcode', async () => {
    const tour = await tourOf({ sourceFile: null });
    const r = await author.post(`/api/tours/${tour.id}/keyframes`);
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe('no_video');
  });
});
