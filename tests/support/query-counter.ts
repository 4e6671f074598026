import type { DataSource, QueryRunner } from 'typeorm';

/** Counts the SQL statements a data source sends while `active`. */
export interface QueryCounter {
  readonly count: number;
  readonly statements: readonly string[];
  reset(): void;
  /** Puts the data source back as it was. */
  restore(): void;
}

/**
 * Wraps the driver's query runners so every statement TypeORM sends (repository finds, query
 * builders, raw `dataSource.query`) is counted. Used to show that an endpoint runs a fixed number
 * of queries, whatever the size of what it returns (no N+1).
 */
export function countQueries(dataSource: DataSource): QueryCounter {
  const driver = dataSource.driver as unknown as { createQueryRunner(mode: 'master' | 'slave'): QueryRunner };
  const original = driver.createQueryRunner;
  const statements: string[] = [];
  driver.createQueryRunner = function (this: unknown, mode: 'master' | 'slave') {
    const runner = original.call(driver, mode);
    const query = runner.query.bind(runner);
    runner.query = ((sql: string, params?: unknown[], structured?: boolean) => {
      statements.push(sql);
      return query(sql, params, structured as never);
    }) as QueryRunner['query'];
    return runner;
  };
  return {
    get count() {
      return statements.length;
    },
    statements,
    reset() {
      statements.length = 0;
    },
    restore() {
      driver.createQueryRunner = original;
    },
  };
}
