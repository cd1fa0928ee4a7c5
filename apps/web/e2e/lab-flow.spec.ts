import { expect, test, type Browser, type Page } from '@playwright/test';
import { createHash } from 'node:crypto';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { downloadFrom } from './support/downloads';
import { linkFromMail } from './support/mail';
import { signIn } from './support/people';

// The whole lab flow on the seeded demo organisation, in the real API, worker, S3 fake and mail fake.
const PASSWORD = 'porestack-demo';
const TECHNICIAN = 'technician@demo.porestack.test';
const MANAGER = 'lab-manager@demo.porestack.test';
const DESIGNER = 'designer@demo.porestack.test';
const fixtures = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../../fixtures/readings');
const unique = Date.now().toString(36);

async function signedIn(browser: Browser, email: string): Promise<{ page: Page; orgId: string }> {
  const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
  const page = await context.newPage();
  await signIn(page, email, PASSWORD);
  await page.waitForURL(/\/orgs\/[^/]+/);
  const orgId = /\/orgs\/([^/?]+)/.exec(page.url())?.[1];
  if (!orgId) throw new Error(`After signing in ${email} the page is ${page.url()}.`);
  return { page, orgId };
}

async function newTest(page: Page, orgId: string, projectName: string, suffix: string): Promise<void> {
  await page.goto(`/orgs/${orgId}/projects`);
  await page.getByRole('link', { name: projectName }).click();
  const borehole = `BH-${suffix}`;
  await page.getByRole('button', { name: 'New borehole' }).click();
  await page.getByLabel('Borehole name').fill(borehole);
  await page.getByLabel('Water table depth (m)').fill('1.5');
  await page.getByRole('button', { name: 'Add borehole' }).click();
  const section = page.getByRole('region', { name: `Borehole ${borehole}` });
  await section.getByRole('button', { name: `New sample in ${borehole}` }).click();
  await section.getByLabel('Sample reference').fill(`U-${suffix}`);
  await section.getByLabel('Top depth (m)').fill('6.0');
  await section.getByLabel('Bottom depth (m)').fill('6.45');
  await section.getByRole('button', { name: 'Add sample' }).click();
  await section.getByRole('button', { name: `New test on U-${suffix}` }).click();
  await section.getByRole('button', { name: 'Create test' }).click();
  await expect(page.getByRole('heading', { level: 1, name: `Test U-${suffix}-OED` })).toBeVisible();
  // The analysis needs the specimen's dry mass; the ring, Gs and drainage came from the defaults.
  const setup = page.getByRole('form', { name: 'Specimen and apparatus' });
  await setup.getByLabel('Dry mass (g)').fill('110.4');
  await setup.getByLabel('Initial water content w0 (%)').fill('48');
  await setup.getByRole('button', { name: 'Save specimen and apparatus' }).click();
  await expect(page.getByText('Saved. Re-run the analysis to use the new values.')).toBeVisible();
}

async function openPart(page: Page, name: 'Set-up' | 'Readings' | 'Results' | 'Curves' | 'Review'): Promise<void> {
  await page.getByRole('navigation', { name: 'Parts of the test' }).getByRole('link', { name }).click();
  await expect(page.getByRole('navigation', { name: 'Parts of the test' }).getByRole('link', { name })).toHaveAttribute('aria-current', 'page');
}

async function waitForStatus(page: Page, word: string): Promise<void> {
  await expect(page.locator('h1 + div').getByText(word, { exact: true })).toBeVisible({ timeout: 45_000 });
}

test('a technician uploads, maps, overrides a pick and submits; a lab manager approves; the version and the e-mails appear', async ({ browser }) => {
  test.setTimeout(300_000);
  const manager = await signedIn(browser, MANAGER);
  const orgId = manager.orgId;
  const projectName = `Fennick Ridge Embankment ${unique}`;
  await manager.page.goto(`/orgs/${orgId}/projects`);
  await manager.page.getByRole('button', { name: 'New project' }).click();
  await manager.page.getByLabel('Project name').fill(projectName);
  await manager.page.getByLabel('Reference').fill(`HE-${unique}`);
  await manager.page.getByLabel('Client').fill('Fenwick Rail Partners');
  await manager.page.getByRole('button', { name: 'Create project' }).click();
  await expect(manager.page.getByRole('heading', { level: 1, name: projectName })).toBeVisible();
  // The demo designer is attached afterwards, through the edit form, to be told of new versions.
  await manager.page.getByRole('button', { name: 'Edit project and designers' }).click();
  await manager.page.getByRole('form', { name: 'Edit project' }).getByRole('checkbox', { name: new RegExp(DESIGNER.replace('.', '\\.')) }).check();
  await manager.page.getByRole('button', { name: 'Save project' }).click();
  await expect(manager.page.getByText(/designers: .+/)).toBeVisible();

  const tech = await signedIn(browser, TECHNICIAN);
  const page = tech.page;

  // The canonical CSV imports with no questions, with a real upload progress bar first.
  await newTest(page, orgId, projectName, `${unique}a`);
  const testUrl = page.url();
  await openPart(page, 'Readings');
  await page.getByLabel('Readings file to upload (CSV or XLSX)').setInputFiles(path.join(fixtures, 'canonical.csv'));
  await expect(page.getByText(/^ — \d+ readings in \d+ increments/)).toBeVisible({ timeout: 45_000 });
  await expect(page.getByRole('table', { name: 'Readings of this test' })).toBeVisible();
  await waitForStatus(page, 'Reduced');

  // Parameters with units, and the plots.
  await openPart(page, 'Results');
  await expect(page.getByRole('table', { name: 'Parameters of the whole test' })).toContainText('Cc');
  await expect(page.getByTestId('engineering-caution').first()).toBeVisible();
  await openPart(page, 'Curves');
  // plotly (4.6 MB) is fetched and parsed on first use: measured 7–21 s on this shared 2-core machine under load.
  await expect(page.locator('[data-testid="plotly-chart"] .main-svg').first()).toBeVisible({ timeout: 90_000 });
  await expect(page.getByText('Casagrande construction').first()).toBeVisible();
  await expect(page.getByText('Pacheco Silva construction').first()).toBeVisible();
  // One increment's √t and log t plots, fetched by increment.
  await expect(page.getByRole('img', { name: /deformation against square root of time/ }).locator('.main-svg').first()).toBeVisible({ timeout: 30_000 });
  await expect(page.getByRole('img', { name: /deformation against log time/ }).locator('.main-svg').first()).toBeVisible();

  // Override σ′p through the form; the reason is required.
  const form = page.getByRole('form', { name: 'Override picks' });
  await form.getByLabel('σ′p adopted (kPa)').fill('95');
  await form.getByRole('button', { name: 'Save picks and re-run the analysis' }).click();
  await expect(form.getByText(/Say why/)).toBeVisible();
  await form.getByLabel('Reason for the override').fill('The bend sits between the 80 and 160 kPa loads; adopted by eye.');
  await form.getByRole('button', { name: 'Save picks and re-run the analysis' }).click();
  await expect(page.getByText('The bend sits between the 80 and 160 kPa loads; adopted by eye.').first()).toBeVisible({ timeout: 45_000 });
  await openPart(page, 'Results');
  await expect(page.getByRole('table', { name: 'Parameters of the whole test' }).getByText('picked')).toBeVisible();

  // A logger XLSX in another layout needs the mapping step.
  await newTest(page, orgId, projectName, `${unique}b`);
  await openPart(page, 'Readings');
  await page.getByLabel('Readings file to upload (CSV or XLSX)').setInputFiles(path.join(fixtures, 'bench-logger.xlsx'));
  const mapping = page.getByRole('form', { name: "Map the file's columns" });
  await expect(mapping).toBeVisible({ timeout: 45_000 });
  await mapping.getByLabel('Increment column').selectOption('Stage');
  await mapping.getByLabel('Stress column').selectOption('Load (kgf/cm2)');
  await mapping.getByLabel('Time column').selectOption('Time (s)');
  await mapping.getByLabel('Deformation column', { exact: true }).selectOption('Dial (div)');
  await mapping.getByLabel('Stress unit').selectOption('kgfPerCm2');
  await mapping.getByLabel('Time unit').selectOption('s');
  await mapping.getByLabel('The deformation column holds').selectOption('dial');
  await mapping.getByLabel('Zero reading').fill('5000');
  await mapping.getByLabel('One division').fill('0.001');
  await mapping.getByLabel('Direction').selectOption('decreases');
  await mapping.getByLabel('Save as profile (optional)').fill(`Bench logger ${unique}`);
  await mapping.getByRole('button', { name: 'Import with this mapping' }).click();
  await expect(page.getByText(/^ — \d+ readings in \d+ increments/)).toBeVisible({ timeout: 45_000 });
  await expect(page.getByRole('table', { name: 'Readings of this test' })).toBeVisible();
  // The mapping was kept as a named profile of the organisation.
  const profiles = (await (await page.request.get(`/api/orgs/${orgId}/import-profiles`)).json()) as { name: string }[];
  expect(profiles.map((p) => p.name)).toContain(`Bench logger ${unique}`);

  // Back to the first test: submit it.
  await page.goto(`${testUrl.split('?')[0]}?section=review`);
  await page.getByRole('button', { name: /^Submit .* for review$/ }).click();
  await waitForStatus(page, 'Awaiting review');
  const testPath = new URL(testUrl).pathname;
  expect(await linkFromMail(MANAGER, testPath, 30_000)).toContain(testPath);

  // The lab manager approves from the queue and the test page.
  await manager.page.goto(`/orgs/${orgId}/review-queue`);
  await manager.page.getByRole('link', { name: `U-${unique}a-OED` }).click();
  await openPart(manager.page, 'Review');
  await manager.page.getByRole('button', { name: `Approve U-${unique}a-OED` }).click();
  await expect(manager.page.getByText(/approved\. A new soil record version/)).toBeVisible();
  expect(await linkFromMail(TECHNICIAN, testPath, 30_000)).toContain(testPath);

  // The version appears in the soil records.
  await manager.page.goto(`/orgs/${orgId}/soil-records`);
  await manager.page.getByRole('link', { name: `BH-${unique}a / U-${unique}a` }).click();
  await expect(manager.page.getByText('Version 1 is the current version of this record.')).toBeVisible();
  await expect(manager.page.getByRole('table', { name: 'Parameters of version 1' })).toContainText('95 kPa (picked)');
  const recordPath = new URL(manager.page.url()).pathname;

  // The worker prints the version's test report; the lab manager downloads it, twice the same file.
  const reportLink = manager.page.getByRole('link', { name: 'Download the test report (PDF)' });
  await expect(reportLink).toBeVisible({ timeout: 60_000 });
  const first = await downloadFrom(manager.page, reportLink);
  const second = await downloadFrom(manager.page, reportLink);
  expect(first.name).toBe(`oedometer-report-U-${unique}a-OED-v1.pdf`);
  expect(first.bytes.subarray(0, 5).toString()).toBe('%PDF-');
  const shown = await manager.page.getByTitle('Every download of this version is this same file.').textContent();
  expect(createHash('sha256').update(first.bytes).digest('hex')).toBe(shown);
  expect(second.bytes.equals(first.bytes)).toBe(true);

  // The project's designer is told, with a link to this record's version, and can read it.
  const designerLink = await linkFromMail(DESIGNER, recordPath, 30_000);
  expect(designerLink).toBe(`${recordPath}?version=1`);
  const designer = await signedIn(browser, DESIGNER);
  await designer.page.goto(designerLink);
  await expect(designer.page.getByRole('table', { name: 'Parameters of version 1' })).toContainText('95 kPa (picked)');
});
