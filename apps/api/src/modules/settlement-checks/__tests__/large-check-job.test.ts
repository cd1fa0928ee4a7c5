import type { CheckRevision, FootingRowInput, FootingSettlementResult, JobRun, RunCheckAnswer, SettlementCheckDetail } from '@porestack/types';
import type PgBoss from 'pg-boss';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { BOSS_SCHEMA, createBoss } from '../../../jobs/boss.js';
import { registerJobs } from '../../../jobs/register-jobs.js';
import { runCheckJob } from '../../../jobs/run-check.job.js';
import { finishedJob } from '../../../testing/import-harness.js';
import { createCheck, createGroundModel, designWorld, type DesignWorld } from '../../../testing/design-fixtures.js';
import { INLINE_FOOTING_LIMIT } from '../check-runs.service.js';
import { closeEnginePool } from '../engine-pool.js';

const app = createApp();

describe('a check too large to answer at once runs as a job', () => {
  let boss: PgBoss;
  let world: DesignWorld;

  beforeAll(async () => {
    boss = createBoss();
    boss.on('error', () => undefined);
    await boss.start();
    await registerJobs(boss, [runCheckJob]);
    world = await designWorld(app, 'large');
  });

  afterAll(async () => {
    await boss.stop({ graceful: true, wait: true });
    await closeEnginePool();
    await dataSource.query(`DELETE FROM ${BOSS_SCHEMA}.job WHERE state IN ('created', 'retry') AND data->>'orgId' = $1`, [world.orgId]);
  });

  it('when a designer runs more footings than answer at once, then a job is queued and computed on an engine thread, its progress can be followed, and the revision holds every footing', async () => {
    const model = await createGroundModel(world, {
      name: 'Grid model',
      waterTableDepthM: 1,
      layers: [
        { name: 'fill', kind: 'granular', thicknessM: 1, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 19 },
        { name: 'clay', kind: 'compressible', thicknessM: 6, unitWeightKnPerM3: 17, saturatedUnitWeightKnPerM3: 17, source: { kind: 'hand' }, parameters: { e0: 1.1, cc: 0.4, cvM2PerYr: 2 } },
      ],
    });
    const count = INLINE_FOOTING_LIMIT + 25;
    const footings: FootingRowInput[] = Array.from({ length: count }, (_, i) => ({ id: `G${i + 1}`, shape: 'square', widthM: 1.5, depthM: 1, load: 400, xM: (i % 15) * 5, yM: Math.floor(i / 15) * 5 }));
    const check = await createCheck(world, { name: 'Grid', groundModelId: model.id, footings, options: { evaluationPoints: 'centre', sublayerMaxThicknessM: 1, pairMaxDistanceM: 6 } });
    const res = await world.designer.post(`${world.base}/settlement-checks/${check.id}/runs`, {});
    expect(res.status).toBe(202);
    const answer = res.body as RunCheckAnswer;
    if (answer.kind !== 'queued') throw new Error('expected a queued run');
    const pending = (await world.designer.get(`${world.base}/settlement-checks/${check.id}`).expect(200)).body as SettlementCheckDetail;
    expect(pending.pendingJobId === answer.jobId || pending.latestRevision === 1).toBe(true);
    const job: JobRun = await finishedJob(world.designer, world.orgId, answer.jobId, 60_000);
    expect(job.state).toBe('succeeded');
    expect(job.message).toMatch(new RegExp(`Revision 1 is ready: ${count} footings`));
    const revision = (await world.designer.get(`${world.base}/settlement-checks/${check.id}/revisions/1`).expect(200)).body as CheckRevision;
    if (revision.result.kind !== 'footings') throw new Error('expected footings');
    expect(revision.result.check.footings).toHaveLength(count);
    expect(revision.detail).toBe('summary');
    expect(revision.result.check.footings[0]!.sublayers).toEqual([]);
    // Neighbours only within 6 m on a 5 m grid: each pair of grid neighbours, along rows and columns.
    const rows = Math.ceil(count / 15);
    const lastRow = count - 15 * (rows - 1);
    const expectedPairs = 14 * (rows - 1) + (lastRow - 1) + 15 * (rows - 2) + lastRow;
    expect(revision.result.check.pairs).toHaveLength(expectedPairs);
    const detail = (await world.designer.get(`${world.base}/settlement-checks/${check.id}/revisions/1/footings/G1`).expect(200)).body as FootingSettlementResult;
    expect(detail.sublayers.length).toBe(6);
    const after = (await world.designer.get(`${world.base}/settlement-checks/${check.id}`).expect(200)).body as SettlementCheckDetail;
    expect(after.pendingJobId).toBeNull();
  }, 90_000);
});
