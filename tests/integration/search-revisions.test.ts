// The revisions search checks before using what it keeps in memory (search-revisions.ts): database
// triggers must replace the catalogue revision on every change to cultivar records and spellings,
// and the tours revision on every change to a published tour (publishing and withdrawing included)
// or its author's name, and leave each alone otherwise. These are Grovewalk's own rules (issue 6:
// an edit shows in the very next search); the changes are made in plain SQL, as any writer would,
// so no service code stands between them and the triggers. The records and tours are invented.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { User } from '../../server/db/entities/user.entity';
import { readRevisions, RevisionCache, type SearchRevisions } from '../../server/modules/search/search-revisions';
import { makeCultivarRow } from '../support/caption-fixtures';
import { makeUser } from '../support/fixtures';
import { resetTables, startTestServer, type TestServer } from '../support/http';
import { publishedTour } from '../support/search-fixtures';

let server: TestServer;
let author: User;

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  author = await makeUser(server.dataSource, 'author');
});
afterAll(async () => server.close());

/** Which revisions a change replaced. */
async function changed(change: () => Promise<unknown>): Promise<(keyof SearchRevisions)[]> {
  const before = await readRevisions(server.dataSource);
  await change();
  const after = await readRevisions(server.dataSource);
  return (['catalogue', 'tours'] as const).filter((k) => before[k] !== after[k]);
}

describe('search revisions', () => {
  it('replaces the catalogue revision on every change to records and their spellings', async () => {
    const q = (sql: string, params: unknown[] = []) => () => server.dataSource.query(sql, params);
    let id = 0;
    expect(await changed(async () => (id = (await makeCultivarRow(server.dataSource, 'Tallowmere Gold', [])).id))).toEqual(['catalogue']);
    expect(await changed(q(`UPDATE cultivars SET traits = JSON_OBJECT('habit', JSON_ARRAY('weeping')) WHERE id = ?`, [id]))).toEqual(['catalogue']);
    expect(await changed(q(`UPDATE cultivars SET status = 'retired' WHERE id = ?`, [id]))).toEqual(['catalogue']);
    expect(await changed(q(`INSERT INTO cultivar_variants (cultivar_id, text, normalized) VALUES (?, 'Tallowmeer Gold', 'tallowmeer gold')`, [id]))).toEqual(['catalogue']);
    expect(await changed(q(`UPDATE cultivar_variants SET text = 'Talowmere Gold', normalized = 'talowmere gold' WHERE cultivar_id = ?`, [id]))).toEqual(['catalogue']);
    expect(await changed(q(`DELETE FROM cultivar_variants WHERE cultivar_id = ?`, [id]))).toEqual(['catalogue']);
    expect(await changed(q(`DELETE FROM cultivars WHERE id = ?`, [id]))).toEqual(['catalogue']);
    // Reading replaces nothing.
    expect(await changed(q(`SELECT COUNT(*) FROM cultivars`))).toEqual([]);
  });

  it('replaces the tours revision when a published tour changes, is published or withdrawn, or its author is renamed; not for drafts', async () => {
    const q = (sql: string, params: unknown[] = []) => () => server.dataSource.query(sql, params);
    let draftId = 0;
    expect(await changed(async () => (draftId = (await publishedTour(server.dataSource, author.id, { title: 'Draft walk (fictional)', state: 'ready', publishedAt: null })).id))).toEqual([]);
    expect(await changed(q(`UPDATE tours SET title = 'Draft walk, renamed (fictional)' WHERE id = ?`, [draftId]))).toEqual([]);
    expect(await changed(q(`UPDATE tours SET state = 'published', published_at = NOW(3) WHERE id = ?`, [draftId]))).toEqual(['tours']);
    expect(await changed(q(`UPDATE tours SET filmed_on = '2024-10-01' WHERE id = ?`, [draftId]))).toEqual(['tours']);
    expect(await changed(q(`UPDATE tours SET state = 'ready' WHERE id = ?`, [draftId]))).toEqual(['tours']);
    let publishedId = 0;
    expect(await changed(async () => (publishedId = (await publishedTour(server.dataSource, author.id, { title: 'Published walk (fictional)' })).id))).toEqual(['tours']);
    expect(await changed(q(`UPDATE users SET display_name = 'Wren Tallowby' WHERE id = ?`, [author.id]))).toEqual(['tours']);
    // Capitals and accents alone count as a change (the column's collation would call them equal).
    expect(await changed(q(`UPDATE users SET display_name = 'wren tallowby' WHERE id = ?`, [author.id]))).toEqual(['tours']);
    expect(await changed(q(`UPDATE users SET display_name = 'wren tallówby' WHERE id = ?`, [author.id]))).toEqual(['tours']);
    expect(await changed(q(`UPDATE users SET unit_system = 'imperial' WHERE id = ?`, [author.id]))).toEqual([]);
    expect(await changed(q(`DELETE FROM tours WHERE id = ?`, [draftId]))).toEqual([]);
    expect(await changed(q(`DELETE FROM tours WHERE id = ?`, [publishedId]))).toEqual(['tours']);
  });

  it('reads "none" for a kind with no row (a database just emptied), so what was kept is built again', async () => {
    await server.dataSource.query('DELETE FROM search_revisions');
    expect(await readRevisions(server.dataSource)).toEqual({ catalogue: 'none', tours: 'none' });
  });
});

describe('RevisionCache', () => {
  it('builds once per revision, shares a build in progress, and never lets a build for a revision already replaced win', async () => {
    const releases: (() => void)[] = [];
    let builds = 0;
    const cache = new RevisionCache(async () => {
      const n = ++builds;
      await new Promise<void>((resolve) => releases.push(resolve));
      return n;
    });
    const a1 = cache.get('a');
    const a2 = cache.get('a');
    expect(builds).toBe(1);
    const b = cache.get('b');
    expect(builds).toBe(2);
    releases[1]!(); // the newer build ends first
    expect(await b).toBe(2);
    releases[0]!();
    expect(await a1).toBe(1);
    expect(await a2).toBe(1);
    // The older build did not replace the newer value.
    expect(await cache.get('b')).toBe(2);
    expect(builds).toBe(2);
  });
});
