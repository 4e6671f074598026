import type { DataSource } from 'typeorm';

/**
 * What search (and the "where is this name spoken" summaries) keeps in memory, each with a
 * revision that database triggers replace, in the same transaction, whenever its source changes
 * (migration 1796174200000-search-revisions):
 * - `catalogue`: cultivar records and their spellings;
 * - `tours`: published tours (publishing, withdrawing, any edit) and their authors' names.
 */
export interface SearchRevisions {
  catalogue: string;
  tours: string;
}

/** A kind with no row (the table emptied by hand or by the tests' reset) reads as this. */
const NO_ROW = 'none';

/** The current revisions: one primary-key read, instead of a checksum over every row. */
export async function readRevisions(dataSource: DataSource): Promise<SearchRevisions> {
  const rows = (await dataSource.query(`SELECT name, revision FROM search_revisions WHERE name IN ('catalogue', 'tours')`)) as { name: string; revision: string }[];
  const of = (name: keyof SearchRevisions) => rows.find((r) => r.name === name)?.revision ?? NO_ROW;
  return { catalogue: of('catalogue'), tours: of('tours') };
}

/**
 * A value built from the database and kept while its revision stands. Searches that arrive while it
 * is being built share the build; only the build for the revision asked for last may replace it, so
 * a slow build for a revision already replaced never wins (at worst a reader that is itself late
 * starts one build too many).
 */
export class RevisionCache<T> {
  private current: { revision: string; value: T } | null = null;
  private loading: { revision: string; promise: Promise<T> } | null = null;

  constructor(private readonly build: () => Promise<T>) {}

  get(revision: string): Promise<T> {
    if (this.current?.revision === revision) return Promise.resolve(this.current.value);
    if (this.loading?.revision === revision) return this.loading.promise;
    const entry: { revision: string; promise: Promise<T> } = {
      revision,
      promise: this.build().then(
        (value) => {
          if (this.loading === entry) {
            this.current = { revision, value };
            this.loading = null;
          }
          return value;
        },
        (err: unknown) => {
          if (this.loading === entry) this.loading = null;
          throw err;
        },
      ),
    };
    this.loading = entry;
    return entry.promise;
  }
}
