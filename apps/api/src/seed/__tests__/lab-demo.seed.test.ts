import { TEST_STATUSES } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { dataSource } from '../../data-source.js';
import { DEMO_ORGANISATION_ID } from '../demo-organisation.seed.js';
import { seed } from '../seed.js';

describe('seed() — the demo laboratory', () => {
  it('when seeded, then the demo project has a test in every status, analyses with results, and a soil record at version 2 over a superseded version 1 — and only once', async () => {
    await seed(dataSource);
    const statuses = (await dataSource.query('SELECT DISTINCT status FROM consolidation_tests WHERE organisation_id = $1', [DEMO_ORGANISATION_ID])) as Array<{ status: string }>;
    expect(statuses.map((s) => s.status).sort()).toEqual([...TEST_STATUSES].sort());
    const versions = (await dataSource.query(
      `SELECT v.version, s.superseded_at FROM soil_record_versions v LEFT JOIN soil_record_supersessions s ON s.version_id = v.id
        WHERE v.organisation_id = $1 ORDER BY v.approved_at`,
      [DEMO_ORGANISATION_ID],
    )) as Array<{ version: number; superseded_at: Date | null }>;
    expect(versions.filter((v) => v.superseded_at !== null)).toHaveLength(1);
    expect(Math.max(...versions.map((v) => v.version))).toBe(2);
    const [{ n: analyses } = { n: 0 }] = (await dataSource.query('SELECT count(*)::int AS n FROM analyses WHERE organisation_id = $1', [DEMO_ORGANISATION_ID])) as Array<{ n: number }>;
    const again = await seed(dataSource);
    expect(again.demo.created).toBe(0);
    const [{ n: afterAgain } = { n: 0 }] = (await dataSource.query('SELECT count(*)::int AS n FROM analyses WHERE organisation_id = $1', [DEMO_ORGANISATION_ID])) as Array<{ n: number }>;
    expect(afterAgain).toBe(analyses);
  });
});
