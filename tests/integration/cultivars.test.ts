// Minimal cultivar records through the HTTP API against a real MariaDB. Name checks follow the
// RHS "Recommended style for printing plant names" summary of the ICNCP (9th edition, 2016) and
// the ICN (Art. 20.1, Rec. 60F.1), as listed in docs/domain.md. Every epithet here is invented.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Cultivar } from '../../server/db/entities/cultivar.entity';
import { makeCultivarRow } from '../support/caption-fixtures';
import { agentAs } from '../support/fixtures';
import { resetTables, startTestServer, type Agent, type TestServer } from '../support/http';

let server: TestServer;
let author: Agent;
let otherAuthor: Agent;
let viewer: Agent;
let moderator: Agent;
let admin: Agent;
let anonymous: Agent;

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  author = (await agentAs(server, 'author')).agent;
  otherAuthor = (await agentAs(server, 'author')).agent;
  viewer = (await agentAs(server, 'viewer')).agent;
  moderator = (await agentAs(server, 'moderator')).agent;
  admin = (await agentAs(server, 'admin')).agent;
  anonymous = server.agent();
});
afterAll(async () => server.close());

const recordCount = () => server.dataSource.getRepository(Cultivar).count();

describe('name checks (RHS summary of the ICNCP)', () => {
  const base = { genus: 'Acer', species: 'palmatum', fictional: true };

  it('refuses an epithet in double quotes, naming single quotes', async () => {
    const before = await recordCount();
    const r = await author.post('/api/cultivars', { ...base, epithet: '"Marrowby Gold"' });
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('invalid_name');
    // RHS: the cultivar epithet stands in single quotation marks; no double quotes.
    expect(r.body.error.fields.epithet).toMatch(/single quotation marks, never double/);
    expect(await recordCount()).toBe(before);
  });

  it('refuses "cv." used together with quotes', async () => {
    const r = await author.post('/api/cultivars', { ...base, epithet: "cv. 'Marrowby Gold'" });
    expect(r.status).toBe(400);
    // RHS: "cv." is not used together with quotation marks.
    expect(r.body.error.fields.epithet).toMatch(/Drop "cv\."/);
  });

  it('refuses a lower-case epithet word', async () => {
    const r = await author.post('/api/cultivars', { ...base, epithet: 'marrowby gold' });
    expect(r.status).toBe(400);
    // RHS: each word of the epithet starts with a capital letter.
    expect(r.body.error.fields.epithet).toContain('"marrowby"');
    expect(r.body.error.fields.epithet).toContain('"gold"');
  });

  it('puts each problem under its own field: genus capital (ICN Art. 20.1), species lower case (ICN Rec. 60F.1), Group capitalised and ending in "Group" (RHS)', async () => {
    const r = await author.post('/api/cultivars', { genus: 'acer', species: 'Palmatum', groupName: 'dissectum group', epithet: 'Marrowby Gold' });
    expect(r.status).toBe(400);
    expect(Object.keys(r.body.error.fields).sort()).toEqual(['genus', 'groupName', 'species']);
    expect(r.body.error.fields.genus).toContain('Acer');
    expect(r.body.error.fields.species).toContain('palmatum');
    expect(r.body.error.fields.groupName).toMatch(/Capitalise/);
  });

  it('formats the accepted name as the RHS examples do: Acer palmatum (Dissectum Group) \'Example Name\'', async () => {
    const r = await moderator.post('/api/cultivars', { genus: 'Acer', species: 'palmatum', groupName: 'Dissectum Group', epithet: 'Marrowby Lace', fictional: true });
    expect(r.status).toBe(201);
    expect(r.body.cultivar.acceptedName).toBe("Acer palmatum (Dissectum Group) 'Marrowby Lace'");
    // Botanical parts italic, Group and epithet roman (RHS: the epithet is not italic).
    expect(r.body.cultivar.nameSegments).toEqual([
      { text: 'Acer palmatum', italic: true },
      { text: " (Dissectum Group) 'Marrowby Lace'", italic: false },
    ]);
    expect(r.body.cultivar.slug).toBe('acer-palmatum-dissectum-group-marrowby-lace');
    const noSpecies = await moderator.post('/api/cultivars', { genus: 'Acer', epithet: 'Marrowby Lace', fictional: true });
    expect(noSpecies.body.cultivar.acceptedName).toBe("Acer 'Marrowby Lace'");
  });
});

describe('proposals, approval and duplicates', () => {
  it('an author proposes, a moderator or admin adds approved records; viewers and visitors cannot add', async () => {
    const proposal = await author.post('/api/cultivars', { genus: 'Acer', species: 'palmatum', epithet: 'Hobbleford Red', fictional: true });
    expect(proposal.status).toBe(201);
    expect(proposal.body.cultivar.status).toBe('proposed');
    const direct = await moderator.post('/api/cultivars', { genus: 'Acer', species: 'palmatum', epithet: 'Hobbleford Amber', fictional: true });
    expect(direct.body.cultivar.status).toBe('approved');
    const byAdmin = await admin.post('/api/cultivars', { genus: 'Acer', species: 'shirasawanum', epithet: 'Hobbleford Moon', fictional: true });
    expect(byAdmin.body.cultivar.status).toBe('approved');
    expect((await viewer.post('/api/cultivars', { genus: 'Acer', epithet: 'Hobbleford Pale' })).status).toBe(403);
    expect((await anonymous.post('/api/cultivars', { genus: 'Acer', epithet: 'Hobbleford Pale' })).status).toBe(401);

    // A proposal is visible to its proposer and to moderators only, and not listed as approved.
    const id = proposal.body.cultivar.id;
    expect((await author.get(`/api/cultivars/${id}`)).status).toBe(200);
    expect((await moderator.get(`/api/cultivars/${id}`)).status).toBe(200);
    expect((await otherAuthor.get(`/api/cultivars/${id}`)).status).toBe(404);
    expect((await anonymous.get(`/api/cultivars/${proposal.body.cultivar.slug}`)).status).toBe(404);
    const approvedList = await anonymous.get('/api/cultivars?q=Hobbleford');
    expect(approvedList.body.items.map((c: { epithet: string }) => c.epithet)).toEqual(['Hobbleford Amber', 'Hobbleford Moon']);
    const queue = await moderator.get('/api/cultivars?status=proposed&q=Hobbleford');
    expect(queue.body.items.map((c: { id: number }) => c.id)).toEqual([id]);
    expect((await otherAuthor.get('/api/cultivars?status=proposed&q=Hobbleford')).body.items).toEqual([]);
    expect((await author.get('/api/cultivars?status=proposed&q=Hobbleford')).body.items).toHaveLength(1);

    expect((await author.post(`/api/cultivars/${id}/approve`)).status).toBe(403);
    const approved = await moderator.post(`/api/cultivars/${id}/approve`);
    expect(approved.status).toBe(200);
    expect(approved.body.cultivar.status).toBe('approved');
    expect((await anonymous.get(`/api/cultivars/${proposal.body.cultivar.slug}`)).body.cultivar.id).toBe(id);
  });

  it('refuses a second record with the same accepted name (409), even in other letter case', async () => {
    const first = await moderator.post('/api/cultivars', { genus: 'Acer', species: 'palmatum', epithet: 'Wickham Dusk', fictional: true });
    expect(first.status).toBe(201);
    const before = await recordCount();
    const again = await author.post('/api/cultivars', { genus: 'Acer', species: 'palmatum', epithet: 'Wickham Dusk' });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('cultivar_exists');
    expect(again.body.error.message).toContain("Acer palmatum 'Wickham Dusk'");
    const otherCase = await author.post('/api/cultivars', { genus: 'ACER', species: 'palmatum', epithet: 'Wickham DUSK' });
    expect(otherCase.status).toBe(409);
    expect(await recordCount()).toBe(before);
  });

  it('gives a clashing slug the suffix -2, -3…', async () => {
    const a = await moderator.post('/api/cultivars', { genus: 'Acer', epithet: 'Tolworth-Fern', fictional: true });
    const b = await moderator.post('/api/cultivars', { genus: 'Acer', epithet: 'Tolworth Fern', fictional: true });
    const c = await moderator.post('/api/cultivars', { genus: 'Acer', epithet: 'Tolworth Fern!', fictional: true });
    expect([a.status, b.status, c.status]).toEqual([201, 201, 201]);
    expect([a.body.cultivar.slug, b.body.cultivar.slug, c.body.cultivar.slug]).toEqual(['acer-tolworth-fern', 'acer-tolworth-fern-2', 'acer-tolworth-fern-3']);
  });

  it('lets moderators edit a record: the name is checked and re-formatted, the slug stays', async () => {
    const created = await moderator.post('/api/cultivars', { genus: 'Acer', species: 'palmatum', epithet: 'Pellow Spire', fictional: true });
    const id = created.body.cultivar.id;
    expect((await author.patch(`/api/cultivars/${id}`, { epithet: 'Pellow Spires' })).status).toBe(403);
    const bad = await moderator.patch(`/api/cultivars/${id}`, { epithet: '"Pellow Spires"' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.epithet).toBeTruthy();
    const renamed = await moderator.patch(`/api/cultivars/${id}`, { epithet: 'Pellow Spires', groupName: 'Linearilobum Group', notesHtml: '<p>Narrow lobes.</p><script>alert(1)</script>' });
    expect(renamed.status).toBe(200);
    expect(renamed.body.cultivar).toMatchObject({
      acceptedName: "Acer palmatum (Linearilobum Group) 'Pellow Spires'",
      slug: created.body.cultivar.slug,
      species: 'palmatum',
      notesHtml: '<p>Narrow lobes.</p>',
    });
    const retired = await moderator.patch(`/api/cultivars/${id}`, { status: 'retired' });
    expect(retired.body.cultivar.status).toBe('retired');
  });
});

describe('search', () => {
  it('finds records by accepted name, epithet and recorded variants, and returns the detail with variants', async () => {
    const rec = await makeCultivarRow(server.dataSource, 'Corriswell Ember', ['Coriswell Ember']);
    const byVariant = await anonymous.get('/api/cultivars?q=Coriswell');
    expect(byVariant.body.items.map((c: { id: number }) => c.id)).toEqual([rec.id]);
    const byName = await anonymous.get(`/api/cultivars?q=${encodeURIComponent("palmatum 'Corriswell")}`);
    expect(byName.body.items.map((c: { id: number }) => c.id)).toEqual([rec.id]);
    expect(byName.body).toMatchObject({ total: 1, page: 1, pageSize: 20 });
    const detail = await anonymous.get(`/api/cultivars/${rec.slug}`);
    expect(detail.body.cultivar).toMatchObject({ id: rec.id, fictional: true, variants: [{ text: 'Coriswell Ember' }] });
  });

  it('treats LIKE wildcards in the query as plain characters', async () => {
    await makeCultivarRow(server.dataSource, 'Dunmere Glow');
    const all = await anonymous.get('/api/cultivars?pageSize=100');
    expect(all.body.total).toBeGreaterThan(0);
    for (const q of ['%', '_', '\\']) {
      const r = await anonymous.get(`/api/cultivars?q=${encodeURIComponent(q)}`);
      expect([q, r.body.total]).toEqual([q, 0]);
    }
  });

  it('pages through results in accepted-name order', async () => {
    for (const e of ['Pagewood Alpha', 'Pagewood Beta', 'Pagewood Gamma']) await makeCultivarRow(server.dataSource, e);
    const p1 = await anonymous.get('/api/cultivars?q=Pagewood&pageSize=2&page=1');
    const p2 = await anonymous.get('/api/cultivars?q=Pagewood&pageSize=2&page=2');
    expect(p1.body.total).toBe(3);
    expect([...p1.body.items, ...p2.body.items].map((c: { epithet: string }) => c.epithet)).toEqual(['Pagewood Alpha', 'Pagewood Beta', 'Pagewood Gamma']);
  });
});
