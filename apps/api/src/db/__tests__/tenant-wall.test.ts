import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../app.js';
import { dataSource } from '../../data-source.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../../testing/browser.js';
import { draftTest, type LabFixture } from '../../testing/lab-fixtures.js';
import { preparedQuery } from '../prepared.js';
import { runInTenant } from '../tenant-wall.js';

// PostgreSQL row-level security as the last wall between organisations: a query that forgets
// its `organisation_id = …` filter, run for one organisation, returns nothing of another.

const app = createApp();
let ours: { orgId: string; test: LabFixture; technician: Browser };
let theirs: { orgId: string; test: LabFixture };

async function labWithOneTest(label: string): Promise<{ orgId: string; test: LabFixture; technicianEmail: string }> {
  const { orgId } = await signUpAdmin(app, `${label}-admin`);
  const technician = await createMember(orgId, 'technician', `${label}-tech`);
  return { orgId, test: await draftTest(orgId, technician.userId), technicianEmail: technician.email };
}

beforeAll(async () => {
  const a = await labWithOneTest('wall-a');
  const b = await labWithOneTest('wall-b');
  ours = { orgId: a.orgId, test: a.test, technician: await signedInBrowser(app, a.technicianEmail) };
  theirs = { orgId: b.orgId, test: b.test };
});

/** Deliberately without any organisation filter: every test and project the connection may see. */
async function everyTestAndProject(): Promise<{ tests: string[]; projects: string[] }> {
  const tests = (await dataSource.query('SELECT id FROM consolidation_tests')) as Array<{ id: string }>;
  const projects = (await dataSource.query('SELECT id FROM projects')) as Array<{ id: string }>;
  return { tests: tests.map((r) => r.id), projects: projects.map((r) => r.id) };
}

describe('row-level security between organisations', () => {
  it('when an unfiltered query runs for one organisation, then it returns that organisation’s rows and none of another’s', async () => {
    const seen = await runInTenant(ours.orgId, everyTestAndProject);
    expect(seen.tests).toContain(ours.test.testId);
    expect(seen.projects).toContain(ours.test.projectId);
    expect(seen.tests).not.toContain(theirs.test.testId);
    expect(seen.projects).not.toContain(theirs.test.projectId);
    // The same query outside any organisation (sign-in, migrations, housekeeping) sees both.
    const all = await everyTestAndProject();
    expect(all.tests).toEqual(expect.arrayContaining([ours.test.testId, theirs.test.testId]));
  });

  it('when an unfiltered update or delete runs for one organisation, then another organisation’s rows are untouched', async () => {
    const before = (await dataSource.query('SELECT name FROM projects WHERE id = $1', [theirs.test.projectId])) as Array<{ name: string }>;
    await runInTenant(ours.orgId, () => dataSource.query(`UPDATE projects SET site_name = 'walled'`));
    await expect(runInTenant(ours.orgId, () => dataSource.query('DELETE FROM projects WHERE id = $1', [theirs.test.projectId]))).resolves.toBeDefined();
    const after = (await dataSource.query('SELECT name, site_name FROM projects WHERE id = $1', [theirs.test.projectId])) as Array<{ name: string; site_name: string }>;
    expect(after).toHaveLength(1);
    expect(after[0]?.name).toBe(before[0]?.name);
    expect(after[0]?.site_name).not.toBe('walled');
    const ourSite = (await dataSource.query('SELECT site_name FROM projects WHERE id = $1', [ours.test.projectId])) as Array<{ site_name: string }>;
    expect(ourSite[0]?.site_name).toBe('walled');
  });

  it('when a row of another organisation is written for one organisation, then PostgreSQL refuses it', async () => {
    await expect(
      runInTenant(ours.orgId, () =>
        dataSource.query(
          `INSERT INTO projects (organisation_id, name, reference, client_name, site_name, created_by_id) VALUES ($1, 'Planted', 'PL-1', 'Nobody', '', (SELECT id FROM users LIMIT 1))`,
          [theirs.orgId],
        ),
      ),
    ).rejects.toThrow(/row-level security/);
  });

  it('when work for two organisations interleaves on the pool, then each sees only its own rows', async () => {
    const rounds = await Promise.all(
      Array.from({ length: 20 }, (_, i) => {
        const org = i % 2 === 0 ? ours : theirs;
        return runInTenant(org.orgId, async () => ({ org, seen: await everyTestAndProject() }));
      }),
    );
    for (const { org, seen } of rounds) {
      const other = org === ours ? theirs : ours;
      expect(seen.tests).toContain(org.test.testId);
      expect(seen.tests).not.toContain(other.test.testId);
    }
  });

  it('when a request of one organisation is served, then the routes still answer within it, as before', async () => {
    const res = await ours.technician.get(`/api/orgs/${ours.orgId}/tests`).expect(200);
    expect(JSON.stringify(res.body)).toContain(ours.test.testId);
    await ours.technician.get(`/api/orgs/${theirs.orgId}/tests`).expect(404);
  });

  it('when the schema is read, then every table with an organisation_id has the wall and its policy', async () => {
    const tables = (await dataSource.query(
      `SELECT c.relname AS name, c.relrowsecurity AS enabled,
              EXISTS (SELECT 1 FROM pg_policies p WHERE p.schemaname = 'public' AND p.tablename = c.relname AND p.policyname = 'tenant_wall') AS policy
         FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
        WHERE n.nspname = 'public' AND c.relkind IN ('r', 'p')
          AND EXISTS (SELECT 1 FROM pg_attribute a WHERE a.attrelid = c.oid AND a.attname = 'organisation_id' AND NOT a.attisdropped)`,
    )) as Array<{ name: string; enabled: boolean; policy: boolean }>;
    // The lab's own tables are among them (a sample, not the list checked).
    expect(tables.map((t) => t.name)).toEqual(expect.arrayContaining(['projects', 'consolidation_tests', 'readings', 'soil_record_versions', 'memberships', 'audit_entries']));
    const unwalled = tables.filter((t) => !t.enabled || !t.policy).map((t) => t.name);
    expect(unwalled, 'tables with an organisation_id but no tenant wall (call porestack_add_tenant_wall in their migration)').toEqual([]);
  });

  it('when one prepared statement runs for one organisation, then another, then outside any, then each run sees only what its own setting allows', async () => {
    // The same text each time: the one statement, prepared once per pooled connection and its plan kept.
    const everyTest = async () => (await preparedQuery<{ id: string }>('SELECT id FROM consolidation_tests WHERE $1::int = 1', [1])).map((r) => r.id);
    for (let round = 0; round < 8; round += 1) {
      const [forUs, forThem] = await Promise.all([runInTenant(ours.orgId, everyTest), runInTenant(theirs.orgId, everyTest)]);
      expect(forUs).toContain(ours.test.testId);
      expect(forUs).not.toContain(theirs.test.testId);
      expect(forThem).toContain(theirs.test.testId);
      expect(forThem).not.toContain(ours.test.testId);
    }
    expect(await everyTest()).toEqual(expect.arrayContaining([ours.test.testId, theirs.test.testId]));
  });

  it('when a prepared statement fails in PostgreSQL, then the error comes back and its connection serves the next query', async () => {
    await expect(runInTenant(ours.orgId, () => preparedQuery('SELECT 1 / $1::int AS x', [0]))).rejects.toThrow(/division by zero/);
    const again = await runInTenant(ours.orgId, () => preparedQuery<{ x: number }>('SELECT 1 / $1::int AS x', [1]));
    expect(again).toEqual([{ x: 1 }]);
  });
});
