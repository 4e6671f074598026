// Caption tracks through the HTTP API against a real MariaDB: preview, import, autosave with the
// version check, export and the transcript. Tours, people and caption texts are invented for the
// fictional Fernhollow Garden Club; timings that check parsing come from the sources named beside them.
import webvtt from 'webvtt-parser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CaptionTrack } from '../../server/db/entities/caption-track.entity';
import { CueRow } from '../../server/db/entities/cue.entity';
import type { Tour } from '../../server/db/entities/tour.entity';
import type { User } from '../../server/db/entities/user.entity';
import { CAPTION_FILE_MAX_BYTES } from '../../shared/schemas/captions';
import { makeTourRow, postCaptionFile } from '../support/caption-fixtures';
import { agentAs } from '../support/fixtures';
import { resetTables, startTestServer, type Agent, type TestServer } from '../support/http';

let server: TestServer;
let author: Agent;
let authorUser: User;
let otherAuthor: Agent;
let viewer: Agent;
let moderator: Agent;
let moderatorUser: User;
let admin: Agent;
let anonymous: Agent;

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  ({ agent: author, user: authorUser } = await agentAs(server, 'author'));
  otherAuthor = (await agentAs(server, 'author')).agent;
  viewer = (await agentAs(server, 'viewer')).agent;
  ({ agent: moderator, user: moderatorUser } = await agentAs(server, 'moderator'));
  admin = (await agentAs(server, 'admin')).agent;
  anonymous = server.agent();
});
afterAll(async () => server.close());

const tourOf = (patch: Partial<Tour> = {}) => makeTourRow(server.dataSource, authorUser.id, patch);
const cueCount = (tourId: number) =>
  server.dataSource.getRepository(CueRow).createQueryBuilder('c').innerJoin(CaptionTrack, 't', 't.id = c.trackId').where('t.tourId = :tourId', { tourId }).getCount();
const trackCount = (tourId: number) => server.dataSource.getRepository(CaptionTrack).countBy({ tourId });

// Invented caption text; ids, settings, tags and an omitted-hours timestamp on purpose.
const VTT = [
  'WEBVTT Fernhollow Garden Club (fictional)',
  '',
  'intro',
  '00:01.000 --> 00:04.000',
  'Welcome to the <i>Fernhollow</i> garden.',
  '',
  '00:00:04.500 --> 00:00:08.250 align:start line:90%',
  "This tree came from our club's",
  'autumn plant swap.',
  '',
  'bark',
  '00:10.000 --> 00:14.000 position:10%',
  'Note the <b>lace-like</b> leaves &amp; red stems.',
  '',
].join('\n');

// Timing lines: the first is the Matroska specification's SRT example ("SRT Subtitles");
// the text and the second timing are ours. CRLF line endings, as that text calls common.
const SRT = [
  '1',
  '00:02:17,440 --> 00:02:20,375',
  '<font color="#ffcc00">The first maple</font> on our walk',
  'stands by the gate.',
  '',
  '2',
  '00:02:21,000 --> 00:02:23,500',
  '<i>Look at the bark.</i>',
  '',
].join('\r\n');

describe('import preview', () => {
  it('reads WebVTT with omitted hours as W3C WebVTT timestamps define them (hours optional: 00:01.000 is 1 s), and stores nothing', async () => {
    const tour = await tourOf();
    const r = await postCaptionFile(author, `/api/tours/${tour.id}/tracks/preview`, VTT);
    expect(r.status).toBe(200);
    expect(r.body.format).toBe('vtt');
    expect(r.body.encoding).toBe('UTF-8');
    expect(r.body.problems).toEqual([]);
    expect(r.body.pastEnd).toEqual([]);
    expect(r.body.cues).toEqual([
      { id: 'intro', startMs: 1000, endMs: 4000, text: 'Welcome to the <i>Fernhollow</i> garden.', settings: '' },
      { id: null, startMs: 4500, endMs: 8250, text: "This tree came from our club's\nautumn plant swap.", settings: 'align:start line:90%' },
      { id: 'bark', startMs: 10_000, endMs: 14_000, text: 'Note the <b>lace-like</b> leaves &amp; red stems.', settings: 'position:10%' },
    ]);
    expect(await trackCount(tour.id)).toBe(0);
  });

  it('reads the Matroska SRT example timing through HTTP: 00:02:17,440 starts at 137 440 ms and lasts 2 935 ms (Matroska specification, "SRT Subtitles")', async () => {
    const tour = await tourOf({ durationMs: 180_000 });
    const r = await postCaptionFile(author, `/api/tours/${tour.id}/tracks/preview`, SRT, 'walk.srt');
    expect(r.status).toBe(200);
    expect(r.body.format).toBe('srt');
    const [first, second] = r.body.cues;
    expect(first.startMs).toBe(137_440);
    expect(first.endMs - first.startMs).toBe(2935);
    // Matroska text on converting to WebVTT: the number becomes the cue id, <font> tags are dropped.
    expect(first.id).toBe('1');
    expect(first.text).toBe('The first maple on our walk\nstands by the gate.');
    expect(second).toEqual({ id: '2', startMs: 141_000, endMs: 143_500, text: '<i>Look at the bark.</i>', settings: '' });
    expect(await trackCount(tour.id)).toBe(0);
  });

  it('lists problems with their line numbers and stores nothing; a bad timing line drops only its cue (W3C WebVTT parser rules, §6)', async () => {
    const tour = await tourOf();
    const file = ['WEBVTT', '', '00:01.000 --> 00:02.000', 'Good cue', '', '00:03.000 --> 00:0x.000', 'Letter in the end time', '', '00:05.000 --> 00:06.000', 'Another good cue', ''].join('\n');
    const r = await postCaptionFile(author, `/api/tours/${tour.id}/tracks/preview`, file);
    expect(r.status).toBe(200);
    expect(r.body.cues.map((c: { text: string }) => c.text)).toEqual(['Good cue', 'Another good cue']);
    expect(r.body.problems.length).toBeGreaterThan(0);
    // Line 6 of the file is the broken timing line.
    expect(r.body.problems.some((p: { line: number; severity: string }) => p.line === 6 && p.severity === 'error')).toBe(true);
    expect(await trackCount(tour.id)).toBe(0);
    expect(await cueCount(tour.id)).toBe(0);
  });

  it('keeps a cue whose end is before its start, as the W3C parser does (web-platform-tests "timings-negative"), and the quality checks flag it after import', async () => {
    const tour = await tourOf();
    const file = ['WEBVTT', '', '00:05.000 --> 00:04.000', 'Backwards', '', '00:06.000 --> 00:08.000', 'Forwards', ''].join('\n');
    const preview = await postCaptionFile(author, `/api/tours/${tour.id}/tracks/preview`, file);
    expect(preview.status).toBe(200);
    expect(preview.body.cues.map((c: { startMs: number; endMs: number }) => [c.startMs, c.endMs])).toEqual([
      [5000, 4000],
      [6000, 8000],
    ]);
    const imported = await author.post(`/api/tours/${tour.id}/tracks/import`, { lang: 'en', label: 'English', cues: preview.body.cues });
    expect(imported.status).toBe(201);
    const detail = await author.get(`/api/tracks/${imported.body.track.id}`);
    expect(detail.body.cues[0]).toMatchObject({ startMs: 5000, endMs: 4000 });
    expect(detail.body.quality).toContainEqual(expect.objectContaining({ cueIndex: 0, kind: 'timing', severity: 'error' }));
  });

  it('reports the cues that run past the end of the video by index', async () => {
    const tour = await tourOf({ durationMs: 60_000 });
    const file = ['WEBVTT', '', '00:50.000 --> 00:55.000', 'Inside', '', '00:58.000 --> 01:02.000', 'Across the end', '', '01:05.000 --> 01:07.000', 'After the end', ''].join('\n');
    const r = await postCaptionFile(author, `/api/tours/${tour.id}/tracks/preview`, file);
    expect(r.status).toBe(200);
    expect(r.body.pastEnd).toEqual([1, 2]);
    expect(r.body.problems).toContainEqual(expect.objectContaining({ line: 0, severity: 'warning', message: expect.stringContaining('past the end of the video') }));
  });

  it('refuses a binary file with 422 and the decoder’s reason', async () => {
    const tour = await tourOf();
    // The PNG signature (PNG specification, §5.2) followed by an IHDR length: NUL bytes, not text.
    const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0x00, 0x00, 0x00, 0x0d, 0x49, 0x48, 0x44, 0x52]);
    const r = await postCaptionFile(author, `/api/tours/${tour.id}/tracks/preview`, png, 'captions.vtt');
    expect(r.status).toBe(422);
    expect(r.body.error.code).toBe('caption_unreadable');
    expect(r.body.error.message).toMatch(/binary/);
  });

  it('refuses text that is neither WebVTT nor SRT with 422', async () => {
    const tour = await tourOf();
    const r = await postCaptionFile(author, `/api/tours/${tour.id}/tracks/preview`, 'Shopping list: bark mulch, twine.\n', 'notes.txt');
    expect(r.status).toBe(422);
    expect(r.body.error.code).toBe('caption_format_unknown');
  });

  it('refuses a file over the size limit with 413 and a message naming the limit', async () => {
    const tour = await tourOf();
    const huge = 'WEBVTT\n\n' + 'a'.repeat(CAPTION_FILE_MAX_BYTES);
    const r = await postCaptionFile(author, `/api/tours/${tour.id}/tracks/preview`, huge);
    expect(r.status).toBe(413);
    expect(r.body.error.code).toBe('caption_file_too_large');
    expect(r.body.error.message).toContain(`${CAPTION_FILE_MAX_BYTES / 1024 / 1024} MB`);
  });

  it('asks for a file when none is sent', async () => {
    const tour = await tourOf();
    const r = await author.post(`/api/tours/${tour.id}/tracks/preview`, {});
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('no_file');
  });
});

describe('tracks: create, import, languages', () => {
  it('refuses unknown or malformed language tags with 400 and stores nothing (BCP 47 / IANA subtag registry via ICU)', async () => {
    const tour = await tourOf();
    const unknown = await author.post(`/api/tours/${tour.id}/tracks`, { lang: 'xq', label: 'Mystery' });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.code).toBe('unknown_language');
    expect(unknown.body.error.fields.lang).toBeTruthy();
    const malformed = await author.post(`/api/tours/${tour.id}/tracks`, { lang: 'english please', label: 'English' });
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.fields.lang).toBeTruthy();
    const imported = await author.post(`/api/tours/${tour.id}/tracks/import`, { lang: 'zz', label: 'Z', cues: [{ startMs: 0, endMs: 1000, text: 'x' }] });
    expect(imported.status).toBe(400);
    expect(await trackCount(tour.id)).toBe(0);
    expect(await cueCount(tour.id)).toBe(0);
  });

  it('creates one track per language, stores the canonical tag (BCP 47 case conventions: en-GB), and answers 409 for a second one', async () => {
    const tour = await tourOf();
    const created = await author.post(`/api/tours/${tour.id}/tracks`, { lang: 'en-gb', label: 'English (UK)' });
    expect(created.status).toBe(201);
    expect(created.body.track).toMatchObject({ tourId: tour.id, lang: 'en-GB', label: 'English (UK)', version: 1, cueCount: 0 });
    const again = await author.post(`/api/tours/${tour.id}/tracks`, { lang: 'en-GB', label: 'Again' });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('track_exists');
    const importAgain = await author.post(`/api/tours/${tour.id}/tracks/import`, { lang: 'EN-GB', label: 'Again', cues: [] });
    expect(importAgain.status).toBe(409);
    expect(importAgain.body.error.code).toBe('track_exists');
    const list = await anonymous.get(`/api/tours/${tour.id}/tracks`);
    expect(list.status).toBe(404); // the tour is not published
    const mine = await author.get(`/api/tours/${tour.id}/tracks`);
    expect(mine.body.items.map((t: { lang: string }) => t.lang)).toEqual(['en-GB']);
  });

  it('stores imported cues sorted by start time; replace=true swaps the cues and moves the version on', async () => {
    const tour = await tourOf();
    const cues = [
      { startMs: 9000, endMs: 10_000, text: 'third' },
      { startMs: 1000, endMs: 2000, text: 'first', id: 'a' },
      { startMs: 5000, endMs: 6000, text: 'second', settings: 'align:end' },
    ];
    const first = await author.post(`/api/tours/${tour.id}/tracks/import`, { lang: 'en', label: 'English', cues });
    expect(first.status).toBe(201);
    expect(first.body.track).toMatchObject({ version: 1, cueCount: 3 });
    const detail = await author.get(`/api/tracks/${first.body.track.id}`);
    expect(detail.body.cues.map((c: { text: string }) => c.text)).toEqual(['first', 'second', 'third']);
    expect(detail.body.cues[1].settings).toBe('align:end');

    const replaced = await author.post(`/api/tours/${tour.id}/tracks/import`, { lang: 'en', label: 'English (edited)', replace: true, cues: [{ startMs: 0, endMs: 1500, text: 'only' }] });
    expect(replaced.status).toBe(201);
    expect(replaced.body.track).toMatchObject({ id: first.body.track.id, version: 2, cueCount: 1, label: 'English (edited)' });
    expect(await cueCount(tour.id)).toBe(1);
  });

  it('keeps the stored cues when an import fails validation half-way (one transaction, nothing half-saved)', async () => {
    const tour = await tourOf();
    const ok = await author.post(`/api/tours/${tour.id}/tracks/import`, { lang: 'en', label: 'English', cues: [{ startMs: 0, endMs: 1000, text: 'kept' }] });
    expect(ok.status).toBe(201);
    const bad = await author.post(`/api/tours/${tour.id}/tracks/import`, {
      lang: 'en',
      label: 'English',
      replace: true,
      cues: [{ startMs: 0, endMs: 1000, text: 'fine' }, { startMs: 2000, endMs: 3000, text: 'a --> b' }],
    });
    expect(bad.status).toBe(400);
    const detail = await author.get(`/api/tracks/${ok.body.track.id}`);
    expect(detail.body.cues.map((c: { text: string }) => c.text)).toEqual(['kept']);
    expect(detail.body.track.version).toBe(1);
  });

  it('renames and deletes a track', async () => {
    const tour = await tourOf();
    const t = await author.post(`/api/tours/${tour.id}/tracks`, { lang: 'ja', label: 'Japanese' });
    const renamed = await author.patch(`/api/tracks/${t.body.track.id}`, { label: '日本語' });
    expect(renamed.status).toBe(200);
    expect(renamed.body.track).toMatchObject({ label: '日本語', version: 1 });
    const gone = await author.del(`/api/tracks/${t.body.track.id}`);
    expect(gone.status).toBe(204);
    expect((await author.get(`/api/tracks/${t.body.track.id}`)).status).toBe(404);
  });
});

describe('round trip: import → export → import gives the same cues', () => {
  it('WebVTT: the export is valid for the webvtt-parser reference library and re-imports to the same cues', async () => {
    const tour = await tourOf();
    const preview = await postCaptionFile(author, `/api/tours/${tour.id}/tracks/preview`, VTT);
    const imported = await author.post(`/api/tours/${tour.id}/tracks/import`, { lang: 'en', label: 'English', cues: preview.body.cues });
    expect(imported.status).toBe(201);
    const trackId = imported.body.track.id;
    expect((await author.get(`/api/tracks/${trackId}`)).body.cues).toEqual(preview.body.cues);

    const res = await author.raw('GET', `/api/tracks/${trackId}/export.vtt`);
    expect(res.status).toBe(200);
    // W3C WebVTT: served as text/vtt, UTF-8.
    expect(res.headers.get('content-type')).toBe('text/vtt; charset=utf-8');
    expect(res.headers.get('content-disposition')).toContain('fernhollow-garden-club-spring-walk-fictional.en.vtt');
    const text = await res.text();
    expect(text.startsWith('WEBVTT')).toBe(true);

    // Outside check: the npm webvtt-parser library reads the export without errors, times in seconds.
    const reference = new webvtt.WebVTTParser().parse(text, 'metadata');
    expect(reference.errors).toEqual([]);
    expect(reference.cues.map((c) => [c.id, c.startTime, c.endTime])).toEqual([
      ['intro', 1, 4],
      ['', 4.5, 8.25],
      ['bark', 10, 14],
    ]);

    const again = await postCaptionFile(author, `/api/tours/${tour.id}/tracks/preview`, text, 'export.vtt');
    expect(again.body.problems).toEqual([]);
    expect(again.body.cues).toEqual(preview.body.cues);
  });

  it('SRT: the export keeps the Matroska example timing line, uses CRLF, and re-imports to the same cues', async () => {
    const tour = await tourOf({ durationMs: 180_000 });
    const preview = await postCaptionFile(author, `/api/tours/${tour.id}/tracks/preview`, SRT, 'walk.srt');
    const imported = await author.post(`/api/tours/${tour.id}/tracks/import`, { lang: 'en', label: 'English', cues: preview.body.cues });
    const trackId = imported.body.track.id;

    const res = await author.raw('GET', `/api/tracks/${trackId}/export.srt`);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/^application\/x-subrip/);
    expect(res.headers.get('content-disposition')).toMatch(/^attachment; filename="?[a-z0-9-]+\.en\.srt"?$/);
    const text = await res.text();
    // Matroska specification, "SRT Subtitles": number, HH:MM:SS,mmm --> HH:MM:SS,mmm, text, blank line.
    expect(text.startsWith('1\r\n00:02:17,440 --> 00:02:20,375\r\n')).toBe(true);

    const again = await postCaptionFile(author, `/api/tours/${tour.id}/tracks/preview`, text, 'export.srt');
    expect(again.body.format).toBe('srt');
    expect(again.body.problems).toEqual([]);
    expect(again.body.cues).toEqual(preview.body.cues);

    // The same track exported as WebVTT reads back to the same cues too.
    const vtt = await (await author.raw('GET', `/api/tracks/${trackId}/export.vtt`)).text();
    expect(vtt).toContain('00:02:17.440 --> 00:02:20.375');
    const viaVtt = await postCaptionFile(author, `/api/tours/${tour.id}/tracks/preview`, vtt, 'export.vtt');
    expect(viaVtt.body.cues).toEqual(preview.body.cues);
  });
});

describe('autosave and the version check', () => {
  it('saves the whole list, sorted, and moves the version on', async () => {
    const tour = await tourOf();
    const t = await author.post(`/api/tours/${tour.id}/tracks`, { lang: 'en', label: 'English' });
    const saved = await author.call('PUT', `/api/tracks/${t.body.track.id}/cues`, {
      version: 1,
      cues: [
        { startMs: 3000, endMs: 4000, text: 'later' },
        { startMs: 1000, endMs: 2000, text: 'earlier' },
      ],
    });
    expect(saved.status).toBe(200);
    expect(saved.body.track).toMatchObject({ version: 2, cueCount: 2 });
    const detail = await author.get(`/api/tracks/${t.body.track.id}`);
    expect(detail.body.cues.map((c: { text: string }) => c.text)).toEqual(['earlier', 'later']);
  });

  it('refuses the second of two saves of the same version with 409, naming who saved last; the stored cues are the first save’s', async () => {
    const tour = await tourOf();
    const t = await author.post(`/api/tours/${tour.id}/tracks/import`, { lang: 'en', label: 'English', cues: [{ startMs: 0, endMs: 1000, text: 'original' }] });
    const id = t.body.track.id;
    const loadedByAuthor = (await author.get(`/api/tracks/${id}`)).body.track.version;
    const loadedByModerator = (await moderator.get(`/api/tracks/${id}`)).body.track.version;
    expect(loadedByAuthor).toBe(1);
    expect(loadedByModerator).toBe(1);

    const first = await author.call('PUT', `/api/tracks/${id}/cues`, { version: loadedByAuthor, cues: [{ startMs: 0, endMs: 1000, text: 'author’s fix' }] });
    expect(first.status).toBe(200);
    const second = await moderator.call('PUT', `/api/tracks/${id}/cues`, { version: loadedByModerator, cues: [{ startMs: 0, endMs: 1000, text: 'moderator’s fix' }] });
    expect(second.status).toBe(409);
    expect(second.body.error.code).toBe('version_conflict');
    expect(second.body.error.message).toContain(authorUser.displayName);
    expect(second.body.error.message).toMatch(/\d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC/);

    const detail = await moderator.get(`/api/tracks/${id}`);
    expect(detail.body.cues.map((c: { text: string }) => c.text)).toEqual(['author’s fix']);
    expect(detail.body.track.version).toBe(2);
    expect(moderatorUser.displayName).not.toBe(authorUser.displayName);
  });

  it('lets exactly one of several simultaneous saves of the same version through', async () => {
    const tour = await tourOf();
    const t = await author.post(`/api/tours/${tour.id}/tracks`, { lang: 'en', label: 'English' });
    const id = t.body.track.id;
    const editors = [author, moderator, admin, author, moderator, admin];
    await Promise.all(editors.map((a) => a.refreshCsrf()));
    const results = await Promise.all(
      editors.map((a, i) => a.call('PUT', `/api/tracks/${id}/cues`, { version: 1, cues: Array.from({ length: i + 1 }, (_, k) => ({ startMs: k * 2000, endMs: k * 2000 + 1000, text: `save ${i}` })) })),
    );
    expect(results.map((r) => r.status).sort()).toEqual([200, 409, 409, 409, 409, 409]);
    const winner = results.find((r) => r.status === 200)!;
    const detail = await author.get(`/api/tracks/${id}`);
    expect(detail.body.track.version).toBe(2);
    expect(detail.body.cues).toHaveLength(winner.body.track.cueCount);
    expect(new Set(detail.body.cues.map((c: { text: string }) => c.text)).size).toBe(1);
  });

  it('takes a whole track over 1 MB in one save, while an ordinary route refuses a JSON body over 1 MB with 413', async () => {
    const tour = await tourOf();
    const t = await author.post(`/api/tours/${tour.id}/tracks`, { lang: 'en', label: 'English' });
    const id = t.body.track.id;
    const cues = Array.from({ length: 1200 }, (_, k) => ({ startMs: k * 2000, endMs: k * 2000 + 1500, text: `Cue ${k} by the fern bed. ${'x'.repeat(900)}` }));
    expect(JSON.stringify({ version: 1, cues }).length).toBeGreaterThan(1024 * 1024);
    const saved = await author.call('PUT', `/api/tracks/${id}/cues`, { version: 1, cues });
    expect(saved.status).toBe(200);
    expect(saved.body.track).toMatchObject({ version: 2, cueCount: 1200 });

    const rename = await author.patch(`/api/tracks/${id}`, { label: 'y'.repeat(1024 * 1024 + 1) });
    expect(rename.status).toBe(413);
    expect(rename.body.error.code).toBe('too_large');
    expect((await author.get(`/api/tracks/${id}`)).body.track.label).toBe('English');
  });
});

describe('who may see and edit captions', () => {
  it('a draft tour’s tracks are invisible to others; only the author, moderators and admins edit', async () => {
    const tour = await tourOf({ state: 'ready' });
    const t = await author.post(`/api/tours/${tour.id}/tracks/import`, { lang: 'en', label: 'English', cues: [{ startMs: 0, endMs: 1000, text: 'private' }] });
    const id = t.body.track.id;

    for (const [who, agent] of [['anonymous', anonymous], ['viewer', viewer], ['other author', otherAuthor]] as const) {
      expect([who, (await agent.get(`/api/tours/${tour.id}/tracks`)).status]).toEqual([who, 404]);
      expect([who, (await agent.get(`/api/tracks/${id}`)).status]).toEqual([who, 404]);
      expect([who, (await agent.raw('GET', `/api/tracks/${id}/export.vtt`)).status]).toEqual([who, 404]);
      expect([who, (await agent.get(`/api/tours/${tour.id}/transcript`)).status]).toEqual([who, 404]);
    }
    expect((await anonymous.post(`/api/tours/${tour.id}/tracks`, { lang: 'de', label: 'Deutsch' })).status).toBe(401);
    expect((await viewer.post(`/api/tours/${tour.id}/tracks`, { lang: 'de', label: 'Deutsch' })).status).toBe(403);
    expect((await otherAuthor.post(`/api/tours/${tour.id}/tracks`, { lang: 'de', label: 'Deutsch' })).status).toBe(404);
    expect((await viewer.call('PUT', `/api/tracks/${id}/cues`, { version: 1, cues: [] })).status).toBe(403);
    expect((await otherAuthor.call('PUT', `/api/tracks/${id}/cues`, { version: 1, cues: [] })).status).toBe(404);
    expect((await postCaptionFile(viewer, `/api/tours/${tour.id}/tracks/preview`, VTT)).status).toBe(403);
    expect((await postCaptionFile(otherAuthor, `/api/tours/${tour.id}/tracks/preview`, VTT)).status).toBe(404);

    expect((await moderator.post(`/api/tours/${tour.id}/tracks`, { lang: 'de', label: 'Deutsch' })).status).toBe(201);
    expect((await admin.post(`/api/tours/${tour.id}/tracks`, { lang: 'fr', label: 'Français' })).status).toBe(201);
    expect((await admin.call('PUT', `/api/tracks/${id}/cues`, { version: 1, cues: [{ startMs: 0, endMs: 1000, text: 'admin edit' }] })).status).toBe(200);
    expect(await trackCount(tour.id)).toBe(3);
  });

  it('a published tour’s tracks are public to read, but other authors and viewers still cannot change them (403)', async () => {
    const tour = await tourOf({ state: 'published', publishedAt: new Date() });
    const t = await author.post(`/api/tours/${tour.id}/tracks/import`, { lang: 'en', label: 'English', cues: [{ startMs: 0, endMs: 1000, text: 'public' }] });
    const id = t.body.track.id;
    expect((await anonymous.get(`/api/tours/${tour.id}/tracks`)).body.items).toHaveLength(1);
    expect((await anonymous.get(`/api/tracks/${id}`)).body.cues[0].text).toBe('public');
    expect((await anonymous.raw('GET', `/api/tracks/${id}/export.srt`)).status).toBe(200);
    expect((await otherAuthor.call('PUT', `/api/tracks/${id}/cues`, { version: 1, cues: [] })).status).toBe(403);
    expect((await otherAuthor.patch(`/api/tracks/${id}`, { label: 'taken over' })).status).toBe(403);
    expect((await otherAuthor.del(`/api/tracks/${id}`)).status).toBe(403);
    expect((await viewer.del(`/api/tracks/${id}`)).status).toBe(403);
    expect((await postCaptionFile(otherAuthor, `/api/tours/${tour.id}/tracks/preview`, VTT)).status).toBe(403);
    const detail = await author.get(`/api/tracks/${id}`);
    expect(detail.body.track).toMatchObject({ version: 1, label: 'English' });
  });
});

describe('transcript', () => {
  it('joins cues into paragraphs of plain text, breaking at a pause of 2 s or more (common practice, no source)', async () => {
    const tour = await tourOf({ state: 'published', publishedAt: new Date() });
    await author.post(`/api/tours/${tour.id}/tracks/import`, {
      lang: 'en',
      label: 'English',
      cues: [
        { startMs: 0, endMs: 2000, text: 'Welcome to <i>Fernhollow</i>.' },
        { startMs: 2100, endMs: 4000, text: 'Mind the\nroots &amp; the hose.' },
        { startMs: 6000, endMs: 8000, text: '<v Ada>Here is the first tree.' },
      ],
    });
    const r = await anonymous.get(`/api/tours/${tour.id}/transcript?lang=en`);
    expect(r.status).toBe(200);
    expect(r.body).toEqual({
      lang: 'en',
      paragraphs: [
        { startMs: 0, endMs: 4000, text: 'Welcome to Fernhollow. Mind the roots & the hose.' },
        { startMs: 6000, endMs: 8000, text: 'Here is the first tree.' },
      ],
    });
    expect((await anonymous.get(`/api/tours/${tour.id}/transcript?lang=de`)).status).toBe(404);
  });

  it('starts a new paragraph after five cues once a sentence ends', async () => {
    const tour = await tourOf();
    const cues = Array.from({ length: 7 }, (_, i) => ({ startMs: i * 1500, endMs: i * 1500 + 1400, text: i === 3 ? 'no stop yet,' : `Sentence ${i + 1}.` }));
    await author.post(`/api/tours/${tour.id}/tracks/import`, { lang: 'en', label: 'English', cues });
    const r = await author.get(`/api/tours/${tour.id}/transcript`);
    expect(r.body.paragraphs.map((p: { text: string }) => p.text)).toEqual([
      'Sentence 1. Sentence 2. Sentence 3. no stop yet, Sentence 5.',
      'Sentence 6. Sentence 7.',
    ]);
    expect(r.body.paragraphs[1].startMs).toBe(5 * 1500);
  });
});
