import type { Role } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import { logger } from '../../http/logger.js';
import { publicLink, sendMail } from '../../mail/mailer.js';
import type { MailContent } from '../../mail/templates/layout.js';
import { changesRequestedMail, newSoilRecordVersionMail, testApprovedMail, testSubmittedMail } from '../../mail/templates/lab-workflow.mail.js';
import type { SoilRecordVersionEntity } from '../soil-records/soil-record-version.entity.js';

interface TestContext {
  orgId: string;
  testId: string;
  testReference: string;
  projectId: string;
  projectName: string;
  sampleLabel: string;
  technicianEmail: string;
  technicianName: string;
}

/** The names a mail needs about a test, read once after the change committed. */
export async function testContext(orgId: string, testId: string): Promise<TestContext> {
  const [row] = (await dataSource.query(
    `SELECT t.reference AS test_reference, p.id AS project_id, p.name AS project_name, s.reference AS sample_reference,
            s.top_depth_m, s.bottom_depth_m, b.name AS borehole_name, u.email AS technician_email, u.name AS technician_name
       FROM consolidation_tests t
       JOIN samples s ON s.id = t.sample_id
       JOIN boreholes b ON b.id = s.borehole_id
       JOIN projects p ON p.id = b.project_id
       JOIN users u ON u.id = t.technician_id
      WHERE t.organisation_id = $1 AND t.id = $2`,
    [orgId, testId],
  )) as Array<Record<string, string | number>>;
  if (!row) throw new Error(`test ${testId} vanished before its mail was sent`);
  return {
    orgId,
    testId,
    testReference: String(row['test_reference']),
    projectId: String(row['project_id']),
    projectName: String(row['project_name']),
    sampleLabel: `sample ${row['sample_reference']} (${row['borehole_name']}, ${Number(row['top_depth_m']).toFixed(2)}–${Number(row['bottom_depth_m']).toFixed(2)} m)`,
    technicianEmail: String(row['technician_email']),
    technicianName: String(row['technician_name']),
  };
}

/** A mail that cannot be sent must not undo the review step it reports: log and go on. */
async function deliver(to: string[], content: MailContent): Promise<void> {
  for (const address of new Set(to)) {
    try {
      await sendMail(address, content);
    } catch (error) {
      logger.error({ err: error, to: address, subject: content.subject }, 'lab workflow mail not sent');
    }
  }
}

const testUrl = (ctx: TestContext) => publicLink(`/orgs/${ctx.orgId}/tests/${ctx.testId}`);

export async function notifySubmitted(ctx: TestContext, warningCount: number): Promise<void> {
  const managers = (await dataSource.query(
    'SELECT u.email FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.organisation_id = $1 AND $2 = ANY(m.roles)',
    [ctx.orgId, 'lab_manager' satisfies Role],
  )) as Array<{ email: string }>;
  await deliver(
    managers.map((m) => m.email),
    testSubmittedMail({ ...ctx, url: `${testUrl(ctx)}?section=review`, technicianName: ctx.technicianName, warningCount }),
  );
}

export async function notifyChangesRequested(ctx: TestContext, reviewerName: string, comment: string): Promise<void> {
  await deliver([ctx.technicianEmail], changesRequestedMail({ ...ctx, url: testUrl(ctx), reviewerName, comment }));
}

export async function notifyApproved(
  ctx: TestContext,
  reviewerName: string,
  comment: string | null,
  recordId: string,
  version: SoilRecordVersionEntity,
  supersedes: number | null,
): Promise<void> {
  await deliver([ctx.technicianEmail], testApprovedMail({ ...ctx, url: testUrl(ctx), reviewerName, version: version.version, comment }));
  const designers = (await dataSource.query(
    `SELECT u.email FROM project_members pm JOIN users u ON u.id = pm.user_id WHERE pm.organisation_id = $1 AND pm.project_id = $2`,
    [ctx.orgId, ctx.projectId],
  )) as Array<{ email: string }>;
  const format = (value: number | null, digits: number) => (value === null ? 'not determined' : value.toFixed(digits));
  const summary = `e0 ${format(version.initialVoidRatio, 3)}, Cc ${format(version.compressionIndex, 3)}, Cs ${format(version.swellIndex, 3)}, σ′p ${format(version.preconsolidationAdoptedKpa, 0)} kPa, OCR ${format(version.overconsolidationRatio, 2)}.`;
  await deliver(
    designers.map((d) => d.email),
    newSoilRecordVersionMail({
      ...ctx,
      url: publicLink(`/orgs/${ctx.orgId}/soil-records/${recordId}?version=${version.version}`),
      version: version.version,
      supersedes,
      summary,
    }),
  );
}
