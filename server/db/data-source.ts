import 'reflect-metadata';
import { DataSource } from 'typeorm';
import type { Config } from '../config';
import { ENTITIES } from './entities/index';
import { MIGRATIONS } from './migrations/index';

/** Builds the TypeORM data source for MariaDB; `synchronize` stays off: the schema comes from migrations. */
export function createDataSource(config: Pick<Config, 'DB_HOST' | 'DB_PORT' | 'DB_USER' | 'dbPassword' | 'DB_NAME'>): DataSource {
  return new DataSource({
    type: 'mariadb',
    host: config.DB_HOST,
    port: config.DB_PORT,
    username: config.DB_USER,
    password: config.dbPassword,
    database: config.DB_NAME,
    charset: 'utf8mb4_unicode_ci',
    timezone: 'Z',
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTableName: 'migrations',
    synchronize: false,
    logging: ['error'],
    extra: { connectionLimit: 20 },
  });
}
