import type { CheckRevision, SettlementCheckSummary } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { dataSource } from '../../data-source.js';
import { getRevision } from '../../modules/settlement-checks/check-runs.service.js';
import { listProjectChecks } from '../../modules/settlement-checks/settlement-checks.service.js';
import { DEMO_ORGANISATION_ID } from '../demo-organisation.seed.js';
import { DEMO_PROJECT_ID } from '../lab-demo.seed.js';
import { seed } from '../seed.js';

describe('the design demo', () => {
  it('when seeded, then the demo project has a ground model from its approved records (one layer from a characteristic set) and a check of 12–20 footings with one footing sized by the tool and a pair over the angular-distortion limit', async () => {
    await seed(dataSource);
    const [check] = (await listProjectChecks(DEMO_ORGANISATION_ID, DEMO_PROJECT_ID)) as [SettlementCheckSummary];
    expect(check.footingCount).toBeGreaterThanOrEqual(12);
    expect(check.footingCount).toBeLessThanOrEqual(20);
    const latest: CheckRevision = await getRevision(DEMO_ORGANISATION_ID, DEMO_PROJECT_ID, check.id, check.latestRevision!, 'summary');
    expect(latest.reason).toMatch(/sized by the tool/);
    const sources = latest.groundModel.content.layers.map((l) => l.source?.kind ?? 'granular');
    expect(sources).toContain('set');
    expect(sources).toContain('record');
    if (latest.result.kind !== 'footings') throw new Error('expected footings');
    const over = latest.result.check.pairs.filter((p) => !p.withinDesignLimit);
    expect(over.map((p) => p.footingIds.join('–'))).toEqual(['P2–S1']);
    // A second seed adds nothing.
    expect((await seed(dataSource)).demo.created).toBe(0);
  }, 120_000);
});
