// GET /api/search against a real MariaDB: cultivar records by name (exact, variant, misspelt through
// the shared name matcher) and by trait words, published tours by title and description, and caption
// moments through the FULLTEXT index with the whole-word fallback for short words and stopwords.
// Outside sources: MariaDB documentation for the InnoDB full-text defaults (innodb_ft_min_token_size
// 3; the INNODB_FT_DEFAULT_STOPWORD list; the boolean-mode operators of ft_boolean_syntax) and
// FFmpeg's tile filter (libavfilter/vf_tile.c) for where a thumbnail sits on its sheet. Ranking and
// visibility are product rules (issue 6), no outside source. The garden club, its tours, captions and
// every cultivar epithet here are invented (fictional).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Cultivar } from '../../server/db/entities/cultivar.entity';
import { CultivarVariant } from '../../server/db/entities/cultivar-variant.entity';
import { Tour as TourEntity, type Tour } from '../../server/db/entities/tour.entity';
import type { User } from '../../server/db/entities/user.entity';
import { INNODB_DEFAULT_STOPWORDS, INNODB_FT_DEFAULTS } from '../../server/modules/search/fulltext';
import { momentDetails, SearchService } from '../../server/modules/search/search.service';
import type { ApiErrorBody } from '../../shared/schemas/common';
import type { MomentHit, SearchResponse } from '../../shared/schemas/search';
import { searchResponseSchema } from '../../shared/schemas/search';
import { foldText } from '../../shared/search/text-fold';
import { makeCultivarRow } from '../support/caption-fixtures';
import { agentAs } from '../support/fixtures';
import { resetTables, startTestServer, type Agent, type TestServer } from '../support/http';
import { publishedTour, stopRow, thumbStrip, trackWithCues } from '../support/search-fixtures';

let server: TestServer;
let author: Agent;
let authorUser: User;
let anonymous: Agent;
// Invented epithets (fictional records).
let flame: Cultivar;
let lace: Cultivar;
let kagura: Cultivar;
let weir: Cultivar;
let pebble: Cultivar;
let lantern: Cultivar;
let hidden: Cultivar;
let autumnWalk: Tour;
let springWalk: Tour;
let draft: Tour;
let flameStopId: number;
let laceStopId: number;

const search = async (q: string, agent: Agent = anonymous, page = 1) => {
  const r = await agent.get<SearchResponse & Partial<ApiErrorBody>>(`/api/search?q=${encodeURIComponent(q)}&page=${page}`);
  if (r.status === 200) searchResponseSchema.parse(r.body);
  return r;
};
const names = (r: { body: SearchResponse }) => r.body.cultivars.items.map((i) => i.cultivar.epithet);
const marked = (m: MomentHit) => m.highlights.map((h) => m.text.slice(h.start, h.end));

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  ({ agent: author, user: authorUser } = await agentAs(server, 'author'));
  anonymous = server.agent();
  const ds = server.dataSource;

  flame = await makeCultivarRow(ds, 'Brindlewick Flame', ['Brindelwick Flame'], {
    traits: { habit: ['upright'], bark: ['green'], colours: { spring: ['lime'], autumn: ['scarlet'] } },
  });
  lace = await makeCultivarRow(ds, 'Quillmere Lace', [], {
    groupName: 'Dissectum Group',
    traits: { leafForm: 'dissectum', habit: ['weeping'], colours: { spring: ['deep-red'], autumn: ['orange'] } },
  });
  kagura = await makeCultivarRow(ds, 'Hoshi-kagura', [], { traits: { habit: ['rounded'], colours: { autumn: ['gold'] } } });
  weir = await makeCultivarRow(ds, 'Tansy Weir', [], { traits: { bark: ['coral-red'], habit: ['upright'], colours: { autumn: ['gold'] } } });
  pebble = await makeCultivarRow(ds, 'Pebblemoor', [], {
    traits: { heightClass: 'dwarf', containerSuitability: 'good', habit: ['mounding'], colours: { summer: ['green'], autumn: ['deep-red'] } },
  });
  lantern = await makeCultivarRow(ds, 'Coral Lantern', [], { traits: { habit: ['vase'], colours: { autumn: ['orange'] } } });
  hidden = await makeCultivarRow(ds, 'Hollow Quarry', [], { status: 'proposed', traits: { habit: ['weeping'], colours: { autumn: ['scarlet'] } } });

  autumnWalk = await publishedTour(ds, authorUser.id, {
    title: 'Autumn walk at Fernhollow (fictional)',
    descriptionHtml: '<p>We stop by the <strong>weeping</strong> lace maples near the <a href="https://example.org/gatehouse">old gate</a>.</p>',
    filmedOn: '2025-10-12',
    thumbStrip: thumbStrip(60, 2),
  });
  await trackWithCues(ds, autumnWalk.id, [
    [0, 4000, 'Welcome to the fictional Fernhollow garden.'],
    [10_000, 14_000, 'Here is Brindlewick Flame by the gate.'],
    [20_000, 24_000, 'This one is <i>Quillmere Lace</i>, a weeping lace maple.'],
    [30_000, 34_000, 'Ao means green here, a short word.'],
    [36_000, 38_000, 'Kaori walks past.'],
    [40_000, 44_000, 'The bark glows coral in winter.'],
    [46_000, 48_000, 'Serial a1b on the label.'],
  ]);
  flameStopId = (await stopRow(ds, autumnWalk.id, 9000, 19_000, flame.id, 'By the gate')).id;
  laceStopId = (await stopRow(ds, autumnWalk.id, 19_000, 29_000, lace.id)).id;

  springWalk = await publishedTour(ds, authorUser.id, {
    title: 'Spring in the quarry garden (fictional)',
    descriptionHtml: '<p>Fresh leaves.</p>',
    filmedOn: '2024-05-01',
    thumbStrip: null,
    posterFile: 'poster.jpg',
  });
  await trackWithCues(ds, springWalk.id, [
    [5000, 8000, 'Brindelwick Flame again, in spring.'],
    [9000, 12_000, 'And Hoshi-kagura, with golden autumn colour later.'],
  ]);

  // Not public: never in search, not even for their author.
  draft = await publishedTour(ds, authorUser.id, { title: 'Secret zzyzx walk Brindlewick (fictional)', state: 'ready', publishedAt: null });
  await trackWithCues(ds, draft.id, [[1000, 3000, 'Brindlewick Flame in a zzyzx draft moment.']]);
  const processing = await publishedTour(ds, authorUser.id, { title: 'Processing zzyzx walk (fictional)', state: 'processing', publishedAt: null });
  await trackWithCues(ds, processing.id, [[1000, 3000, 'Quillmere Lace zzyzx in processing.']]);
  await publishedTour(ds, authorUser.id, { title: '50% shade walk (fictional)', filmedOn: '2023-07-01' });
  await publishedTour(ds, authorUser.id, { title: '5000 maples (fictional)', filmedOn: '2023-07-02' });
});
afterAll(async () => server.close());

describe('bad input', () => {
  it('refuses an empty search and one over 200 characters with 400 and a message', async () => {
    for (const q of ['', '   ']) {
      const r = await search(q);
      expect(r.status).toBe(400);
      expect(r.body.error?.code).toBe('search_empty');
      expect(r.body.error?.message).toMatch(/search/i);
    }
    const missing = await anonymous.get('/api/search');
    expect(missing.status).toBe(400);
    const long = await search('x'.repeat(201));
    expect(long.status).toBe(400);
    expect(long.body.error?.code).toBe('search_too_long');
    expect((await search('x'.repeat(200))).status).toBe(200);
  });

  it('reads LIKE wildcards as plain characters: "%" and "_" match nothing, "a_b" does not match "a1b"', async () => {
    for (const q of ['%', '_', '%%', '\\']) {
      const r = await search(q);
      expect(r.status).toBe(200);
      expect(r.body.moments.total).toBe(0);
      expect(r.body.tours.total).toBe(0);
      expect(r.body.cultivars.total).toBe(0);
    }
    const ab = await search('a_b');
    expect(ab.body.moments.items.map((m) => m.text)).not.toContain('Serial a1b on the label.');
  });

  it('neutralises boolean-mode operators (MariaDB ft_boolean_syntax "+ -><()~*:""&|"): no errors, no exclusions', async () => {
    for (const q of ['+(', '"unclosed', '~gate', '@3 gate', '(gate', 'gate)', '>gate <gate', 'gate*', '&|:']) {
      const r = await search(q);
      expect(r.status, q).toBe(200);
    }
    // "-gate" would exclude gate in boolean mode; here it is the word "gate".
    const minus = await search('-gate');
    expect(minus.body.moments.items.map((m) => m.startMs)).toContain(10_000);
    const star = await search('flame*');
    expect(star.body.fulltextWords).toEqual(['flame']);
  });
});

describe('cultivar records', () => {
  it('finds a record by its exact name, variant, start of the name and part of it, with the reason', async () => {
    const exact = await search('Brindlewick Flame');
    expect(exact.body.cultivars.items[0]).toMatchObject({
      cultivar: { id: flame.id, epithet: 'Brindlewick Flame', fictional: true },
      reasons: expect.arrayContaining([expect.objectContaining({ kind: 'name', how: 'exact', score: 1 })]),
      momentsUrl: `/api/cultivars/${flame.slug}/moments`,
    });
    const variant = await search('brindelwick flame');
    expect(variant.body.cultivars.items[0]!.cultivar.id).toBe(flame.id);
    expect(variant.body.cultivars.items[0]!.reasons).toEqual(expect.arrayContaining([expect.objectContaining({ how: 'variant', matched: 'Brindelwick Flame' })]));
    const prefix = await search('quillm');
    expect(prefix.body.cultivars.items[0]).toMatchObject({ cultivar: { id: lace.id }, reasons: [expect.objectContaining({ how: 'prefix' })] });
    const part = await search('lantern');
    expect(part.body.cultivars.items[0]).toMatchObject({ cultivar: { id: lantern.id }, reasons: [expect.objectContaining({ how: 'contains' })] });
  });

  it('finds misspelt names through the matcher and says fuzzy with its score', async () => {
    const r = await search('Brindlewik Flame');
    const hit = r.body.cultivars.items[0]!;
    expect(hit.cultivar.id).toBe(flame.id);
    const reason = hit.reasons.find((x) => x.kind === 'name');
    expect(reason).toMatchObject({ how: 'fuzzy', heard: 'Brindlewik Flame' });
    expect((reason as { score: number }).score).toBeGreaterThanOrEqual(0.75);
    expect((reason as { score: number }).score).toBeLessThan(1);

    const romanised = await search('hoshi kagurra');
    expect(romanised.body.cultivars.items[0]!.cultivar.id).toBe(kagura.id);
    expect(romanised.body.cultivars.items[0]!.reasons[0]).toMatchObject({ kind: 'name', how: 'fuzzy' });
    // Same letters, joined: the matcher's re-split score.
    const joined = await search('hoshikagura');
    expect(joined.body.cultivars.items[0]).toMatchObject({ cultivar: { id: kagura.id }, reasons: [expect.objectContaining({ how: 'fuzzy', score: 0.99 })] });
  });

  it('reads trait words: "weeping", "coral bark", "red", "autumn red", "weeping red", "dwarf container"', async () => {
    const weeping = await search('weeping');
    expect(names(weeping)).toEqual(['Quillmere Lace']);
    expect(weeping.body.traits).toEqual([{ trait: 'habit', value: 'weeping', label: 'Weeping habit' }]);
    expect(weeping.body.cultivars.items[0]!.reasons).toEqual([{ kind: 'trait', trait: 'habit', value: 'weeping', label: 'Weeping habit' }]);

    const coral = await search('coral bark');
    expect(coral.body.cultivars.items.map((i) => i.cultivar.id)).toEqual([weir.id]);
    expect(coral.body.traits).toEqual([{ trait: 'bark', value: 'coral-red', label: 'Coral-red bark' }]);

    const red = await search('red');
    expect(names(red).sort()).toEqual(['Brindlewick Flame', 'Pebblemoor', 'Quillmere Lace']);
    const lacesReason = red.body.cultivars.items.find((i) => i.cultivar.id === lace.id)!.reasons[0];
    expect(lacesReason).toMatchObject({ kind: 'trait', trait: 'colours', seasons: ['spring'], colours: ['deep-red'] });

    const autumnRed = await search('autumn red');
    expect(names(autumnRed).sort()).toEqual(['Brindlewick Flame', 'Pebblemoor']);

    const weepingRed = await search('weeping red');
    expect(names(weepingRed)).toEqual(['Quillmere Lace']);
    expect(weepingRed.body.cultivars.items[0]!.reasons.map((x) => x.kind)).toEqual(['trait', 'trait']);

    const small = await search('dwarf container');
    expect(small.body.cultivars.items.map((i) => i.cultivar.id)).toEqual([pebble.id]);
    expect(small.body.traits.map((t) => t.label)).toEqual(['Dwarf', 'Suits a container']);
  });

  it('sees new records, approvals and variants in the very next search', async () => {
    expect(names(await search('Wendlebury Spark'))).toEqual([]);
    const fresh = await makeCultivarRow(server.dataSource, 'Wendlebury Spark', [], { status: 'proposed' });
    expect(names(await search('Wendlebury Spark'))).toEqual([]);
    await server.dataSource.getRepository(Cultivar).update({ id: fresh.id }, { status: 'approved' });
    expect(names(await search('Wendlebury Spark'))).toEqual(['Wendlebury Spark']);
    // Before the variant is recorded, the misspelling is only a close spelling.
    const before = await search('Wendelbery Sparc');
    expect(before.body.cultivars.items[0]).toMatchObject({ cultivar: { id: fresh.id }, reasons: [expect.objectContaining({ how: 'fuzzy' })] });
    await server.dataSource.getRepository(CultivarVariant).save({ cultivarId: fresh.id, text: 'Wendelbery Sparc', normalized: 'wendelbery sparc' });
    const byVariant = await search('Wendelbery Sparc');
    expect(byVariant.body.cultivars.items[0]).toMatchObject({ cultivar: { id: fresh.id }, reasons: [expect.objectContaining({ how: 'variant' })] });
    await server.dataSource.getRepository(Cultivar).update({ id: fresh.id }, { status: 'retired' });
    expect(names(await search('Wendlebury Spark'))).toEqual([]);
  });

  it('never lists proposals, and a search that is a record’s name is not read as traits', async () => {
    expect(names(await search('Hollow Quarry'))).not.toContain('Hollow Quarry');
    expect(names(await search('weeping'))).not.toContain(hidden.epithet);
    const lanternByName = await search('Coral Lantern');
    expect(lanternByName.body.traits).toEqual([]);
    expect(names(lanternByName)).toEqual(['Coral Lantern']);
  });
});

describe('caption moments', () => {
  it('finds caption words through FULLTEXT with times, the covering stop, marked words and the sheet tile', async () => {
    const r = await search('lace maple');
    expect(r.body.fulltextWords).toEqual(['lace', 'maple']);
    const m = r.body.moments.items.find((x) => x.startMs === 20_000)!;
    expect(m).toMatchObject({
      tourId: autumnWalk.id,
      tourTitle: autumnWalk.title,
      endMs: 24_000,
      lang: 'en',
      text: 'This one is Quillmere Lace, a weeping lace maple.',
      stop: { id: laceStopId, startMs: 19_000, endMs: 29_000, title: '', cultivar: { id: lace.id, slug: lace.slug } },
      link: `/tours/${autumnWalk.id}?t=20`,
    });
    expect(marked(m)).toEqual(['Lace', 'lace', 'maple']);
    // The tree card's name printed with italics (RHS style summary of the ICNCP: genus and species
    // italic; Group and epithet roman, the epithet in single quotes).
    expect(m.stop!.cultivar!.nameSegments.filter((x) => x.italic).map((x) => x.text.trim())).toEqual(['Acer palmatum']);
    expect(m.stop!.cultivar!.nameSegments.map((x) => x.text).join('')).toBe("Acer palmatum (Dissectum Group) 'Quillmere Lace'");
    // 20 s with a tile every 2 s is picture 10: row 1, column 0 of a 10-wide sheet (vf_tile.c layout).
    expect(m.thumbnail).toMatchObject({ kind: 'tile', x: 0, y: 90, w: 160, h: 90, sheetWidth: 1600, sheetHeight: 900 });
    expect((m.thumbnail as { url: string }).url).toMatch(new RegExp(`^/media/tours/${autumnWalk.id}/thumbs-001\\.jpg\\?v=`));
  });

  it('puts cultivar-name hits first, and a misspelt search finds moments where the name is said right', async () => {
    const r = await search('Brindlewik Flame');
    const items = r.body.moments.items;
    expect(items.length).toBeGreaterThanOrEqual(2);
    expect(items.slice(0, 2).every((m) => m.nameHit)).toBe(true);
    const atGate = items.find((m) => m.tourId === autumnWalk.id && m.startMs === 10_000)!;
    expect(atGate).toMatchObject({ nameHit: true, cultivarIds: [flame.id], stop: { id: flameStopId, title: 'By the gate', cultivar: { id: flame.id } } });
    expect(marked(atGate)).toEqual(['Brindlewick Flame']);
    // 10 s, a tile every 2 s: picture 5 at x = 5 × 160.
    expect(atGate.thumbnail).toMatchObject({ kind: 'tile', x: 800, y: 0 });
    // The recorded variant spelling in another tour's captions is the same tree; that tour has a poster only.
    const spring = items.find((m) => m.tourId === springWalk.id)!;
    expect(spring).toMatchObject({ nameHit: true, startMs: 5000, stop: null, thumbnail: { kind: 'poster' } });
    expect(marked(spring)).toEqual(['Brindelwick Flame']);
  });

  it('shows the stop a moment starts in, else the one it runs into, and drops a tour withdrawn after the lookup', async () => {
    const ds = server.dataSource;
    const tour = await publishedTour(ds, authorUser.id, { title: 'Quenchwood rounds (fictional)', filmedOn: '2022-04-02' });
    await trackWithCues(ds, tour.id, [
      [8000, 11_000, 'Quenchwood ember before the first stop.'],
      [19_000, 22_000, 'Quenchwood ember across two stops.'],
      [40_000, 42_000, 'Quenchwood ember with no stop near.'],
    ]);
    const first = (await stopRow(ds, tour.id, 10_000, 20_000, weir.id, 'First')).id;
    await stopRow(ds, tour.id, 20_000, 30_000, pebble.id, 'Second');
    const r = await search('quenchwood');
    const at = (ms: number) => r.body.moments.items.find((m) => m.startMs === ms)!;
    expect(at(8000).stop).toMatchObject({ id: first, title: 'First', cultivar: { id: weir.id, slug: weir.slug, fictional: true } });
    expect(at(19_000).stop).toMatchObject({ id: first });
    expect(at(40_000).stop).toBeNull();

    // Withdrawn between the lookup and the page of moments: its moments are dropped, not shown.
    const service = new SearchService(ds);
    const hits = await service.captions.byWords(await service.captions.plan(['quenchwood']));
    expect(hits).toHaveLength(3);
    expect((await momentDetails(ds, hits)).size).toBe(3);
    await ds.getRepository(TourEntity).update(tour.id, { state: 'ready', publishedAt: null });
    expect((await momentDetails(ds, hits)).size).toBe(0);
    expect((await search('quenchwood')).body.moments.total).toBe(0);
  });

  it('matches short words and stopwords as whole words by the fallback (innodb_ft_min_token_size 3, InnoDB stopwords)', async () => {
    const ao = await search('ao');
    expect(ao.body.fulltextWords).toEqual([]);
    expect(ao.body.fallbackWords).toEqual(['ao']);
    expect(ao.body.moments.items.map((m) => m.startMs)).toEqual([30_000]);
    expect(marked(ao.body.moments.items[0]!)).toEqual(['Ao']);
    // "the" is an InnoDB stopword: the index never stores it, the fallback still insists on it.
    const theBark = await search('the bark');
    expect(theBark.body.fulltextWords).toEqual(['bark']);
    expect(theBark.body.fallbackWords).toEqual(['the']);
    expect(theBark.body.moments.items.map((m) => m.startMs)).toEqual([40_000]);
    expect(marked(theBark.body.moments.items[0]!)).toEqual(['The', 'bark']);
  });

  it('agrees with the server: its minimum token size is the documented default and our stopwords are not indexed', async () => {
    const [row] = await server.dataSource.query('SELECT @@innodb_ft_min_token_size AS m');
    expect(Number(row.m)).toBe(INNODB_FT_DEFAULTS.minToken);
    const words = [...INNODB_DEFAULT_STOPWORDS].filter((w) => w.length >= 3);
    const tour = await publishedTour(server.dataSource, authorUser.id, { title: 'Stopword check (fictional)' });
    const track = await trackWithCues(server.dataSource, tour.id, [[0, 1000, words.join(' ')]]);
    for (const w of words) {
      const rows = await server.dataSource.query('SELECT id FROM cues WHERE track_id = ? AND MATCH(text) AGAINST (? IN BOOLEAN MODE)', [track.id, `+${w}`]);
      expect(rows, w).toHaveLength(0);
    }
    // A word that is not on the list is found, so the check above can fail.
    await trackWithCues(server.dataSource, tour.id, [[0, 1000, 'gatehouse lantern']], 'fr', 'Français');
    const found = await server.dataSource.query('SELECT id FROM cues WHERE MATCH(text) AGAINST (? IN BOOLEAN MODE)', ['+gatehouse']);
    expect(found).toHaveLength(1);
  });
});

describe('folding', () => {
  it('compares like the database collation (MariaDB utf8mb4_unicode_ci) on accented and expanded letters', async () => {
    const pairs: [string, string][] = [
      ['Café', 'cafe'],
      ['Straße', 'strasse'],
      ['MÜNCHEN', 'munchen'],
      ['naïve', 'naive'],
      ['Ōtaki', 'otaki'],
      ['Kaede', 'kaede'],
      ['cafe', 'cafes'],
      ['maple', 'mapel'],
    ];
    for (const [a, b] of pairs) {
      const [row] = await server.dataSource.query('SELECT (CAST(? AS CHAR) COLLATE utf8mb4_unicode_ci) = (CAST(? AS CHAR) COLLATE utf8mb4_unicode_ci) AS same', [a, b]);
      expect(foldText(a) === foldText(b), `${a} / ${b}`).toBe(Number(row.same) === 1);
    }
  });
});

describe('visibility', () => {
  it('never returns drafts or tours being processed, not even to their author', async () => {
    for (const agent of [anonymous, author]) {
      const secret = await search('zzyzx', agent);
      expect(secret.status).toBe(200);
      expect(secret.body.moments.total).toBe(0);
      expect(secret.body.tours.total).toBe(0);
      const byName = await search('Brindlewick Flame', agent);
      expect(byName.body.moments.items.map((m) => m.tourId)).not.toContain(draft.id);
      expect(byName.body.tours.items.map((t) => t.id)).not.toContain(draft.id);
    }
  });
});

describe('tours', () => {
  it('matches titles and descriptions (tags stripped) and marks the words; markup never matches', async () => {
    const byTitle = await search('autumn walk');
    const t = byTitle.body.tours.items.find((x) => x.id === autumnWalk.id)!;
    expect(t.titleHighlights.map((h) => t.title.slice(h.start, h.end))).toEqual(['Autumn', 'walk']);
    expect(t.link).toBe(`/tours/${autumnWalk.id}`);

    const byText = await search('lace maples');
    const d = byText.body.tours.items.find((x) => x.id === autumnWalk.id)!;
    expect(d.snippet!.text).toBe('We stop by the weeping lace maples near the old gate.');
    expect(d.snippet!.highlights.map((h) => d.snippet!.text.slice(h.start, h.end))).toEqual(['lace', 'maples']);

    // "strong" and "gatehouse" appear only in a tag name and a link address.
    expect((await search('strong')).body.tours.total).toBe(0);
    expect((await search('gatehouse')).body.tours.items.map((x) => x.id)).not.toContain(autumnWalk.id);
    // "50" is a whole word in "50% shade walk", not the start of "5000".
    const fifty = await search('50%');
    expect(fifty.body.tours.items.map((x) => x.title)).toEqual(['50% shade walk (fictional)']);
  });

  it('sees a tour renamed, withdrawn or published again, and its author renamed, in the very next search', async () => {
    const tour = await publishedTour(server.dataSource, authorUser.id, { title: 'Wintergreen lane walk (fictional)' });
    const ids = async (q: string) => (await search(q)).body.tours.items.map((x) => x.id);
    expect(await ids('wintergreen')).toContain(tour.id);

    expect((await author.patch(`/api/tours/${tour.id}`, { title: 'Quaggy orchard walk (fictional)' })).status).toBe(200);
    expect(await ids('wintergreen')).not.toContain(tour.id);
    expect(await ids('quaggy')).toContain(tour.id);

    expect((await author.post(`/api/tours/${tour.id}/unpublish`, {})).status).toBe(200);
    expect(await ids('quaggy')).not.toContain(tour.id);
    expect((await author.post(`/api/tours/${tour.id}/publish`, {})).status).toBe(200);
    expect(await ids('quaggy')).toContain(tour.id);

    expect((await author.patch('/api/account', { displayName: 'Ottoline Quagg' })).status).toBe(200);
    const hit = (await search('quaggy')).body.tours.items.find((x) => x.id === tour.id)!;
    expect(hit.author.displayName).toBe('Ottoline Quagg');
  });
});
