import type { ReportSettings, ReportSettingsView } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { audit } from '../audit/audit.service.js';
import { DEFAULT_TEST_METHOD_STATEMENT } from '../reports/test-report/test-method.js';
import { OrganisationEntity } from './organisation.entity.js';

function toView(org: OrganisationEntity): ReportSettingsView {
  return {
    organisationName: org.name,
    address: org.reportAddress,
    testMethodStatement: org.testMethodStatement,
    defaultTestMethodStatement: DEFAULT_TEST_METHOD_STATEMENT,
  };
}

export async function getReportSettings(orgId: string): Promise<ReportSettingsView> {
  const org = await dataSource.getRepository(OrganisationEntity).findOneBy({ id: orgId });
  if (!org) throw new NotFoundError('organisation');
  return toView(org);
}

/** What later reports print about the laboratory; reports already issued keep what they printed. */
export async function updateReportSettings(orgId: string, settings: ReportSettings, actor: { id: string }): Promise<ReportSettingsView> {
  return dataSource.transaction(async (manager) => {
    const organisations = manager.getRepository(OrganisationEntity);
    const org = await organisations.findOneBy({ id: orgId });
    if (!org) throw new NotFoundError('organisation');
    const statement = settings.testMethodStatement === '' ? null : settings.testMethodStatement;
    await organisations.update({ id: orgId }, { reportAddress: settings.address, testMethodStatement: statement });
    await audit.record(
      {
        organisationId: orgId,
        actorUserId: actor.id,
        action: 'organisation.report_settings_changed',
        objectType: 'organisation',
        objectId: orgId,
        details: { from: { address: org.reportAddress, testMethodStatement: org.testMethodStatement }, to: { address: settings.address, testMethodStatement: statement } },
      },
      manager,
    );
    return toView({ ...org, reportAddress: settings.address, testMethodStatement: statement });
  });
}
