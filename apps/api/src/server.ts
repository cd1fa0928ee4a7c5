import 'reflect-metadata';
import { createApp } from './app.js';
import { env } from './config/env.js';
import { dataSource } from './data-source.js';
import { logger } from './http/logger.js';
import { closeMailer } from './mail/mailer.js';
import { closeParsePool } from './modules/readings-import/parse-pool.js';
import { ensureBucket } from './storage/storage.js';

const config = env();
await dataSource.initialize();
await ensureBucket();

const server = createApp().listen(config.PORT, config.HOST, () => {
  logger.info({ port: config.PORT, publicUrl: config.PUBLIC_URL }, 'Porestack API listening');
});

let stopping = false;
function shutdown(signal: string): void {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, 'shutting down');
  // Stop taking connections, let requests in flight finish, then close the pool.
  server.close(() => {
    closeMailer();
    Promise.allSettled([closeParsePool(), dataSource.destroy()]).finally(() => process.exit(0));
  });
  server.closeIdleConnections();
  setTimeout(() => process.exit(1), 10_000).unref();
}
process.on('SIGTERM', () => shutdown('SIGTERM'));
process.on('SIGINT', () => shutdown('SIGINT'));
