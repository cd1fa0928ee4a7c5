import type { TestDetail, TestSummary } from '@porestack/types';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../app.js';
import { databaseUrl } from '../../config/env.js';
import { dataSource } from '../../data-source.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../../testing/browser.js';
import { draftTest, type LabFixture } from '../../testing/lab-fixtures.js';
import { READS_CHANNEL, ReadCache, readCache } from '../read-cache.js';

// Reads kept in the API process until PostgreSQL's triggers notice a change of their rows — from
// whatever connection made it (here a separate one, as the worker's or a person's in psql would be).

const app = createApp();
let outside: pg.Client;
let orgId: string;
let other: { orgId: string; test: LabFixture };
let test: LabFixture;
let technicianId: string;
let technician: Browser;

/** Polls `read` until `done` holds of its answer; fails after `ms`. */
async function eventually<T>(read: () => Promise<T>, done: (value: T) => boolean, ms = 3_000): Promise<T> {
  const deadline = Date.now() + ms;
  for (;;) {
    const value = await read();
    if (done(value)) return value;
    if (Date.now() > deadline) throw new Error(`still not changed after ${ms} ms: ${JSON.stringify(value).slice(0, 300)}`);
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
}

const list = async () => (await technician.get(`/api/orgs/${orgId}/tests`).expect(200)).body as TestSummary[];
const detail = async () => (await technician.get(`/api/orgs/${orgId}/tests/${test.testId}`).expect(200)).body as TestDetail;
const ours = (tests: TestSummary[]) => tests.find((t) => t.id === test.testId) as TestSummary;

beforeAll(async () => {
  await readCache().start();
  expect(readCache().active).toBe(true);
  outside = new pg.Client({ connectionString: databaseUrl() });
  await outside.connect();
  const admin = await signUpAdmin(app, 'kept-admin');
  orgId = admin.orgId;
  const tech = await createMember(orgId, 'technician', 'kept-tech');
  technicianId = tech.userId;
  technician = await signedInBrowser(app, tech.email);
  test = await draftTest(orgId, technicianId);
  const theirs = await signUpAdmin(app, 'kept-other');
  other = { orgId: theirs.orgId, test: await draftTest(theirs.orgId, (await createMember(theirs.orgId, 'technician', 'kept-other-tech')).userId) };
});

afterAll(async () => {
  await readCache().stop();
  await outside.end();
});

describe('reads kept until the database notices a change', () => {
  it('when the list and a test are read again without a change, then the second reads come from memory', async () => {
    const first = ours(await list());
    await detail();
    const before = { ...readCache().counts };
    expect(ours(await list())).toEqual(first);
    expect((await detail()).id).toBe(test.testId);
    expect(readCache().counts.kept - before.kept).toBe(2);
    expect(readCache().counts.read - before.read).toBe(0);
  });

  it('when a test, its sample, borehole, project or technician change from another connection, then the next reads show it', async () => {
    await list();
    await outside.query('UPDATE consolidation_tests SET reference = $1 WHERE id = $2', ['KEPT-RENAMED', test.testId]);
    await eventually(list, (tests) => ours(tests).reference === 'KEPT-RENAMED');
    await eventually(detail, (d) => d.reference === 'KEPT-RENAMED');

    await outside.query('UPDATE samples SET top_depth_m = 7.25 WHERE id = $1', [test.sampleId]);
    await eventually(list, (tests) => ours(tests).topDepthM === 7.25);
    await outside.query(`UPDATE boreholes SET name = 'BH-KEPT' WHERE id = $1`, [test.boreholeId]);
    await eventually(list, (tests) => ours(tests).boreholeName === 'BH-KEPT');
    await outside.query(`UPDATE projects SET name = 'Kept project' WHERE id = $1`, [test.projectId]);
    await eventually(detail, (d) => d.projectName === 'Kept project');
    // A user's name lives outside any organisation; every organisation they belong to hears of it.
    await outside.query(`UPDATE users SET name = 'Renamed technician' WHERE id = $1`, [technicianId]);
    await eventually(list, (tests) => ours(tests).technicianName === 'Renamed technician');
  });

  it('when a job of the test is queued from another connection, then the test’s detail shows it', async () => {
    expect((await detail()).pendingJobId).toBeNull();
    const [job] = (await outside.query(
      `INSERT INTO job_runs (organisation_id, kind, state, test_id) VALUES ($1, 'analyse-test', 'queued', $2) RETURNING id`,
      [orgId, test.testId],
    )).rows as Array<{ id: string }>;
    await eventually(detail, (d) => d.pendingJobId === job?.id && d.latestAnalysisJob?.state === 'queued');
    await outside.query(`UPDATE job_runs SET state = 'failed', message = 'stopped by the test' WHERE id = $1`, [job?.id]);
    await eventually(detail, (d) => d.pendingJobId === null && d.latestAnalysisJob?.message === 'stopped by the test');
  });

  it('when another organisation’s rows change, then this one’s kept reads stay kept', async () => {
    await list();
    await outside.query(`UPDATE consolidation_tests SET reference = 'THEIRS-RENAMED' WHERE id = $1`, [other.test.testId]);
    // Let the notice arrive: the other organisation's own read must then be a fresh one.
    const cache = readCache();
    await eventually(async () => (await cache.read(other.orgId, 'probe', async () => Date.now(), () => 8)) !== 0, Boolean);
    const before = { ...cache.counts };
    await list();
    expect(cache.counts.kept - before.kept).toBe(1);
    expect(JSON.stringify(await list())).not.toContain('THEIRS-RENAMED');
  });
});

describe('the read cache on its own', () => {
  let cache: ReadCache;
  beforeAll(async () => {
    cache = new ReadCache({ maxBytes: 10_000, maxAgeMs: 60_000 });
    await cache.start();
  });
  afterAll(() => cache.stop());

  it('when a change is noticed while a read is under way, then that read is not kept', async () => {
    let loads = 0;
    const load = async () => {
      loads += 1;
      if (loads === 1) {
        await dataSource.query('SELECT pg_notify($1, $2)', [READS_CHANNEL, 'org-racing']);
        await new Promise((resolve) => setTimeout(resolve, 200));
      }
      return `value ${loads}`;
    };
    expect(await cache.read('org-racing', 'k', load, () => 10)).toBe('value 1');
    expect(await cache.read('org-racing', 'k', load, () => 10)).toBe('value 2');
    expect(await cache.read('org-racing', 'k', load, () => 10)).toBe('value 2');
    expect(loads).toBe(2);
  });

  it('when a TRUNCATE-style notice for every organisation comes, then everything kept is read again', async () => {
    let loads = 0;
    const load = async () => ++loads;
    await cache.read('org-a', 'k', load, () => 10);
    await cache.read('org-b', 'k', load, () => 10);
    await dataSource.query('SELECT pg_notify($1, $2)', [READS_CHANNEL, '*']);
    await eventually(() => cache.read('org-a', 'k', load, () => 10), (value) => value > 2);
    expect(await cache.read('org-b', 'k', load, () => 10)).toBeGreaterThan(2);
  });

  it('when more is kept than the bound, then the least recently used go first', async () => {
    const load = (value: string) => async () => value;
    for (let i = 0; i < 5; i += 1) await cache.read('org-size', `k${i}`, load(`v${i}`), () => 2_400);
    // 5 × 2,400 bytes > 10,000: the first went. Reading it again loads it anew.
    expect(await cache.read('org-size', 'k0', load('fresh'), () => 2_400)).toBe('fresh');
    expect(await cache.read('org-size', 'k4', load('not this'), () => 2_400)).toBe('v4');
  });

  it('when the notices connection is cut, then nothing is kept until it listens again', async () => {
    const load = (value: string) => async () => value;
    await cache.read('org-cut', 'k', load('before'), () => 10);
    await dataSource.query(`SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE application_name = 'porestack read notices' AND pid <> pg_backend_pid()`);
    await eventually(async () => cache.active, (active) => !active);
    expect(await cache.read('org-cut', 'k', load('through 1'), () => 10)).toBe('through 1');
    expect(await cache.read('org-cut', 'k', load('through 2'), () => 10)).toBe('through 2');
    await eventually(async () => cache.active, Boolean, 6_000);
    expect(await cache.read('org-cut', 'k', load('after'), () => 10)).toBe('after');
    expect(await cache.read('org-cut', 'k', load('not read'), () => 10)).toBe('after');
  });
});
