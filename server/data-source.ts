/** The one TypeORM DataSource, shared by the server, the worker process, the CLI and the tests. */
import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { SnakeNamingStrategy } from 'typeorm-naming-strategies';
import { entities } from './entities/index.ts';
import { migrations } from './migrations/index.ts';

export function createDataSource(url: string, options: { poolSize?: number } = {}): DataSource {
  return new DataSource({
    type: 'postgres',
    url,
    entities,
    migrations,
    namingStrategy: new SnakeNamingStrategy(),
    // Schema changes go through migrations only, even in tests.
    synchronize: false,
    migrationsTransactionMode: 'each',
    extra: { max: options.poolSize ?? 10, connectionTimeoutMillis: 10_000 },
  });
}
