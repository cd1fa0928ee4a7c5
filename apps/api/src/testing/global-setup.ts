import 'reflect-metadata';

/**
 * Starts every run on an empty schema: drops what DATABASE_URL holds (tables and the
 * pg-boss queue schema) and runs the migrations, exactly as `pnpm migrate` would; and
 * creates the test bucket, as the server and the worker do at start (a fresh S3 fake has none).
 */
export default async function globalSetup(): Promise<void> {
  process.env['NODE_ENV'] = 'test';
  const { dataSource } = await import('../data-source.js');
  await dataSource.initialize();
  await dataSource.query('DROP SCHEMA IF EXISTS pgboss CASCADE');
  await dataSource.query('DROP SCHEMA IF EXISTS public CASCADE');
  await dataSource.query('CREATE SCHEMA public');
  await dataSource.runMigrations({ transaction: 'each' });
  await dataSource.destroy();
  const { ensureBucket } = await import('../storage/storage.js');
  await ensureBucket();
}
