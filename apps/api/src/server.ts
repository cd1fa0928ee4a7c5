import 'reflect-metadata';
import cluster from 'node:cluster';
import type { PostgresDriver } from 'typeorm/driver/postgres/PostgresDriver.js';
import { createApp } from './app.js';
import { env } from './config/env.js';
import { dataSource } from './data-source.js';
import { readCache } from './db/read-cache.js';
import { logger } from './http/logger.js';
import { closeMailer } from './mail/mailer.js';
import { closeParsePool } from './modules/readings-import/parse-pool.js';
import { ensureBucket } from './storage/storage.js';

const config = env();

if (config.API_PROCESSES > 1 && cluster.isPrimary) {
  runProcesses(config.API_PROCESSES);
} else {
  await serve();
}

/**
 * API_PROCESSES > 1: this process only forks the API processes, which share the port
 * (node:cluster hands them connections in turn); one that dies is started again, and a
 * signal reaches all of them and ends this one after the last.
 */
function runProcesses(count: number): void {
  let stopping = false;
  const alive = new Set<number>();
  const fork = () => alive.add(cluster.fork().id);
  for (let i = 0; i < count; i += 1) fork();
  cluster.on('exit', (worker, code) => {
    alive.delete(worker.id);
    if (stopping) {
      if (alive.size === 0) process.exit(0);
      return;
    }
    logger.error({ pid: worker.process.pid, code }, 'an API process ended; starting another');
    setTimeout(fork, 1_000);
  });
  const stop = (signal: NodeJS.Signals) => {
    stopping = true;
    for (const worker of Object.values(cluster.workers ?? {})) worker?.process.kill(signal);
    setTimeout(() => process.exit(1), 12_000).unref();
  };
  process.on('SIGTERM', () => stop('SIGTERM'));
  process.on('SIGINT', () => stop('SIGINT'));
  logger.info({ processes: count, port: config.PORT }, 'Porestack API processes starting');
}

async function serve(): Promise<void> {
  await dataSource.initialize();
  await ensureBucket();
  if (config.READ_CACHE_MB > 0) await readCache().start();

  const server = createApp().listen(config.PORT, config.HOST, () => {
    logger.info({ port: config.PORT, publicUrl: config.PUBLIC_URL }, 'Porestack API listening');
  });

  let stopping = false;
  function shutdown(signal: string): void {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'shutting down');
    // No more kept reads: the last requests read from the database, and the notices' connection
    // closes now rather than complain when the database stops beside this process.
    void readCache().stop();
    // Stop taking connections, let requests in flight finish — also those whose client has gone
    // and which still wait on the database — then close the pool.
    server.close(() => {
      closeMailer();
      void queriesSettled(5_000)
        .then(() => Promise.allSettled([closeParsePool(), dataSource.destroy()]))
        .finally(() => process.exit(0));
    });
    server.closeIdleConnections();
    setTimeout(() => process.exit(1), 10_000).unref();
  }
  process.on('SIGTERM', () => shutdown('SIGTERM'));
  process.on('SIGINT', () => shutdown('SIGINT'));
}

/** Resolves once no pooled connection has been in use for 100 ms (or after `ms`). */
async function queriesSettled(ms: number): Promise<void> {
  const pool = (dataSource.driver as PostgresDriver).master as { totalCount: number; idleCount: number; waitingCount: number };
  const deadline = Date.now() + ms;
  let quietSince = Date.now();
  while (Date.now() < deadline && Date.now() - quietSince < 100) {
    if (pool.waitingCount > 0 || pool.totalCount > pool.idleCount) quietSince = Date.now();
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}
