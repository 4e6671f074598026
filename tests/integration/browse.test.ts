// Browse: GET /api/tours with the author, garden, cultivar and Group filters (the existing paging and
// ?mine=1 keep working), and GET /api/authors/:id, against a real MariaDB. Filters and visibility are
// product rules (issue 6), no outside source; "Dissectum Group" as a cultivar Group name follows the
// ICNCP's Group (Art. 3, docs/domain.md). Every garden, tour, member and epithet here is invented (fictional).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Cultivar } from '../../server/db/entities/cultivar.entity';
import type { Tour } from '../../server/db/entities/tour.entity';
import { User } from '../../server/db/entities/user.entity';
import { authorListSchema, authorPageSchema } from '../../shared/schemas/watch';
import { tourPage } from '../../shared/schemas/tours';
import { makeCultivarRow } from '../support/caption-fixtures';
import { agentAs, makeUser } from '../support/fixtures';
import { resetTables, startTestServer, type Agent, type TestServer } from '../support/http';
import { publishedTour, stopRow } from '../support/search-fixtures';

let server: TestServer;
let author: Agent;
let authorUser: User;
let otherUser: User;
let anonymous: Agent;
let lace: Cultivar;
let ember: Cultivar;
let t1: Tour;
let t2: Tour;
let t3: Tour;
let draft: Tour;

const ids = (body: { items: { id: number }[] }) => body.items.map((t) => t.id);
const list = async (query: string, agent: Agent = anonymous) => {
  const r = await agent.get(`/api/tours?${query}`);
  if (r.status === 200) tourPage.parse(r.body);
  return r;
};

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  ({ agent: author, user: authorUser } = await agentAs(server, 'author'));
  await server.dataSource.getRepository(User).update({ id: authorUser.id }, { garden: 'Fernhollow Corner (fictional)', displayName: 'Ada Fernhollow (fictional)' });
  otherUser = await makeUser(server.dataSource, 'author', { displayName: 'Bram Quarry (fictional)' });
  anonymous = server.agent();
  const ds = server.dataSource;
  lace = await makeCultivarRow(ds, 'Quillmere Lace', [], { groupName: 'Dissectum Group' });
  ember = await makeCultivarRow(ds, 'Lantern Ember', []);
  t1 = await publishedTour(ds, authorUser.id, { title: 'Lace walk (fictional)', garden: 'Fernhollow Corner (fictional)', publishedAt: new Date('2025-01-03T00:00:00Z') });
  t2 = await publishedTour(ds, authorUser.id, { title: 'Ember walk (fictional)', garden: '50% Shade Yard (fictional)', publishedAt: new Date('2025-01-02T00:00:00Z') });
  t3 = await publishedTour(ds, otherUser.id, { title: 'Quarry walk (fictional)', garden: 'Quarry Rise (fictional)', publishedAt: new Date('2025-01-01T00:00:00Z') });
  draft = await publishedTour(ds, authorUser.id, { title: 'Draft lace walk (fictional)', garden: 'Fernhollow Corner (fictional)', state: 'ready', publishedAt: null });
  await stopRow(ds, t1.id, 0, 10_000, lace.id);
  await stopRow(ds, t2.id, 0, 10_000, ember.id);
  await stopRow(ds, t3.id, 0, 10_000, lace.id);
  await stopRow(ds, t3.id, 20_000, 30_000, ember.id);
  await stopRow(ds, draft.id, 0, 10_000, lace.id);
});
afterAll(async () => server.close());

describe('GET /api/tours browse filters', () => {
  it('keeps the plain list, paging and ?mine=1 as they were', async () => {
    expect(ids((await list('page=1&pageSize=20')).body)).toEqual([t1.id, t2.id, t3.id]);
    const paged = await list('page=2&pageSize=2');
    expect(ids(paged.body)).toEqual([t3.id]);
    expect(paged.body.total).toBe(3);
    const mine = await list('mine=1', author);
    expect(ids(mine.body).sort()).toEqual([t1.id, t2.id, draft.id].sort());
  });

  it('filters by author, garden (part of the name, wildcards literal), cultivar (id or slug) and Group', async () => {
    expect(ids((await list(`author=${otherUser.id}`)).body)).toEqual([t3.id]);
    expect(ids((await list('garden=fernhollow')).body)).toEqual([t1.id]);
    // "%" is a character here, not "anything".
    expect(ids((await list(`garden=${encodeURIComponent('50%')}`)).body)).toEqual([t2.id]);
    expect(ids((await list(`garden=${encodeURIComponent('%')}`)).body)).toEqual([t2.id]);
    expect(ids((await list(`garden=${encodeURIComponent('_')}`)).body)).toEqual([]);
    expect(ids((await list(`cultivar=${lace.id}`)).body)).toEqual([t1.id, t3.id]);
    expect(ids((await list(`cultivar=${ember.slug}`)).body)).toEqual([t2.id, t3.id]);
    expect(ids((await list('cultivar=no-such-record')).body)).toEqual([]);
    expect(ids((await list('group=Dissectum')).body)).toEqual([t1.id, t3.id]);
    expect(ids((await list(`group=${encodeURIComponent('dissectum group')}`)).body)).toEqual([t1.id, t3.id]);
    expect(ids((await list('group=Linearilobum')).body)).toEqual([]);
    // Filters combine, and drafts never show in the public list.
    expect(ids((await list(`cultivar=${lace.slug}&author=${authorUser.id}&garden=corner`)).body)).toEqual([t1.id]);
    expect((await list(`cultivar=${lace.slug}`, author)).body.items.map((t: { state: string }) => t.state)).toEqual(['published', 'published']);
    expect((await list(`garden=${'x'.repeat(161)}`)).status).toBe(400);
  });
});

describe('GET /api/authors', () => {
  it('lists everyone with a published tour, by name, with how many: drafts and disabled accounts aside', async () => {
    const r = await anonymous.get('/api/authors');
    expect(r.status).toBe(200);
    authorListSchema.parse(r.body);
    // Ada has two published tours and a draft; Bram one.
    expect(r.body.items).toEqual([
      { id: authorUser.id, displayName: 'Ada Fernhollow (fictional)', publishedTours: 2 },
      { id: otherUser.id, displayName: 'Bram Quarry (fictional)', publishedTours: 1 },
    ]);
    await server.dataSource.getRepository(User).update({ id: otherUser.id }, { disabledAt: new Date() });
    try {
      expect((await anonymous.get('/api/authors')).body.items.map((a: { id: number }) => a.id)).toEqual([authorUser.id]);
    } finally {
      await server.dataSource.getRepository(User).update({ id: otherUser.id }, { disabledAt: null });
    }
  });
});

describe('GET /api/authors/:id', () => {
  it('shows the display name, garden, published tour count and their published tours', async () => {
    const r = await anonymous.get(`/api/authors/${authorUser.id}`);
    expect(r.status).toBe(200);
    authorPageSchema.parse(r.body);
    expect(r.body.author).toMatchObject({ id: authorUser.id, displayName: 'Ada Fernhollow (fictional)', garden: 'Fernhollow Corner (fictional)', publishedTours: 2 });
    expect(r.body.author).not.toHaveProperty('email');
    expect(ids(r.body.tours)).toEqual([t1.id, t2.id]);
    const paged = await anonymous.get(`/api/authors/${authorUser.id}?page=2&pageSize=1`);
    expect(ids(paged.body.tours)).toEqual([t2.id]);
    expect(paged.body.author.publishedTours).toBe(2);
  });

  it('is 404 for viewers without tours, disabled accounts and unknown ids', async () => {
    const viewerUser = await makeUser(server.dataSource, 'viewer');
    expect((await anonymous.get(`/api/authors/${viewerUser.id}`)).status).toBe(404);
    const gone = await makeUser(server.dataSource, 'author', { disabledAt: new Date() });
    expect((await anonymous.get(`/api/authors/${gone.id}`)).status).toBe(404);
    expect((await anonymous.get('/api/authors/999999')).status).toBe(404);
    expect((await anonymous.get('/api/authors/x')).status).toBe(400);
    // An author with nothing published yet still has a page.
    const fresh = await makeUser(server.dataSource, 'author');
    const page = await anonymous.get(`/api/authors/${fresh.id}`);
    expect(page.status).toBe(200);
    expect(page.body.author.publishedTours).toBe(0);
  });
});
