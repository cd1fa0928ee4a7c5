import 'reflect-metadata';
import { dataSource } from '../data-source.js';
import { seed } from './seed.js';

// stdout carries only the banner (npm start shows it verbatim); anything else goes to stderr.
await dataSource.initialize();
try {
  const { banner, demo } = await seed(dataSource);
  process.stderr.write(demo.created > 0 ? `Seeded ${demo.created} demo records.\n` : 'Demo data already present; nothing added.\n');
  process.stdout.write(`${banner.join('\n')}\n`);
} finally {
  await dataSource.destroy();
}
