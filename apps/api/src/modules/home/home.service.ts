import { ROLES, TEST_STATUSES, type HomeOverview, type Role, type TestStatus, type WaitingTest } from '@porestack/types';
import type { TenantContext } from '../../http/request-context.js';
import { audit } from '../audit/audit.service.js';
import { listPendingInvitations } from '../invitations/invitations.service.js';
import { viewerOf, type Viewer } from '../projects/project-scope.js';
import { listProjects } from '../projects/projects.service.js';
import { reviewQueue } from '../reviews/reviews.service.js';
import { memberCounts, memberTotal, placedProjectIds, recentApprovals, stuckTests, technicianTests, type TechnicianTest } from './home-queries.js';

/** Most urgent first: a failure to deal with, the manager's request, then what is ready to send on, then what still needs readings. */
const URGENCY: Record<WaitingTest['reason'], number> = { analysis_failed: 0, import_failed: 0, changes_requested: 1, ready_to_submit: 2, needs_readings: 3 };

/** Why this test waits on its technician, or null when it does not (it is with the manager, approved, or being analysed). */
function waitingReason(test: TechnicianTest): Pick<WaitingTest, 'reason' | 'detail'> | null {
  if (test.lastJob?.state === 'failed' && test.status !== 'approved' && test.status !== 'submitted') {
    return { reason: test.lastJob.kind === 'import-readings' ? 'import_failed' : 'analysis_failed', detail: test.lastJob.message };
  }
  if (test.status === 'changes_requested') return { reason: 'changes_requested', detail: test.lastChangeRequest };
  if (test.status === 'analysed') return { reason: 'ready_to_submit', detail: null };
  if (test.status === 'draft') return { reason: 'needs_readings', detail: null };
  return null;
}

async function technicianSection(viewer: Viewer): Promise<NonNullable<HomeOverview['technician']>> {
  const tests = await technicianTests(viewer.orgId, viewer.userId);
  const countsByStatus = Object.fromEntries(TEST_STATUSES.map((status) => [status, 0])) as Record<TestStatus, number>;
  for (const test of tests) countsByStatus[test.status] += 1;
  const waiting = tests
    .map((test) => {
      const why = waitingReason(test);
      if (!why) return null;
      const { lastJob: _job, lastChangeRequest: _comment, ...shown } = test;
      return { ...shown, ...why };
    })
    .filter((test): test is WaitingTest => test !== null)
    .sort((a, b) => URGENCY[a.reason] - URGENCY[b.reason]);
  return { countsByStatus, waiting };
}

async function countMembers(orgId: string): Promise<Record<Role, number>> {
  const counts = Object.fromEntries(ROLES.map((role) => [role, 0])) as Record<Role, number>;
  for (const { role, count } of await memberCounts(orgId)) counts[role as Role] = count;
  return counts;
}

/** The projects the member is on as a designer or as a client (a lab member holding that role too is listed on theirs). */
async function placedProjects(viewer: Viewer, place: 'designer' | 'client') {
  const ids = new Set(await placedProjectIds(viewer.orgId, viewer.userId, place));
  return (await listProjects(viewer)).filter((project) => ids.has(project.id));
}

/**
 * What the member's home page shows: a section for each role they hold, each from the data that
 * role may read (clients and designers through their project scope).
 */
export async function homeOverview(tenant: TenantContext, userId: string): Promise<HomeOverview> {
  const roles = new Set<Role>(tenant.roles);
  const viewer = await viewerOf(tenant, userId);
  const orgId = tenant.orgId;
  const clientProjects = roles.has('client') ? await placedProjects(viewer, 'client') : [];
  return {
    technician: roles.has('technician') ? await technicianSection(viewer) : null,
    labManager: roles.has('lab_manager')
      ? {
          reviewQueue: await reviewQueue(orgId),
          recentApprovals: await recentApprovals(orgId, null, { limit: 8, currentOnly: false }),
          stuckTests: await stuckTests(orgId, 20),
        }
      : null,
    designer: roles.has('designer') ? { projects: await placedProjects(viewer, 'designer') } : null,
    client: roles.has('client')
      ? { projects: clientProjects, recentResults: await recentApprovals(orgId, clientProjects.map((p) => p.id), { limit: 10, currentOnly: true }) }
      : null,
    admin: roles.has('admin')
      ? {
          memberCounts: await countMembers(orgId),
          memberTotal: await memberTotal(orgId),
          pendingInvitations: await listPendingInvitations(orgId),
          recentActivity: await audit.list(orgId, 8),
        }
      : null,
  };
}
