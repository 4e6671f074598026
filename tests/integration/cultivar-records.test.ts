// Cultivar records in full through the HTTP API against a real MariaDB: name and trait checks,
// pronunciation, notes sanitised, care cautions, index filters and sorting, retire, merge,
// variants, photos and the permission matrix. Name checks follow the RHS "Recommended style for
// printing plant names" summary of the ICNCP (9th edition, 2016) and the ICN (Art. 20.1, Rec.
// 60F.1), as in tests/unit/names. The club, its tours and every epithet are INVENTED (fictional
// Fernhollow Garden Club).
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Cultivar } from '../../server/db/entities/cultivar.entity';
import { Stop } from '../../server/db/entities/stop.entity';
import type { Tour } from '../../server/db/entities/tour.entity';
import type { User } from '../../server/db/entities/user.entity';
import { cultivarFullSchema, cultivarIndexPage, mergeCultivarResponseSchema } from '../../shared/schemas/cultivars';
import { makeCultivarRow, makeTourRow } from '../support/caption-fixtures';
import { agentAs } from '../support/fixtures';
import { resetTables, startTestServer, type Agent, type TestServer } from '../support/http';
import { addVariantRow, makeTrackRow, variantTexts } from '../support/names-fixtures';

let server: TestServer;
let viewer: Agent;
let author: Agent;
let authorUser: User;
let otherAuthor: Agent;
let moderator: Agent;
let admin: Agent;
let anonymous: Agent;

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  viewer = (await agentAs(server, 'viewer')).agent;
  ({ agent: author, user: authorUser } = await agentAs(server, 'author'));
  otherAuthor = (await agentAs(server, 'author')).agent;
  moderator = (await agentAs(server, 'moderator')).agent;
  admin = (await agentAs(server, 'admin')).agent;
  anonymous = server.agent();
});
afterAll(async () => server.close());

const ds = () => server.dataSource;
const base = { genus: 'Acer', species: 'palmatum', fictional: true };
const published = (title: string, patch: Partial<Tour> = {}) =>
  makeTourRow(ds(), authorUser.id, { title, state: 'published', publishedAt: new Date(), ...patch });
const create = async (agent: Agent, body: Record<string, unknown>) => {
  const r = await agent.post('/api/cultivars', { ...base, ...body });
  if (r.status !== 201) throw new Error(`create failed: ${r.status} ${JSON.stringify(r.body)}`);
  return r.body.cultivar as { id: number; slug: string; [k: string]: any };
};

/** Multipart upload as the record page's photo form sends it: file "photo" and field "altText". */
async function postPhoto(agent: Agent, cultivarId: number, bytes: Buffer, altText: string | null, fileName = 'photo.jpg') {
  const form = new FormData();
  if (altText !== null) form.append('altText', altText);
  form.append('photo', new Blob([new Uint8Array(bytes)]), fileName);
  const request = new Request('http://multipart.invalid/', { method: 'POST', body: form });
  const body = Buffer.from(await request.arrayBuffer());
  const res = await agent.raw('POST', `/api/cultivars/${cultivarId}/photos`, { rawBody: body, headers: { 'content-type': request.headers.get('content-type')! } });
  const text = await res.text();
  return { status: res.status, body: (text ? JSON.parse(text) : null) as any };
}

/** A plain test picture drawn by sharp (no photo of a real plant). */
function picture(width: number, height: number, format: 'png' | 'jpeg' = 'png'): Promise<Buffer> {
  const img = sharp({ create: { width, height, channels: 3, background: { r: 60, g: 120, b: 70 } } });
  return (format === 'png' ? img.png() : img.jpeg()).toBuffer();
}

describe('name and trait checks on save', () => {
  it('refuses an epithet over 30 characters, counting letters but not spaces (ICNCP Art. 21.13, per the International Poplar Commission synthesis)', async () => {
    const tooLong = await author.post('/api/cultivars', { ...base, epithet: 'Abcdefghij Abcdefghij Abcdefghijk' }); // 31 letters (invented)
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.error.code).toBe('invalid_name');
    expect(tooLong.body.error.fields.epithet).toBe('The epithet has 31 characters, not counting spaces and quotation marks; the limit is 30.');
    const thirty = await author.post('/api/cultivars', { ...base, epithet: 'Abcdefghij Abcdefghij Abcdefghij' }); // 30 letters, 2 spaces
    expect(thirty.status).toBe(201);
  });

  it('names each broken rule under its field (RHS: single quotes, no "cv." with quotes, capitals; ICN Art. 20.1 genus capital)', async () => {
    const r = await author.post('/api/cultivars', { genus: 'acer', species: 'palmatum', epithet: "cv. 'lantern moth'" });
    expect(r.status).toBe(400);
    expect(r.body.error.fields.genus).toContain('Start the genus with a capital letter: Acer');
    expect(r.body.error.fields.epithet).toContain('Drop "cv."');
    expect(r.body.error.fields.epithet).toContain('"lantern"');
    expect(await ds().getRepository(Cultivar).countBy({ epithet: "cv. 'lantern moth'" })).toBe(0);
  });

  it('stores every trait after checking it against the shared trait schema, and refuses impossible ones', async () => {
    const traits = {
      leafForm: 'dissectum',
      lobeCount: { min: 7, max: 9 },
      leafSize: 'small',
      colours: { spring: ['pink'], summer: ['green'], autumn: ['orange', 'scarlet'] },
      bark: ['green'],
      habit: ['weeping', 'mounding'],
      heightClass: 'small',
      heightM: { min: 1.5, max: 2.5 },
      growthRate: 'slow',
      sunTolerance: ['part-shade'],
      containerSuitability: 'good',
      hardiness: { min: '6a', max: '8b' },
    };
    const created = await create(moderator, { epithet: 'Lanternmoth Lace', groupName: 'Dissectum Group', traits });
    expect(created.traits).toEqual(traits);

    // USDA zones run 1a (coldest) to 13b: a range whose coldest zone comes second is impossible.
    const backwards = await moderator.patch(`/api/cultivars/${created.id}`, { traits: { ...traits, hardiness: { min: '9a', max: '5b' } } });
    expect(backwards.status).toBe(400);
    expect(backwards.body.error.fields['traits.hardiness.max']).toBeTruthy();
    const unknown = await moderator.patch(`/api/cultivars/${created.id}`, { traits: { ...traits, scent: 'sweet' } });
    expect(unknown.status).toBe(400);
    const stored = await ds().getRepository(Cultivar).findOneByOrFail({ id: created.id });
    expect(stored.traits).toEqual(traits);
  });
});

describe('pronunciation', () => {
  // Hepburn syllables and vowel sounds: ISO 3602 / ANSI Z39.11 tables as summarised in domain.md
  // (a as in father, e as in bed, i as in machine, o as in more, u as in rule).
  it('splits a romanised Japanese epithet into Hepburn syllables and respells it; a moderator may add a guide', async () => {
    const c = await create(moderator, { epithet: 'Hoshi-kagura' });
    expect(c.hepburnSyllables).toEqual([['ho', 'shi', 'ka', 'gu', 'ra']]);
    expect(c.respelling).toBe('hoh-shee-kah-goo-rah');
    expect(c.pronunciation).toBeNull();

    expect((await author.patch(`/api/cultivars/${c.id}`, { pronunciation: 'HOH-shee kah-GOO-rah' })).status).toBe(403);
    const edited = await moderator.patch(`/api/cultivars/${c.id}`, { pronunciation: 'HOH-shee kah-goo-rah', meaning: 'Star music (invented meaning).' });
    expect(edited.status).toBe(200);
    expect(edited.body.cultivar).toMatchObject({ pronunciation: 'HOH-shee kah-goo-rah', respelling: 'hoh-shee-kah-goo-rah', meaning: 'Star music (invented meaning).' });
  });

  it('gives no generated guide for an English epithet (l, r clusters are not Hepburn)', async () => {
    const c = await create(moderator, { epithet: 'Brindlewick Lantern' });
    expect(c.respelling).toBeNull();
    expect(c.hepburnSyllables).toBeNull();
  });
});

describe('notes: sanitised HTML and care cautions', () => {
  it('strips script, event handlers and javascript: links from notes, on save and on the way out', async () => {
    const c = await create(moderator, {
      epithet: 'Marrowby Ember',
      notesHtml:
        '<p onclick="steal()">Bright in autumn.</p><script>alert(1)</script><img src="x" onerror="alert(2)"><a href="javascript:alert(3)">look</a><a href="https://example.org/fictional">club page</a>',
    });
    expect(c.notesHtml).not.toMatch(/script|onerror|onclick|javascript:|<img/i);
    expect(c.notesHtml).toContain('<p>Bright in autumn.</p>');
    expect(c.notesHtml).toContain('href="https://example.org/fictional"');

    // A row written around the API (say, an old import) still leaves sanitised.
    await ds().getRepository(Cultivar).update({ id: c.id }, { notesHtml: '<p>Fine.</p><iframe src="https://example.org"></iframe><svg onload="alert(4)"></svg>' });
    const read = await anonymous.get(`/api/cultivars/${c.id}`);
    expect(read.body.cultivar.notesHtml).toBe('<p>Fine.</p>');
  });

  it('adds the cautions that go with care advice in the notes, and always gives the general caution', async () => {
    const care = await create(moderator, {
      epithet: 'Marrowby Twig',
      notesHtml: '<p>Prune in late winter. Repot every other spring, and spray only if aphids persist.</p>',
    });
    expect(care.careNote).toContain('Pruning:');
    expect(care.careNote).toContain('Containers:');
    expect(care.careNote).toContain('Chemicals: use them only as the product label directs');
    expect(care.careNote).toContain(care.careCaution);
    expect(care.careNote).not.toContain('Digging:');
    // Common practice, no source: the short cautions name tools, ladders, heavy pots, buried services, labels and arborists.
    for (const word of ['sharp tools', 'ladders', 'heavy pots', 'buried cables', 'label', 'licensed arborist']) expect(care.careCaution).toContain(word);

    const plain = await create(moderator, { epithet: 'Marrowby Glow', notesHtml: '<p>Leaves open pink and turn green by June.</p>' });
    expect(plain.careNote).toBeNull();
    expect(plain.careCaution).toBe(care.careCaution);
  });
});

describe('index filters and sorting', () => {
  it('filters by Group, genus, leaf form, habit and container suitability, and sorts by name or last change', async () => {
    const weeping = await create(moderator, { epithet: 'Quillon Cascade', groupName: 'Dissectum Group', traits: { leafForm: 'dissectum', habit: ['weeping'], containerSuitability: 'good' } });
    const upright = await create(moderator, { epithet: 'Quillon Spire', groupName: 'Palmatum Group', traits: { leafForm: 'palmatum', habit: ['upright'], containerSuitability: 'fair' } });
    const other = await create(moderator, { genus: 'Cornus', species: 'kousa', epithet: 'Quillon Star', traits: { habit: ['weeping', 'spreading'], containerSuitability: 'good' } });
    const ids = async (query: string) => (await anonymous.get(`/api/cultivars?q=Quillon&${query}`)).body.items.map((c: { id: number }) => c.id);

    expect(await ids('')).toEqual([weeping.id, upright.id, other.id]); // A–Z: Acer … 'Quillon Cascade', Acer … 'Quillon Spire', Cornus …
    expect(await ids('group=Dissectum')).toEqual([weeping.id]);
    expect(await ids('group=palmatum%20group')).toEqual([upright.id]);
    expect(await ids('genus=Cornus')).toEqual([other.id]);
    expect(await ids('leafForm=dissectum')).toEqual([weeping.id]);
    expect(await ids('habit=weeping')).toEqual([weeping.id, other.id]);
    expect(await ids('container=good&habit=weeping&genus=Acer')).toEqual([weeping.id]);
    expect(await ids('sort=name&dir=desc')).toEqual([other.id, upright.id, weeping.id]);

    await new Promise((r) => setTimeout(r, 20));
    expect((await moderator.patch(`/api/cultivars/${upright.id}`, { meaning: 'Named for a sword guard (invented).' })).status).toBe(200);
    expect((await ids('sort=updated'))[0]).toBe(upright.id);

    const page = (await anonymous.get('/api/cultivars?q=Quillon%20Cascade')).body;
    expect(() => cultivarIndexPage.parse(page)).not.toThrow();
    const row = page.items[0];
    expect(row).toMatchObject({ id: weeping.id, traits: { leafForm: 'dissectum' }, groupName: 'Dissectum Group' });
    expect(typeof row.updatedAt).toBe('string');
    expect((await anonymous.get('/api/cultivars?leafForm=feathery')).status).toBe(400);
  });
});

describe('record page: where the name is spoken and the tour moments', () => {
  it('lists the first cue per published tour that says the name, and the stops of published tours only', async () => {
    const rec = await makeCultivarRow(ds(), 'Nagare-boshi');
    const tour = await published('Fernhollow Garden Club: meteor walk (fictional)', {
      durationMs: 120_000,
      thumbStrip: { everySec: 5, tileWidth: 160, tileHeight: 90, columns: 10, rows: 10, count: 24, sheets: [{ file: 'thumbs-001.jpg', width: 1600, height: 270 }] },
      mediaDir: 'renditions/1/j1',
    });
    const hidden = await makeTourRow(ds(), authorUser.id, { title: 'Fernhollow Garden Club: draft walk (fictional)', state: 'ready' });
    await makeTrackRow(ds(), tour.id, [
      { startMs: 2000, endMs: 5000, text: 'Welcome to the meteor bed.' },
      { startMs: 12_000, endMs: 15_000, text: 'This is <i>Nagare boshi</i>, a falling star.' },
      { startMs: 20_000, endMs: 23_000, text: 'Nagare-boshi again, from the other side.' },
    ]);
    await makeTrackRow(ds(), hidden.id, ['Nagare-boshi in a draft.']);
    const stops = ds().getRepository(Stop);
    const stop = await stops.save(stops.create({ tourId: tour.id, startMs: 62_000, endMs: 80_000, title: 'By the bench', cultivarId: rec.id }));
    await stops.save(stops.create({ tourId: hidden.id, startMs: 0, endMs: 10_000, title: 'Hidden', cultivarId: rec.id }));

    const r = await anonymous.get(`/api/cultivars/${rec.slug}`);
    expect(r.status).toBe(200);
    expect(() => cultivarFullSchema.parse(r.body.cultivar)).not.toThrow();
    expect(r.body.cultivar.spokenAt).toEqual([
      {
        tourId: tour.id,
        tourTitle: tour.title,
        trackId: expect.any(Number),
        lang: 'en',
        startMs: 12_000,
        endMs: 15_000,
        text: 'This is Nagare boshi, a falling star.',
        heard: 'Nagare boshi',
        kind: 'exact',
      },
    ]);
    // Tile at 62 s: preview 12 (one every 5 s). ffmpeg's tile filter (ffmpeg-filters, "tile") fills a
    // sheet left to right, then top to bottom, so on a 10-column sheet it is row 1, column 2.
    expect(r.body.cultivar.tourMoments).toEqual([
      {
        tourId: tour.id,
        tourTitle: tour.title,
        stopId: stop.id,
        stopTitle: 'By the bench',
        startMs: 62_000,
        endMs: 80_000,
        posterUrl: null,
        thumbnail: { url: `/media/tours/${tour.id}/thumbs-001.jpg?v=j1`, x: 320, y: 90, w: 160, h: 90 },
      },
    ]);
  });
});

describe('retire and merge', () => {
  it('retires a record (moderators), hides it from the default index, and reinstates it on approval', async () => {
    const c = await create(moderator, { epithet: 'Wendle Frost' });
    expect((await author.post(`/api/cultivars/${c.id}/retire`)).status).toBe(403);
    const r = await moderator.post(`/api/cultivars/${c.id}/retire`);
    expect(r.status).toBe(200);
    expect(r.body.cultivar.status).toBe('retired');
    expect((await anonymous.get('/api/cultivars?q=Wendle')).body.items).toEqual([]);
    expect((await moderator.get('/api/cultivars?q=Wendle&status=retired')).body.items.map((x: { id: number }) => x.id)).toEqual([c.id]);
    expect((await admin.post(`/api/cultivars/${c.id}/approve`)).body.cultivar.status).toBe('approved');
  });

  it('merges a duplicate: stops move to the survivor, variants move without repeats, the epithet becomes a variant, the duplicate retires', async () => {
    const survivor = await create(moderator, { epithet: 'Orrin Blush' });
    const duplicate = await create(moderator, { epithet: 'Orrin Blushe' });
    await addVariantRow(ds(), survivor.id, 'Oren Blush');
    await addVariantRow(ds(), duplicate.id, 'oren-blush'); // same as the survivor's, other spelling
    await addVariantRow(ds(), duplicate.id, 'Orrin Bluhs');
    const tour = await published('Fernhollow Garden Club: blush walk (fictional)');
    const stops = ds().getRepository(Stop);
    await stops.save(stops.create({ tourId: tour.id, startMs: 0, endMs: 10_000, title: 'First', cultivarId: duplicate.id }));
    await stops.save(stops.create({ tourId: tour.id, startMs: 20_000, endMs: 30_000, title: 'Second', cultivarId: duplicate.id }));
    const photo = await postPhoto(moderator, duplicate.id, await picture(640, 480), 'Pink new leaves (test picture)');
    expect(photo.status).toBe(201);

    expect((await author.post(`/api/cultivars/${duplicate.id}/merge`, { intoId: survivor.id })).status).toBe(403);
    const r = await moderator.post(`/api/cultivars/${duplicate.id}/merge`, { intoId: survivor.id });
    expect(r.status).toBe(200);
    expect(() => mergeCultivarResponseSchema.parse(r.body)).not.toThrow();
    expect(r.body).toMatchObject({ movedStops: 2, movedVariants: 2, merged: { id: duplicate.id, status: 'retired', mergedIntoId: survivor.id } });
    expect(r.body.cultivar.id).toBe(survivor.id);
    expect(r.body.cultivar.photos.map((p: { altText: string }) => p.altText)).toEqual(['Pink new leaves (test picture)']);

    expect((await stops.findBy({ tourId: tour.id })).map((s) => s.cultivarId)).toEqual([survivor.id, survivor.id]);
    expect(await variantTexts(ds(), survivor.id)).toEqual(['Oren Blush', 'Orrin Bluhs', 'Orrin Blushe']);
    expect(await variantTexts(ds(), duplicate.id)).toEqual([]);
    const old = await anonymous.get(`/api/cultivars/${duplicate.slug}`);
    expect(old.body.cultivar).toMatchObject({ status: 'retired', mergedInto: { id: survivor.id, slug: survivor.slug } });

    const again = await moderator.post(`/api/cultivars/${duplicate.id}/merge`, { intoId: survivor.id });
    expect(again.status).toBe(409);
    expect((await moderator.post(`/api/cultivars/${survivor.id}/merge`, { intoId: survivor.id })).status).toBe(400);
    expect((await moderator.post(`/api/cultivars/${survivor.id}/merge`, { intoId: duplicate.id })).body.error.code).toBe('merge_target_retired');
    // Stops may only link to approved records, so a proposal cannot be the survivor.
    const proposal = await create(author, { epithet: 'Orrin Blusher' });
    const intoProposal = await moderator.post(`/api/cultivars/${survivor.id}/merge`, { intoId: proposal.id });
    expect(intoProposal.status).toBe(409);
    expect(intoProposal.body.error.code).toBe('merge_target_proposed');
    expect((await stops.findBy({ tourId: tour.id })).map((s) => s.cultivarId)).toEqual([survivor.id, survivor.id]);
  });
});

describe('variants', () => {
  it('moderators add and remove variants; repeats, the epithet itself and other records\' names are refused', async () => {
    const c = await create(moderator, { epithet: 'Pellow Drift' });
    await create(moderator, { epithet: 'Pelo Drift' });
    const added = await moderator.post(`/api/cultivars/${c.id}/variants`, { text: 'Pelow Drift' });
    expect(added.status).toBe(201);
    expect(added.body.variant.text).toBe('Pelow Drift');
    expect((await moderator.post(`/api/cultivars/${c.id}/variants`, { text: 'pelow-drift' })).body.error.code).toBe('variant_exists');
    expect((await moderator.post(`/api/cultivars/${c.id}/variants`, { text: 'pellow drift' })).body.error.code).toBe('variant_is_epithet');
    expect((await moderator.post(`/api/cultivars/${c.id}/variants`, { text: 'Pelo Drift' })).body.error.code).toBe('variant_is_other_name');
    expect((await author.post(`/api/cultivars/${c.id}/variants`, { text: 'Pello Drift' })).status).toBe(403);
    expect((await viewer.post(`/api/cultivars/${c.id}/variants`, { text: 'Pello Drift' })).status).toBe(403);
    expect((await anonymous.post(`/api/cultivars/${c.id}/variants`, { text: 'Pello Drift' })).status).toBe(401);

    const detail = await anonymous.get(`/api/cultivars/${c.id}`);
    expect(detail.body.cultivar.variants).toEqual([{ id: added.body.variant.id, text: 'Pelow Drift' }]);
    expect((await author.del(`/api/cultivars/${c.id}/variants/${added.body.variant.id}`)).status).toBe(403);
    expect((await admin.del(`/api/cultivars/${c.id}/variants/${added.body.variant.id}`)).status).toBe(204);
    expect((await admin.del(`/api/cultivars/${c.id}/variants/${added.body.variant.id}`)).status).toBe(404);
    expect(await variantTexts(ds(), c.id)).toEqual([]);
  });
});

describe('photos', () => {
  it('stores a photo at most 1600 px on the long side with a 400 px thumbnail, as JPEG (dimensions read back with sharp)', async () => {
    const c = await create(moderator, { epithet: 'Sable Wick' });
    const r = await postPhoto(moderator, c.id, await picture(3200, 2400), 'Whole tree in spring (test picture)');
    expect(r.status).toBe(201);
    // 3200 × 2400 fitted inside 1600 × 1600 keeps the 4:3 aspect: 1600 × 1200; thumbnail 400 × 300.
    expect(r.body.photo).toMatchObject({ width: 1600, height: 1200, thumbWidth: 400, thumbHeight: 300, altText: 'Whole tree in spring (test picture)', position: 0 });

    const full = await anonymous.raw('GET', r.body.photo.url);
    expect(full.status).toBe(200);
    expect(full.headers.get('content-type')).toBe('image/jpeg');
    expect(full.headers.get('cache-control')).toBe('public, max-age=86400');
    const meta = await sharp(Buffer.from(await full.arrayBuffer())).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(['jpeg', 1600, 1200]);
    const thumb = await sharp(Buffer.from(await (await anonymous.raw('GET', r.body.photo.thumbUrl)).arrayBuffer())).metadata();
    expect([thumb.format, thumb.width, thumb.height]).toEqual(['jpeg', 400, 300]);

    // Smaller than the limit: never enlarged.
    const small = await postPhoto(moderator, c.id, await picture(800, 600, 'jpeg'), 'Leaf close-up (test picture)');
    expect(small.body.photo).toMatchObject({ width: 800, height: 600, thumbWidth: 400, thumbHeight: 300, position: 1 });

    const detail = await anonymous.get(`/api/cultivars/${c.id}`);
    expect(detail.body.cultivar.photos.map((p: { id: number }) => p.id)).toEqual([r.body.photo.id, small.body.photo.id]);
  });

  it('turns a photo upright from its EXIF orientation (CIPA DC-008 Exif: Orientation 6 = rotate 90° clockwise to display)', async () => {
    const c = await create(moderator, { epithet: 'Sable Turn' });
    const sideways = await sharp({ create: { width: 2000, height: 1000, channels: 3, background: '#3c7846' } }).jpeg().withMetadata({ orientation: 6 }).toBuffer();
    const r = await postPhoto(moderator, c.id, sideways, 'Trunk, portrait (test picture)');
    expect(r.status).toBe(201);
    expect(r.body.photo).toMatchObject({ width: 800, height: 1600 });
  });

  it('requires alt text and a raster image', async () => {
    const c = await create(moderator, { epithet: 'Sable Moth' });
    const noAlt = await postPhoto(moderator, c.id, await picture(100, 100), null);
    expect(noAlt.status).toBe(400);
    expect(noAlt.body.error.fields.altText).toBeTruthy();
    const text = await postPhoto(moderator, c.id, Buffer.from('not a picture at all'), 'A text file', 'notes.jpg');
    expect(text.status).toBe(415);
    expect(text.body.error.code).toBe('photo_unreadable');
    const svg = await postPhoto(moderator, c.id, Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script></svg>'), 'Vector', 'x.svg');
    expect(svg.status).toBe(415);
    expect(svg.body.error.code).toBe('photo_format');
    expect((await anonymous.get(`/api/cultivars/${c.id}`)).body.cultivar.photos).toEqual([]);
  });

  it('lets an author add photos to their own proposal only; photos of a proposal are not public', async () => {
    const own = await create(author, { epithet: 'Sable Proposal' });
    expect(own.status).toBe('proposed');
    const r = await postPhoto(author, own.id, await picture(500, 500), 'Young plant in a pot (test picture)');
    expect(r.status).toBe(201);
    expect((await anonymous.raw('GET', r.body.photo.url)).status).toBe(404);
    expect((await author.raw('GET', r.body.photo.url)).status).toBe(200);
    expect((await moderator.raw('GET', r.body.photo.url)).status).toBe(200);

    const approved = await create(moderator, { epithet: 'Sable Approved' });
    expect((await postPhoto(author, approved.id, await picture(100, 100), 'Not mine')).status).toBe(403);
    expect((await postPhoto(otherAuthor, own.id, await picture(100, 100), 'Not mine either')).status).toBe(404);
    expect((await postPhoto(viewer, approved.id, await picture(100, 100), 'Viewer')).status).toBe(403);
    expect((await postPhoto(anonymous, approved.id, await picture(100, 100), 'Visitor')).status).toBe(401);

    const edited = await author.patch(`/api/cultivars/${own.id}/photos/${r.body.photo.id}`, { altText: 'Young plant in a glazed pot (test picture)' });
    expect(edited.body.photo.altText).toBe('Young plant in a glazed pot (test picture)');
    expect((await author.del(`/api/cultivars/${own.id}/photos/${r.body.photo.id}`)).status).toBe(204);
    expect((await author.raw('GET', r.body.photo.url)).status).toBe(404);
  });
});

describe('permission matrix for record routes', () => {
  it('viewer and visitor cannot change records; authors only propose; moderators and admins do the rest', async () => {
    const c = await create(moderator, { epithet: 'Tamsin Veil' });
    const d = await create(moderator, { epithet: 'Tamsin Veile' });
    const routes: [string, string, unknown][] = [
      ['PATCH', `/api/cultivars/${c.id}`, { meaning: 'Veil (invented).' }],
      ['POST', `/api/cultivars/${c.id}/approve`, {}],
      ['POST', `/api/cultivars/${c.id}/retire`, {}],
      ['POST', `/api/cultivars/${d.id}/merge`, { intoId: c.id }],
      ['POST', `/api/cultivars/${c.id}/variants`, { text: 'Tamsen Veil' }],
    ];
    for (const [method, url, body] of routes) {
      expect((await anonymous.call(method, url, body)).status, `${method} ${url} visitor`).toBe(401);
      expect((await viewer.call(method, url, body)).status, `${method} ${url} viewer`).toBe(403);
      expect((await author.call(method, url, body)).status, `${method} ${url} author`).toBe(403);
    }
    expect((await anonymous.post('/api/cultivars', { ...base, epithet: 'Tamsin Mist' })).status).toBe(401);
    expect((await viewer.post('/api/cultivars', { ...base, epithet: 'Tamsin Mist' })).status).toBe(403);
    expect((await author.post('/api/cultivars', { ...base, epithet: 'Tamsin Mist' })).body.cultivar.status).toBe('proposed');

    expect((await moderator.patch(`/api/cultivars/${c.id}`, { meaning: 'Veil (invented).' })).status).toBe(200);
    expect((await admin.post(`/api/cultivars/${c.id}/variants`, { text: 'Tamsen Veil' })).status).toBe(201);
    expect((await admin.post(`/api/cultivars/${c.id}/retire`)).status).toBe(200);
    expect((await moderator.post(`/api/cultivars/${c.id}/approve`)).status).toBe(200);
    expect((await admin.post(`/api/cultivars/${d.id}/merge`, { intoId: c.id })).status).toBe(200);
  });
});
