import { expect, type Browser, type Page } from '@playwright/test';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { signIn } from './people';

// The seeded demo organisation's people and the committed sample files, for the lab flows.
export const DEMO_PASSWORD = 'porestack-demo';
export const TECHNICIAN = 'technician@demo.porestack.test';
export const MANAGER = 'lab-manager@demo.porestack.test';
export const DESIGNER = 'designer@demo.porestack.test';
export const FIXTURES = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../../../fixtures/readings');

export async function signedIn(browser: Browser, email: string): Promise<{ page: Page; orgId: string }> {
  const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
  const page = await context.newPage();
  await signIn(page, email, DEMO_PASSWORD);
  await page.waitForURL(/\/orgs\/[^/]+/);
  const orgId = /\/orgs\/([^/?]+)/.exec(page.url())?.[1];
  if (!orgId) throw new Error(`After signing in ${email} the page is ${page.url()}.`);
  return { page, orgId };
}

/** The specimen as the Set-up form takes it; without one the analysis gets the form's defaults and a dry mass. */
export type SpecimenEntry = { initialHeightMm: number; diameterMm: number; specificGravity: number; dryMassG: number };

/** Borehole → sample → test in a project, through the forms; the specimen typed into Set-up. */
export async function newTest(page: Page, orgId: string, projectName: string, suffix: string, specimen?: SpecimenEntry): Promise<void> {
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
  const setup = page.getByRole('form', { name: 'Specimen and apparatus' });
  if (specimen) {
    await setup.getByLabel('Initial height H0 (mm)').fill(String(specimen.initialHeightMm));
    await setup.getByLabel('Diameter (mm)').fill(String(specimen.diameterMm));
    await setup.getByLabel('Specific gravity Gs').fill(String(specimen.specificGravity));
    await setup.getByLabel('Dry mass (g)').fill(String(specimen.dryMassG));
  } else {
    // The analysis needs the specimen's dry mass; the ring, Gs and drainage came from the defaults.
    await setup.getByLabel('Dry mass (g)').fill('110.4');
    await setup.getByLabel('Initial water content w0 (%)').fill('48');
  }
  await setup.getByRole('button', { name: 'Save specimen and apparatus' }).click();
  await expect(page.getByText('Saved. Re-run the analysis to use the new values.')).toBeVisible();
}

export async function openPart(page: Page, name: 'Set-up' | 'Readings' | 'Results' | 'Curves' | 'Review'): Promise<void> {
  await page.getByRole('navigation', { name: 'Parts of the test' }).getByRole('link', { name }).click();
  await expect(page.getByRole('navigation', { name: 'Parts of the test' }).getByRole('link', { name })).toHaveAttribute('aria-current', 'page');
}

export async function waitForStatus(page: Page, word: string): Promise<void> {
  await expect(page.locator('h1 + div').getByText(word, { exact: true })).toBeVisible({ timeout: 45_000 });
}

/** A project made by the lab manager, for the technician's tests. */
export async function newProject(page: Page, orgId: string, name: string, reference: string): Promise<void> {
  await page.goto(`/orgs/${orgId}/projects`);
  await page.getByRole('button', { name: 'New project' }).click();
  await page.getByLabel('Project name').fill(name);
  await page.getByLabel('Reference').fill(reference);
  await page.getByLabel('Client').fill('Harrowgate Civil Works');
  await page.getByRole('button', { name: 'Create project' }).click();
  await expect(page.getByRole('heading', { level: 1, name })).toBeVisible();
}
