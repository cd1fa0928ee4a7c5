import { expect, test, type Browser, type Page } from '@playwright/test';
import { downloadFrom } from './support/downloads';
import { linkFromMail } from './support/mail';
import { newPerson, signIn, type Person } from './support/people';

// Sharing with clients on the seeded demo organisation: its project has two approved tests
// (PLM-OED-01, approved twice, and PLM-OED-02) and tests in every other status.
const PASSWORD = 'porestack-demo';
const MANAGER = 'lab-manager@demo.porestack.test';
const DEMO_PROJECT = 'Saltmarsh Lane Pumping Station';
const ORGANISATION = 'Pellowmere Demo Soil Laboratory';
const unique = Date.now().toString(36);

async function newPage(browser: Browser): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
  return context.newPage();
}

/** The lab manager shares the project open on `page` with `email` and sees the invitation go out. */
async function shareOpenProject(page: Page, email: string): Promise<void> {
  const panel = page.getByRole('region', { name: 'Shared with clients' });
  await panel.getByLabel('Client’s e-mail address').fill(email);
  await panel.getByRole('button', { name: 'Share project' }).click();
  await expect(panel.getByText(`${email} has no client account here yet, so they were invited by e-mail.`)).toBeVisible();
  await expect(panel.getByRole('list', { name: 'Clients of this project' })).toContainText(email);
}

/** The invitee opens the e-mailed link in a browser of their own and joins; returns their page on the organisation home. */
async function acceptInvitation(browser: Browser, person: Person): Promise<Page> {
  const link = await linkFromMail(person.email, '/invitations/');
  const page = await newPage(browser);
  await page.goto(link);
  await expect(page.getByText('Shared with you')).toBeVisible();
  await page.getByLabel('Your name').fill(person.name);
  await page.getByLabel('Choose a password').fill(person.password);
  await page.getByRole('button', { name: `Join ${ORGANISATION}` }).click();
  await expect(page.getByRole('heading', { level: 1, name: ORGANISATION, exact: true })).toBeVisible();
  return page;
}

test('a lab manager shares the project; the client joins from the e-mail, reads the project summary and a test summary; a client of another project sees none of it', async ({
  browser,
}) => {
  test.setTimeout(240_000);
  const manager = await newPage(browser);
  await signIn(manager, MANAGER, PASSWORD);
  await manager.waitForURL(/\/orgs\/[^/]+/);
  const orgId = /\/orgs\/([^/?]+)/.exec(manager.url())?.[1] ?? '';
  await manager.goto(`/orgs/${orgId}/projects`);
  await manager.getByRole('link', { name: DEMO_PROJECT }).click();
  const client = newPerson('client');
  await shareOpenProject(manager, client.email);

  // The client joins and lands on a home page of issued results.
  const page = await acceptInvitation(browser, client);
  const issued = page.getByRole('list', { name: 'Recently issued results' });
  await expect(issued.getByRole('link', { name: /^Test PLM-OED-01/ })).toBeVisible();
  await expect(issued.getByRole('link', { name: /^Test PLM-OED-02/ })).toBeVisible();
  await expect(page.getByText('Not yet in Porestack')).toHaveCount(0);

  // The project summary: words, the sortable and filterable table, boreholes; nothing to edit.
  await page.getByRole('navigation', { name: 'Organisation' }).getByRole('link', { name: 'Projects' }).click();
  await expect(page.getByRole('region', { name: 'Projects shared with you' }).getByRole('link')).toHaveText([DEMO_PROJECT]);
  await page.getByRole('link', { name: DEMO_PROJECT }).click();
  await expect(page.getByRole('heading', { level: 1, name: DEMO_PROJECT })).toBeVisible();
  await expect(page.getByRole('region', { name: 'In short' })).toContainText('The laboratory has approved 2 one-dimensional consolidation (oedometer) tests');
  const results = page.getByRole('region', { name: 'Approved test results' });
  const firstTest = results.locator('tbody tr').first().getByRole('link');
  const ccHeading = results.getByRole('columnheader', { name: 'Cc', exact: true });
  // Numbers sort largest first on the first click.
  await ccHeading.getByRole('button').click();
  await expect(ccHeading).toHaveAttribute('aria-sort', 'descending');
  await expect(firstTest).toHaveText('PLM-OED-01');
  await ccHeading.getByRole('button').click();
  await expect(ccHeading).toHaveAttribute('aria-sort', 'ascending');
  await expect(firstTest).toHaveText('PLM-OED-02');
  await results.getByLabel('Find').fill('U2');
  await expect(results.locator('tbody tr')).toHaveCount(1);
  await expect(results.getByText('1 of 2 tests')).toBeVisible();
  await results.getByLabel('Find').fill('');
  await expect(page.getByRole('region', { name: 'Borehole BH03' })).toContainText('no result yet');
  for (const control of ['New borehole', 'Edit project and designers', 'Share project', /^New sample/, /^New test/]) {
    await expect(page.getByRole('button', { name: control })).toHaveCount(0);
  }
  // Tests not approved are not named anywhere on the page.
  await expect(page.getByText('PLM-OED-03')).toHaveCount(0);
  await expect(page.getByText('PLM-OED-04')).toHaveCount(0);

  const projectUrl = page.url();

  // A test summary: specimen, parameters, both curves, quality in words, approval, the report area.
  await results.getByRole('link', { name: 'PLM-OED-01' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Test PLM-OED-01: BH01 / U1' })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Specimen before and after the test' })).toContainText('Void ratio e');
  await expect(page.getByRole('region', { name: 'Parameters' })).toContainText('Preconsolidation stress, adopted');
  await expect(page.getByRole('region', { name: 'Sample quality' })).toContainText('Δe/e0 =');
  await expect(page.getByRole('region', { name: 'Approval and traceability' })).toContainText('Priya Kestrelle');
  // The laboratory's issued PDF of this version: the worker printed it after the demo's approvals.
  const reportLink = page.getByRole('link', { name: 'Download the test report (PDF)' });
  await expect(reportLink).toBeVisible({ timeout: 120_000 });
  const report = await downloadFrom(page, reportLink);
  expect(report.name).toBe('oedometer-report-PLM-OED-01-v2.pdf');
  expect(report.bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  const reportPath = `/api/orgs/${orgId}/soil-records/${/soil-records\/([^/]+)/.exec(page.url())?.[1] ?? ''}/versions/2/report/pdf`;
  const curves = page.getByRole('region', { name: 'Curves' });
  await curves.scrollIntoViewIfNeeded();
  // plotly (4.6 MB) is fetched and parsed on first use: slow on a busy machine.
  await expect(curves.locator('[data-testid="plotly-chart"] .main-svg').first()).toBeVisible({ timeout: 90_000 });
  await expect(curves.getByTestId('plotly-chart')).toHaveCount(2);
  // The e–log σ′ plot's legend names the adopted σ′p (this version's was picked on review).
  await expect(curves.getByText(/σ′p (picked|adopted) \d+ kPa/)).toBeVisible();
  await expect(page.getByRole('button', { name: /approve|submit|save|upload|print|retry/i })).toHaveCount(0);

  // A client of another project: sees that project only, and none of the demo project's results.
  await manager.goto(`/orgs/${orgId}/projects`);
  await manager.getByRole('button', { name: 'New project' }).click();
  const otherProject = `Crossby Mill Yard ${unique}`;
  await manager.getByLabel('Project name').fill(otherProject);
  await manager.getByLabel('Reference').fill(`CM-${unique}`);
  await manager.getByLabel('Client').fill('Crossby Estates');
  await manager.getByRole('button', { name: 'Create project' }).click();
  await expect(manager.getByRole('heading', { level: 1, name: otherProject })).toBeVisible();
  const otherClient = newPerson('other-client');
  await shareOpenProject(manager, otherClient.email);
  const summaryUrl = page.url();

  const other = await acceptInvitation(browser, otherClient);
  await expect(other.getByText('No result has been issued on your projects yet.')).toBeVisible();
  await expect(other.getByRole('region', { name: 'Projects shared with you' }).getByRole('link')).toHaveText([otherProject]);
  await other.goto(projectUrl);
  await expect(other.getByRole('alert')).toContainText('could not be loaded');
  await expect(other.getByText('PLM-OED-01')).toHaveCount(0);
  await other.goto(summaryUrl);
  await expect(other.getByRole('alert')).toContainText('could not be loaded');
  await other.goto(`/orgs/${orgId}/soil-records`);
  await expect(other.getByText('PLM-OED-01')).toHaveCount(0);
  // Nor its report, asked for directly with the other client's session.
  expect((await other.request.get(reportPath)).status()).toBe(404);
  expect((await page.request.get(reportPath)).status()).toBe(200);
});
