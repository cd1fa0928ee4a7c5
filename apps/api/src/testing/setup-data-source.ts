import 'reflect-metadata';
import { afterAll, beforeAll } from 'vitest';
import { dataSource } from '../data-source.js';
import { closeMailer } from '../mail/mailer.js';
import { closeParsePool } from '../modules/readings-import/parse-pool.js';

beforeAll(async () => {
  if (!dataSource.isInitialized) await dataSource.initialize();
});

afterAll(async () => {
  closeMailer();
  await closeParsePool();
  if (dataSource.isInitialized) await dataSource.destroy();
});
