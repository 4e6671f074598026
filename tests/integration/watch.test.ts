// GET /api/tours/:id/watch (the tour page in one response) and GET /api/cultivars/:idOrSlug/moments
// ("where to see it") against a real MariaDB. Outside sources: USDA Plant Hardiness Zone Map zone
// bands (docs/domain.md check values 6a −10…−5 °F, −23.3…−20.6 °C; 7b 5…10 °F, −15.0…−12.2 °C),
// Hepburn syllables for the respelling (docs/domain.md; the shared respelling is checked against
// them in tests/unit/names/hepburn.test.ts), W3C WebVTT for the linked tracks (read back with the
// npm webvtt-parser library), FFmpeg's tile filter layout (libavfilter/vf_tile.c) for stop thumbnails.
// The fixed query count and the visibility rules are product rules (issue 6), no outside source.
// Every garden, tour and cultivar epithet here is invented (fictional).
import webvtt from 'webvtt-parser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Cultivar } from '../../server/db/entities/cultivar.entity';
import type { Tour } from '../../server/db/entities/tour.entity';
import type { User } from '../../server/db/entities/user.entity';
import { CONTAINER_CAUTION } from '../../shared/hardiness';
import { PLANT_COLOURS } from '../../shared/traits';
import { watchResponseSchema, whereToSeeResponseSchema, type WatchResponse } from '../../shared/schemas/watch';
import { makeCultivarRow } from '../support/caption-fixtures';
import { agentAs } from '../support/fixtures';
import { resetTables, startTestServer, type Agent, type TestServer } from '../support/http';
import { countQueries } from '../support/query-counter';
import { publishedTour, stopRow, thumbStrip, trackWithCues } from '../support/search-fixtures';

let server: TestServer;
let author: Agent;
let authorUser: User;
let otherAuthor: Agent;
let moderator: Agent;
let anonymous: Agent;
let kagura: Cultivar;
let ember: Cultivar;
let plain: Cultivar;
let retiredish: Cultivar;

const hex = (id: string) => PLANT_COLOURS.find((c) => c.id === id)!.hex;

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  ({ agent: author, user: authorUser } = await agentAs(server, 'author'));
  otherAuthor = (await agentAs(server, 'author')).agent;
  moderator = (await agentAs(server, 'moderator')).agent;
  anonymous = server.agent();
  const ds = server.dataSource;
  kagura = await makeCultivarRow(ds, 'Hoshi-kagura', [], {
    groupName: 'Dissectum Group',
    acceptedName: "Acer palmatum (Dissectum Group) 'Hoshi-kagura'",
    meaning: 'Invented for the demo: "star dance".',
    traits: {
      leafForm: 'dissectum',
      lobeCount: { min: 7, max: 9 },
      habit: ['weeping', 'mounding'],
      bark: ['green'],
      colours: { spring: ['deep-red'], summer: ['purple-red'], autumn: ['scarlet', 'orange'] },
      heightClass: 'small',
      heightM: { min: 2, max: 3 },
      containerSuitability: 'good',
      hardiness: { min: '6a', max: '7b' },
      sunTolerance: ['part-shade'],
    },
  });
  ember = await makeCultivarRow(ds, 'Lantern Ember', [], { pronunciation: 'LAN-tern EM-ber (moderator guide)', traits: { habit: ['upright'] } });
  plain = await makeCultivarRow(ds, 'Copper Wren', []);
  retiredish = await makeCultivarRow(ds, 'Mossgate Rill', [], { status: 'proposed' });
});
afterAll(async () => server.close());

async function tourWithStops(n: number, patch: Partial<Tour> = {}): Promise<Tour> {
  const ds = server.dataSource;
  const tour = await publishedTour(ds, authorUser.id, { durationMs: 20 * 60_000, ...patch });
  const cultivars = [kagura, ember, plain];
  for (let i = 0; i < n; i++) await stopRow(ds, tour.id, i * 60_000, i * 60_000 + 30_000, i % 4 === 3 ? null : cultivars[i % 3]!.id, `Stop ${i + 1}`);
  await trackWithCues(ds, tour.id, [[1000, 3000, 'Welcome to the fictional garden.']]);
  await trackWithCues(ds, tour.id, [[1000, 3000, 'Bienvenue au jardin fictif.']], 'fr', 'Français');
  return tour;
}

describe('GET /api/tours/:id/watch', () => {
  it('answers the tour, its stops with tree cards and its tracks in one response', async () => {
    const tour = await tourWithStops(4, { thumbStrip: thumbStrip(600, 2) });
    const r = await anonymous.get<WatchResponse>(`/api/tours/${tour.id}/watch`);
    expect(r.status).toBe(200);
    watchResponseSchema.parse(r.body);
    expect(r.body.tour).toMatchObject({ id: tour.id, title: tour.title, state: 'published', canEdit: false, renditions: [{ height: 720, label: '720p' }] });
    expect(r.body.stops.map((s) => [s.startMs, s.title, s.cultivar?.id ?? null])).toEqual([
      [0, 'Stop 1', kagura.id],
      [60_000, 'Stop 2', ember.id],
      [120_000, 'Stop 3', plain.id],
      [180_000, 'Stop 4', null],
    ]);
    // 60 s at a tile every 2 s is picture 30: row 3, column 0 (vf_tile.c layout, 10 columns).
    expect(r.body.stops[1]!.thumbnail).toMatchObject({ kind: 'tile', x: 0, y: 270, w: 160, h: 90 });
    // 180 s is picture 90: row 9, column 0 of the first sheet of 100.
    expect(r.body.stops[3]!.thumbnail).toMatchObject({ kind: 'tile', x: 0, y: 810 });

    const card = r.body.stops[0]!.cultivar!;
    expect(card).toMatchObject({
      id: kagura.id,
      acceptedName: "Acer palmatum (Dissectum Group) 'Hoshi-kagura'",
      nameSegments: [
        { text: 'Acer palmatum', italic: true },
        { text: " (Dissectum Group) 'Hoshi-kagura'", italic: false },
      ],
      // Hepburn: ho-shi-ka-gu-ra, one sound per vowel (o "oh", i "ee", a "ah", u "oo").
      pronunciation: { text: 'hoh-shee-kah-goo-rah', source: 'hepburn' },
      meaning: 'Invented for the demo: "star dance".',
      size: { heightM: { min: 2, max: 3 }, spreadM: null, heightClass: 'small' },
      // USDA zone map: 6a starts at −10 °F (−23.3 °C); 7b ends at 10 °F (−12.2 °C).
      hardiness: { min: '6a', max: '7b', coldestF: -10, coldestC: -23.3, warmestF: 10, warmestC: -12.2 },
      container: { suitability: 'good', caution: CONTAINER_CAUTION },
      link: `/cultivars/${kagura.slug}`,
      fictional: true,
    });
    expect(card.colours).toEqual([
      { season: 'spring', swatches: [{ id: 'deep-red', label: 'Deep red', hex: hex('deep-red'), accentHex: null }] },
      { season: 'summer', swatches: [{ id: 'purple-red', label: 'Purple-red', hex: hex('purple-red'), accentHex: null }] },
      {
        season: 'autumn',
        swatches: [
          { id: 'scarlet', label: 'Scarlet', hex: hex('scarlet'), accentHex: null },
          { id: 'orange', label: 'Orange', hex: hex('orange'), accentHex: null },
        ],
      },
    ]);
    expect(card.keyTraits.map((t) => [t.trait, t.values.map((v) => v.label)])).toEqual([
      ['leafForm', ['Cut to the base, lace-like (Dissectum-like)']],
      ['lobeCount', ['7–9']],
      ['habit', ['Weeping', 'Mounding']],
      ['bark', ['Green']],
      ['sunTolerance', ['Part shade']],
    ]);
    // A moderator's guide wins over the generated one; an English epithet has none to generate.
    expect(r.body.stops[1]!.cultivar!.pronunciation).toEqual({ text: 'LAN-tern EM-ber (moderator guide)', source: 'record' });
    expect(r.body.stops[2]!.cultivar).toMatchObject({ pronunciation: null, hardiness: null, container: null, colours: [], keyTraits: [] });

    expect(r.body.captions.tracks.map((t) => [t.lang, t.label, t.version])).toEqual([
      ['en', 'English', 1],
      ['fr', 'Français', 1],
    ]);
    expect(r.body.captions.defaultTrackId).toBe(r.body.captions.tracks[0]!.id);
  });

  it('links tracks that the player can load: the WebVTT export, chapters and metadata (W3C WebVTT via webvtt-parser)', async () => {
    const tour = await tourWithStops(2);
    const { body } = await anonymous.get<WatchResponse>(`/api/tours/${tour.id}/watch`);
    const parser = new webvtt.WebVTTParser();
    for (const url of [body.captions.tracks[0]!.vttUrl, body.captions.chaptersUrl, body.captions.metadataUrl]) {
      const res = await anonymous.raw('GET', url);
      expect(res.status, url).toBe(200);
      expect(res.headers.get('content-type')).toMatch(/^text\/vtt/);
      const parsed = parser.parse(await res.text(), 'metadata');
      expect(parsed.errors, url).toEqual([]);
      expect(parsed.cues.length).toBeGreaterThan(0);
    }
    const chapters = parser.parse(await (await anonymous.raw('GET', body.captions.chaptersUrl)).text(), 'chapters');
    expect(chapters.cues.map((c) => c.text)).toEqual(['Stop 1', 'Stop 2']);
    const transcript = await anonymous.get(body.captions.tracks[1]!.transcriptUrl);
    expect(transcript.status).toBe(200);
    expect(transcript.body.lang).toBe('fr');
  });

  it('runs the same fixed number of queries with 2 stops and with 12 (no N+1)', async () => {
    const small = await tourWithStops(2);
    const large = await tourWithStops(12);
    const counter = countQueries(server.dataSource);
    try {
      await anonymous.get(`/api/tours/${small.id}/watch`); // warm-up: nothing cached by the endpoint, but keep runs alike
      counter.reset();
      const a = await anonymous.get<WatchResponse>(`/api/tours/${small.id}/watch`);
      const smallCount = counter.count;
      counter.reset();
      const b = await anonymous.get<WatchResponse>(`/api/tours/${large.id}/watch`);
      const largeCount = counter.count;
      expect(a.body.stops).toHaveLength(2);
      expect(b.body.stops).toHaveLength(12);
      expect(b.body.stops.filter((s) => s.cultivar).length).toBe(9);
      expect(largeCount).toBe(smallCount);
      // Tour with author, stops with their records, caption tracks.
      expect(smallCount).toBe(3);
      // Signed in, the session's user is read once more, still independent of the stops.
      counter.reset();
      await author.get(`/api/tours/${large.id}/watch`);
      expect(counter.count).toBe(4);
    } finally {
      counter.restore();
    }
  });

  it('shows a record’s edits on the next request (built cards are reused only while the record is unchanged)', async () => {
    const tour = await tourWithStops(2);
    const before = await anonymous.get<WatchResponse>(`/api/tours/${tour.id}/watch`);
    expect(before.body.stops[1]!.cultivar!.pronunciation!.text).toBe('LAN-tern EM-ber (moderator guide)');
    await server.dataSource.getRepository(Cultivar).update({ id: ember.id }, { pronunciation: 'LAN-turn EM-bur (edited guide)' });
    const after = await anonymous.get<WatchResponse>(`/api/tours/${tour.id}/watch`);
    expect(after.body.stops[1]!.cultivar!.pronunciation).toEqual({ text: 'LAN-turn EM-bur (edited guide)', source: 'record' });
    // A second edit at once (updates stamp whole seconds, so the time alone may not move).
    await server.dataSource.getRepository(Cultivar).update({ id: ember.id }, { pronunciation: 'LAN-tern EM-ber (moderator guide)' });
    const again = await anonymous.get<WatchResponse>(`/api/tours/${tour.id}/watch`);
    expect(again.body.stops[1]!.cultivar!.pronunciation!.text).toBe('LAN-tern EM-ber (moderator guide)');
  });

  it('follows the tour’s visibility: a draft only for its author, moderators and admins', async () => {
    const draft = await tourWithStops(1, { state: 'ready', publishedAt: null });
    expect((await anonymous.get(`/api/tours/${draft.id}/watch`)).status).toBe(404);
    expect((await otherAuthor.get(`/api/tours/${draft.id}/watch`)).status).toBe(404);
    const own = await author.get<WatchResponse>(`/api/tours/${draft.id}/watch`);
    expect(own.status).toBe(200);
    expect(own.body.tour.canEdit).toBe(true);
    expect((await moderator.get(`/api/tours/${draft.id}/watch`)).status).toBe(200);
    expect((await anonymous.get('/api/tours/999999/watch')).status).toBe(404);
    expect((await anonymous.get('/api/tours/abc/watch')).status).toBe(400);
  });
});

describe('GET /api/cultivars/:idOrSlug/moments (where to see it)', () => {
  it('lists every published stop of the record in order of tour date, oldest first or newest first', async () => {
    const ds = server.dataSource;
    const rec = await makeCultivarRow(ds, 'Tallow Spire', []);
    const mk = async (title: string, patch: Partial<Tour>, startMs: number) => {
      const t = await publishedTour(ds, authorUser.id, { title, ...patch });
      await stopRow(ds, t.id, startMs, startMs + 20_000, rec.id);
      return t;
    };
    const y2025 = await mk('Walk 2025 (fictional)', { filmedOn: '2025-04-10', publishedAt: new Date('2025-05-01T00:00:00Z') }, 40_000);
    const y2023 = await mk('Walk 2023 (fictional)', { filmedOn: '2023-09-01', publishedAt: new Date('2025-06-01T00:00:00Z') }, 10_000);
    // No filming date: its publication date (2024) stands in.
    const y2024 = await mk('Walk 2024 (fictional)', { filmedOn: null, publishedAt: new Date('2024-03-03T00:00:00Z'), thumbStrip: null }, 70_000);
    await stopRow(ds, y2023.id, 100_000, 110_000, rec.id, 'Again, later');
    await mk('Draft walk (fictional)', { state: 'ready', publishedAt: null, filmedOn: '2022-01-01' }, 0);

    const r = await anonymous.get(`/api/cultivars/${rec.slug}/moments`);
    expect(r.status).toBe(200);
    whereToSeeResponseSchema.parse(r.body);
    expect(r.body.order).toBe('oldest');
    expect(r.body.total).toBe(4);
    expect(r.body.items.map((m: { tourId: number; startMs: number }) => [m.tourId, m.startMs])).toEqual([
      [y2023.id, 10_000],
      [y2023.id, 100_000],
      [y2024.id, 70_000],
      [y2025.id, 40_000],
    ]);
    expect(r.body.items[0]).toMatchObject({ stopTitle: "Acer palmatum 'Tallow Spire'", link: `/tours/${y2023.id}?t=10`, thumbnail: { kind: 'tile', x: 800, y: 0 } });
    expect(r.body.items[1].stopTitle).toBe('Again, later');
    expect(r.body.items[2].thumbnail).toMatchObject({ kind: 'poster' });

    const newest = await anonymous.get(`/api/cultivars/${rec.id}/moments?order=newest&pageSize=2`);
    expect(newest.body.items.map((m: { tourId: number }) => m.tourId)).toEqual([y2025.id, y2024.id]);
    expect(newest.body.total).toBe(4);
    const page2 = await anonymous.get(`/api/cultivars/${rec.id}/moments?order=newest&pageSize=2&page=2`);
    expect(page2.body.items.map((m: { tourId: number; startMs: number }) => [m.tourId, m.startMs])).toEqual([
      [y2023.id, 10_000],
      [y2023.id, 100_000],
    ]);
  });

  it('is 404 for an unknown record and for a proposal the viewer may not see', async () => {
    expect((await anonymous.get('/api/cultivars/no-such-record/moments')).status).toBe(404);
    expect((await anonymous.get(`/api/cultivars/${retiredish.slug}/moments`)).status).toBe(404);
    expect((await moderator.get(`/api/cultivars/${retiredish.slug}/moments`)).status).toBe(200);
    expect((await anonymous.get(`/api/cultivars/${plain.slug}/moments?order=sideways`)).status).toBe(400);
  });
});
