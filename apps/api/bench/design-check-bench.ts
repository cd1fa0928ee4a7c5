/**
 * Settlement-check benchmark, through the real HTTP routes, the engine and PostgreSQL:
 *  1. 100 footings × 5 points (centre and corners) × 40 sublayers, every neighbour's stress and
 *     every pair judged: the time from the run request to the stored revision (answered at once);
 *  2. 1,000 footings as a pg-boss job: the time from the request to the job's end.
 *
 * Runs the API and the job handler in this process, against .run/services.env (migrates
 * DATABASE_URL first):
 *   source .run/services.env && pnpm --filter @porestack/api bench:design
 * BENCH_RUNS (default 5) repeats the 100-footing run; BENCH_JOB_FOOTINGS (default 1000) sizes the job.
 */
import './bench-env.js';
import 'reflect-metadata';
import type { FootingRowInput, GroundModelDetail, JobRun, RunCheckAnswer, SettlementCheckDetail } from '@porestack/types';
import { createApp } from '../src/app.js';
import { dataSource } from '../src/data-source.js';
import { createBoss, stopJobQueue } from '../src/jobs/boss.js';
import { registerJobs } from '../src/jobs/register-jobs.js';
import { runCheckJob } from '../src/jobs/run-check.job.js';
import { CheckRevisionEntity } from '../src/modules/settlement-checks/check-revision.entity.js';
import { closeEnginePool } from '../src/modules/settlement-checks/engine-pool.js';
import { designWorld } from '../src/testing/design-fixtures.js';

const RUNS = Number(process.env['BENCH_RUNS'] ?? 5);
const JOB_FOOTINGS = Number(process.env['BENCH_JOB_FOOTINGS'] ?? 1000);

/** Footings on a square grid, 5 m apart, loads varying so that neighbours differ. */
function grid(count: number): FootingRowInput[] {
  const side = Math.ceil(Math.sqrt(count));
  return Array.from({ length: count }, (_, i) => ({
    id: `F${i + 1}`,
    shape: 'square',
    widthM: 1.8,
    depthM: 1,
    loadKind: 'load',
    load: 400 + 40 * (i % 5),
    loadBasis: 'gross',
    xM: (i % side) * 5,
    yM: Math.floor(i / side) * 5,
  }));
}

const ms = (value: number) => `${value.toFixed(0).padStart(7)} ms`;

await dataSource.initialize();
await dataSource.runMigrations({ transaction: 'each' });
// Counts of an earlier run (bench:load's failed sign-ins from this machine) would limit this one's sign-ins.
await dataSource.query('DELETE FROM rate_limits');
const app = createApp();
const world = await designWorld(app, 'bench');
// Fill 1 m, clay 20 m (40 sublayers of 0.5 m), gravel below.
const model = (
  await world.designer.post(`${world.base}/ground-models`, {
    name: 'Bench model',
    waterTableDepthM: 1,
    layers: [
      { name: 'fill', kind: 'granular', thicknessM: 1, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 19, elasticModulusKpa: 10_000, poissonRatio: 0.3 },
      { name: 'clay', kind: 'compressible', thicknessM: 20, unitWeightKnPerM3: 17.5, saturatedUnitWeightKnPerM3: 17.5, source: { kind: 'hand' }, parameters: { e0: 1.1, cc: 0.4, recompressionIndex: 0.05, ocr: 1.5, cvM2PerYr: 2, cAlpha: 0.015 } },
      { name: 'gravel', kind: 'granular', thicknessM: 10, unitWeightKnPerM3: 20, saturatedUnitWeightKnPerM3: 21, elasticModulusKpa: 80_000, poissonRatio: 0.3 },
    ],
  })
).body as GroundModelDetail;
const options = { sublayerMaxThicknessM: 0.5, evaluationPoints: 'centre-and-corners', includeNeighbours: true };

console.log(`Design check benchmark (Node ${process.version}, ${RUNS} runs each)`);
const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)] ?? 0;

/** Runs a 100-footing check RUNS times through the HTTP route; prints request → stored revision and the engine's share. */
async function timeInline(name: string, pairMaxDistanceM: number | null): Promise<void> {
  const check = (await world.designer.post(`${world.base}/settlement-checks`, { name, groundModelId: model.id, footings: grid(100), options: { ...options, pairMaxDistanceM } }).expect(201)).body as SettlementCheckDetail;
  const totals: number[] = [];
  const engine: number[] = [];
  let shape = '';
  for (let run = 0; run < RUNS; run += 1) {
    const started = performance.now();
    const answer = (await world.designer.post(`${world.base}/settlement-checks/${check.id}/runs`, {}).expect(201)).body as RunCheckAnswer;
    totals.push(performance.now() - started);
    if (answer.kind !== 'done') throw new Error('expected the 100-footing run to answer at once');
    const stored = await dataSource.getRepository(CheckRevisionEntity).findOneByOrFail({ id: answer.revisionId });
    engine.push(stored.durationMs);
    const [detail] = (await dataSource.query('SELECT detail FROM settlement_check_footing_results WHERE revision_id = $1 AND footing_index = 0', [answer.revisionId])) as Array<{ detail: { sublayers: unknown[]; points: unknown[] } }>;
    if (stored.result.kind === 'footings') shape = `${detail?.detail.sublayers.length ?? 0} sublayers × ${detail?.detail.points.length ?? 0} points under each footing, ${stored.result.check.pairs.length} pairs judged`;
  }
  const sorted = [...totals].sort((a, b) => a - b);
  console.log(`  ${name}: ${shape}`);
  console.log(`    request → stored revision: first ${ms(totals[0] ?? 0)}, median ${ms(median(totals))}, fastest ${ms(sorted[0] ?? 0)}, slowest ${ms(sorted.at(-1) ?? 0)}`);
  console.log(`    of which geo-core:         first ${ms(engine[0] ?? 0)}, median ${ms(median(engine))}`);
}

// Every neighbour's stress in both; pairs judged within the default 12 m, then every pair.
await timeInline('100 footings, pairs within 12 m (the default)', 12);
await timeInline('100 footings, every pair judged', null);
const [load] = (await import('node:os')).loadavg();
console.log(`  load average while measuring: ${load?.toFixed(1)} on ${(await import('node:os')).cpus().length} cores`);

const boss = createBoss();
boss.on('error', () => undefined);
await boss.start();
await registerJobs(boss, [runCheckJob]);
const large = (await world.designer.post(`${world.base}/settlement-checks`, { name: `Bench ${JOB_FOOTINGS}`, groundModelId: model.id, footings: grid(JOB_FOOTINGS), options: { ...options, pairMaxDistanceM: 8 } }).expect(201))
  .body as SettlementCheckDetail;
const jobStarted = performance.now();
const queued = (await world.designer.post(`${world.base}/settlement-checks/${large.id}/runs`, {}).expect(202)).body as RunCheckAnswer;
if (queued.kind !== 'queued') throw new Error('expected the large run to be queued');
let job: JobRun;
for (;;) {
  job = (await world.designer.get(`/api/orgs/${world.orgId}/jobs/${queued.jobId}`).expect(200)).body as JobRun;
  if (job.state === 'succeeded' || job.state === 'failed') break;
  await new Promise((resolve) => setTimeout(resolve, 200));
}
const jobMs = performance.now() - jobStarted;
const stored = await dataSource.getRepository(CheckRevisionEntity).findOneBy({ checkId: large.id, revision: 1 });
console.log(`  ${JOB_FOOTINGS} footings as a job (neighbours within 8 m judged): ${job.state} in ${ms(jobMs)} (geo-core ${ms(stored?.durationMs ?? 0)}) — ${job.message}`);

await boss.stop({ graceful: true, wait: true });
await closeEnginePool();
await stopJobQueue();
await dataSource.destroy();
process.exit(0);
