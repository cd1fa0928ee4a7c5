import 'reflect-metadata';
import { afterAll, beforeAll } from 'vitest';
import { dataSource } from '../data-source.js';
import { closeMailer } from '../mail/mailer.js';

beforeAll(async () => {
  if (!dataSource.isInitialized) await dataSource.initialize();
});

afterAll(async () => {
  closeMailer();
  if (dataSource.isInitialized) await dataSource.destroy();
});
