import { ROLE_LABELS } from '@porestack/types';
import type { DataSource } from 'typeorm';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemoOrganisation, type DemoOrganisation } from './demo-organisation.seed.js';
import { seedDesignDemo } from './design-demo.seed.js';
import { seedLabDemo } from './lab-demo.seed.js';

export interface SeedResult {
  demo: DemoOrganisation;
  /** Lines for the person starting the portal (npm start prints them as they are). */
  banner: string[];
}

/**
 * Seeds the demo data in one transaction; running it again creates nothing twice.
 * Later parts (lab projects, tests) go after the organisation and use `demo.userIds`.
 */
export async function seed(dataSource: DataSource): Promise<SeedResult> {
  const demo = await dataSource.transaction((manager) => seedDemoOrganisation(manager));
  // The lab records run the analysis service, which opens its own transactions.
  demo.created += await seedLabDemo(dataSource, demo);
  // The design work reads the approved records the lab demo made.
  demo.created += await seedDesignDemo(dataSource, demo);
  const width = Math.max(...DEMO_ACCOUNTS.map((a) => ROLE_LABELS[a.role].length));
  const banner = [
    `  Demo organisation:        ${demo.organisation.name}`,
    `  Demo accounts (password: ${DEMO_PASSWORD}):`,
    ...DEMO_ACCOUNTS.map((a) => `    ${ROLE_LABELS[a.role].padEnd(width)}  ${a.email}`),
  ];
  return { demo, banner };
}
