import 'reflect-metadata';
import { dataSource } from '../data-source.js';
import { stopJobQueue } from '../jobs/boss.js';
import { seed } from './seed.js';

// stdout carries only the banner (npm start shows it verbatim); anything else goes to stderr.
await dataSource.initialize();
try {
  const { banner, demo } = await seed(dataSource);
  process.stderr.write(demo.created > 0 ? `Seeded ${demo.created} demo records.\n` : 'Demo data already present; nothing added.\n');
  process.stdout.write(`${banner.join('\n')}\n`);
} finally {
  // The seed queues report jobs for its approved versions; the worker prints them.
  await stopJobQueue();
  await dataSource.destroy();
}
