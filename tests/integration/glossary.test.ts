// The glossary through the HTTP API against a real MariaDB: A–Z of approved records with
// pronunciation, meaning, variants and where published tours say each name; search by prefix and
// by the shared fuzzy name matcher. Tours, captions and every epithet are INVENTED (fictional
// Fernhollow Garden Club). Respellings follow the Hepburn vowel values in domain.md (ISO 3602 /
// ANSI Z39.11 tables): a "ah", e "eh", i "ee", o "oh", u "oo".
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Cultivar } from '../../server/db/entities/cultivar.entity';
import type { User } from '../../server/db/entities/user.entity';
import { glossaryResponseSchema } from '../../shared/schemas/glossary';
import { makeCultivarRow, makeTourRow } from '../support/caption-fixtures';
import { agentAs } from '../support/fixtures';
import { resetTables, startTestServer, type Agent, type TestServer } from '../support/http';
import { addVariantRow, makeTrackRow } from '../support/names-fixtures';

let server: TestServer;
let author: Agent;
let authorUser: User;
let moderator: Agent;
let anonymous: Agent;
let kawa: Cultivar;
let ember: Cultivar;
let amber: Cultivar;
let spokenTrackId: number;

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  ({ agent: author, user: authorUser } = await agentAs(server, 'author'));
  moderator = (await agentAs(server, 'moderator')).agent;
  anonymous = server.agent();
  const ds = server.dataSource;

  kawa = await makeCultivarRow(ds, 'Kawa-akari', [], { meaning: 'River light (invented meaning).', pronunciation: 'KAH-wah ah-KAH-ree' });
  await addVariantRow(ds, kawa.id, 'Kawa akkari');
  ember = await makeCultivarRow(ds, 'Ember Quill');
  amber = await makeCultivarRow(ds, 'Amberlow Mist', [], { genus: 'Acer', species: 'shirasawanum', acceptedName: "Acer shirasawanum 'Amberlow Mist'", slug: 'acer-shirasawanum-amberlow-mist' });
  await makeCultivarRow(ds, 'Kestrel Hush', [], { status: 'proposed' });
  await makeCultivarRow(ds, 'Kestrel Gone', [], { status: 'retired' });

  const walk = await makeTourRow(ds, authorUser.id, { title: 'Fernhollow Garden Club: river walk (fictional)', state: 'published', publishedAt: new Date('2026-04-01T10:00:00Z') });
  const later = await makeTourRow(ds, authorUser.id, { title: 'Fernhollow Garden Club: ember walk (fictional)', state: 'published', publishedAt: new Date('2026-05-01T10:00:00Z') });
  const draft = await makeTourRow(ds, authorUser.id, { title: 'Fernhollow Garden Club: draft walk (fictional)', state: 'ready' });
  spokenTrackId = (
    await makeTrackRow(ds, walk.id, [
      { startMs: 1000, endMs: 4000, text: 'We start at the river.' },
      { startMs: 9000, endMs: 12_000, text: 'Here is Kawa-akari, glowing.' },
      { startMs: 30_000, endMs: 33_000, text: 'And Kawa akkari again, as our guide said it.' },
      { startMs: 40_000, endMs: 43_000, text: 'Ember Quill by the wall.' },
    ])
  ).id;
  await makeTrackRow(ds, later.id, [{ startMs: 5000, endMs: 8000, text: 'Our Kawa-akari in May.' }]);
  await makeTrackRow(ds, draft.id, ['Amberlow Mist in a draft: not spoken in public yet.']);
});
afterAll(async () => server.close());

describe('GET /api/glossary', () => {
  it('lists approved records A–Z by epithet with their guides, meaning and variants; proposals and retired records stay out', async () => {
    const r = await anonymous.get('/api/glossary');
    expect(r.status).toBe(200);
    expect(() => glossaryResponseSchema.parse(r.body)).not.toThrow();
    expect(r.body.items.map((e: { epithet: string }) => e.epithet)).toEqual(['Amberlow Mist', 'Ember Quill', 'Kawa-akari']);
    expect(r.body.letters).toEqual([
      { letter: 'A', count: 1 },
      { letter: 'E', count: 1 },
      { letter: 'K', count: 1 },
    ]);
    const entry = r.body.items[2];
    expect(entry).toMatchObject({
      id: kawa.id,
      slug: kawa.slug,
      letter: 'K',
      acceptedName: "Acer palmatum 'Kawa-akari'",
      nameSegments: [
        { text: 'Acer palmatum', italic: true },
        { text: " 'Kawa-akari'", italic: false },
      ],
      respelling: 'kah-wah-ah-kah-ree',
      pronunciation: 'KAH-wah ah-KAH-ree',
      meaning: 'River light (invented meaning).',
      variants: ['Kawa akkari'],
      fictional: true,
    });
    expect(r.body.items[0].respelling).toBeNull(); // English epithet: no Hepburn guide
    expect(r.body.items[0].acceptedName).toBe(amber.acceptedName);
  });

  it('says where each name is spoken: published tours and cues counted, the newest tour\'s first cue as the first moment', async () => {
    const r = await anonymous.get('/api/glossary');
    const byEpithet = new Map(r.body.items.map((e: any) => [e.epithet, e]));
    const k = byEpithet.get('Kawa-akari') as any;
    expect(k.spoken.tours).toBe(2);
    expect(k.spoken.cues).toBe(3);
    expect(k.spoken.first).toMatchObject({ tourTitle: 'Fernhollow Garden Club: ember walk (fictional)', startMs: 5000, text: 'Our Kawa-akari in May.', kind: 'exact' });
    expect((byEpithet.get('Ember Quill') as any).spoken).toMatchObject({ tours: 1, cues: 1, first: { startMs: 40_000, heard: 'Ember Quill' } });
    // Only said in a draft tour: not spoken anywhere public.
    expect((byEpithet.get('Amberlow Mist') as any).spoken).toEqual({ tours: 0, cues: 0, first: null });

    // The record page lists the same moments, one per tour.
    const page = await anonymous.get(`/api/cultivars/${kawa.slug}`);
    expect(page.body.cultivar.spokenAt.map((m: any) => [m.tourTitle, m.startMs])).toEqual([
      ['Fernhollow Garden Club: ember walk (fictional)', 5000],
      ['Fernhollow Garden Club: river walk (fictional)', 9000],
    ]);
  });

  it('follows caption edits: a cue saved through the editor is counted at once', async () => {
    const loaded = await author.get(`/api/tracks/${spokenTrackId}`);
    const cues = [...loaded.body.cues, { startMs: 50_000, endMs: 53_000, text: 'One more look at Ember Quill.' }];
    expect((await author.call('PUT', `/api/tracks/${spokenTrackId}/cues`, { version: loaded.body.track.version, cues })).status).toBe(200);
    const r = await anonymous.get('/api/glossary?letter=E');
    expect(r.body.items[0].spoken).toMatchObject({ tours: 1, cues: 2 });
  });

  it('filters by letter', async () => {
    const r = await anonymous.get('/api/glossary?letter=k');
    expect(r.body.items.map((e: { epithet: string }) => e.epithet)).toEqual(['Kawa-akari']);
    expect(r.body.letters).toHaveLength(3);
    expect((await anonymous.get('/api/glossary?letter=KK')).status).toBe(400);
    expect((await anonymous.get('/api/glossary?letter=Q')).body.items).toEqual([]);
  });

  it('searches by prefix of the epithet, a word of it, or a variant', async () => {
    const epithets = async (q: string) => (await anonymous.get(`/api/glossary?q=${encodeURIComponent(q)}`)).body.items.map((e: { epithet: string }) => e.epithet);
    expect(await epithets('amb')).toEqual(['Amberlow Mist']);
    expect(await epithets('quill')).toEqual(['Ember Quill']);
    expect(await epithets('kawa akk')).toEqual(['Kawa-akari']);
    expect(await epithets('shirasawanum')).toEqual(['Amberlow Mist']); // a word of the accepted name
    expect(await epithets('zz')).toEqual([]);
  });

  it('finds misspelt and misheard names with the shared matcher, best match first', async () => {
    const r = await anonymous.get(`/api/glossary?q=${encodeURIComponent('kawa akary')}`);
    expect(r.body.items.map((e: { epithet: string }) => e.epithet)).toEqual(['Kawa-akari']);
    expect(r.body.items[0].match.kind).toBe('fuzzy');
    const joined = await anonymous.get(`/api/glossary?q=${encodeURIComponent('Emberquill')}`);
    expect(joined.body.items.map((e: { epithet: string }) => e.epithet)).toEqual(['Ember Quill']);
    const exact = await anonymous.get(`/api/glossary?q=${encodeURIComponent('kawa akari')}`);
    expect(exact.body.items[0]).toMatchObject({ epithet: 'Kawa-akari', match: { kind: 'exact', score: 1 } });
  });

  it('drops a merged record and shows its epithet as the survivor\'s variant', async () => {
    const mergeFrom = await moderator.post('/api/cultivars', { genus: 'Acer', species: 'palmatum', epithet: 'Embre Quill', fictional: true });
    expect((await anonymous.get('/api/glossary?letter=E')).body.items.map((e: { epithet: string }) => e.epithet)).toEqual(['Ember Quill', 'Embre Quill']);
    expect((await moderator.post(`/api/cultivars/${mergeFrom.body.cultivar.id}/merge`, { intoId: ember.id })).status).toBe(200);
    const r = await anonymous.get('/api/glossary?letter=E');
    expect(r.body.items.map((e: { epithet: string }) => e.epithet)).toEqual(['Ember Quill']);
    expect(r.body.items[0].variants).toEqual(['Embre Quill']);
  });
});
