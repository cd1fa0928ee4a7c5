import { expect, test, type Browser, type Locator, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { FIXTURES, MANAGER, newProject, newTest, openPart, signedIn, TECHNICIAN, waitForStatus, type SpecimenEntry } from './support/lab';

// Two of the generated logger layouts (fixtures/readings/layouts, with their truth) imported by
// clicking, on the seeded demo organisation: one whose every setting is guessed, one whose
// gauge direction is guessed wrong and corrected in the form.
const LAYOUTS = path.join(FIXTURES, 'layouts');
const truth = JSON.parse(readFileSync(path.join(LAYOUTS, 'truth.json'), 'utf8')) as Record<string, { specimen: SpecimenEntry; initialVoidRatio: number; compressionIndex: number }>;
const unique = Date.now().toString(36);

/** Cc as the Results table shows it, checked against the clay's chosen Cc within 1 %. */
async function expectCc(page: Page, expected: number): Promise<void> {
  await openPart(page, 'Results');
  const row = page.getByRole('table', { name: 'Parameters of the whole test' }).getByRole('row', { name: /Compression index/ });
  const shown = Number(((await row.getByRole('cell').nth(1).textContent()) ?? '').replace(/[^\d.]/g, ''));
  expect(Math.abs(shown / expected - 1)).toBeLessThan(0.01);
}

/** A project (by the lab manager) and a test with the layout's specimen typed in (by the technician), the file uploaded: the mapping form. */
async function uploadedLayout(browser: Browser, file: string, projectName: string, suffix: string): Promise<{ page: Page; mapping: Locator }> {
  const manager = await signedIn(browser, MANAGER);
  await newProject(manager.page, manager.orgId, projectName, `P-${suffix}`);
  const { page } = await signedIn(browser, TECHNICIAN);
  await newTest(page, manager.orgId, projectName, suffix, truth[file]?.specimen);
  await openPart(page, 'Readings');
  await page.getByLabel('Readings file to upload (CSV or XLSX)').setInputFiles(path.join(LAYOUTS, file));
  const mapping = page.getByRole('form', { name: "Map the file's columns" });
  await expect(mapping).toBeVisible({ timeout: 45_000 });
  return { page, mapping };
}

test('a technician imports a French logger file with a title above its names by confirming the guessed mapping, after trying another header row', async ({ browser }) => {
  test.setTimeout(150_000);
  const file = 'essai-hhmmss.csv';
  const { page, mapping } = await uploadedLayout(browser, file, `Quarry Lane Cutting ${unique}`, `${unique}f`);
  // Row 3 holds the names (a title and a blank line above); every setting is guessed.
  await expect(mapping.getByLabel('Row of the column names')).toHaveValue('3');
  await expect(mapping.getByLabel('Time column')).toHaveValue('Temps (hh:mm:ss)');
  await expect(mapping.getByLabel('Time written as')).toHaveValue('duration');
  await expect(mapping.getByLabel('Decimal separator')).toHaveValue(',');
  await expect(page.getByText('Every setting is guessed from the file')).toBeVisible();
  const firstIncrement = page.getByRole('table', { name: 'First increment as it will import' });
  await expect(firstIncrement).toContainText('0:00:06');

  // The title row as the names: the column lists follow at once, and nothing can be read.
  await page.getByRole('button', { name: 'Take the names from row 1', exact: true }).click();
  await expect(mapping.getByLabel('Row of the column names')).toHaveValue('1');
  await expect(mapping.getByLabel('Time column')).toHaveValue('');
  await expect(page.getByText(/settings? the file does not tell/)).toBeVisible();
  // Back to row 3 through the select: the guessed mapping comes back.
  await mapping.getByLabel('Row of the column names').selectOption('3');
  await expect(mapping.getByLabel('Time column')).toHaveValue('Temps (hh:mm:ss)');
  await expect(firstIncrement).toContainText('0:00:06');

  await mapping.getByRole('button', { name: 'Import with this mapping' }).click();
  await expect(page.getByText(/^ — 150 readings in 10 increments/)).toBeVisible({ timeout: 45_000 });
  await waitForStatus(page, 'Reduced');
  await expectCc(page, truth[file]?.compressionIndex ?? Number.NaN);
});

test('a technician corrects the one wrong guess (a gauge direction read from a swelling first load) and imports', async ({ browser }) => {
  test.setTimeout(150_000);
  const file = 'swelling-first-load.csv';
  const { page, mapping } = await uploadedLayout(browser, file, `Saltmarsh Relief Road ${unique}`, `${unique}s`);
  await expect(mapping.getByLabel('The deformation column holds')).toHaveValue('dial');
  await expect(mapping.getByLabel('One division')).toHaveValue('1');
  // The guess says "rises", from a first increment that swells: the trial shows the specimen compressing.
  await expect(mapping.getByLabel('Direction')).toHaveValue('increases');
  const firstIncrement = page.getByRole('table', { name: 'First increment as it will import' });
  await expect(firstIncrement).toBeVisible();
  await mapping.getByLabel('Direction').selectOption('decreases');
  // Read again with the correction: the first load now shows as the swelling it is.
  await expect(page.getByText('The specimen swells over this increment')).toBeVisible();
  await mapping.getByRole('button', { name: 'Import with this mapping' }).click();
  await expect(page.getByText(/^ — 11,000 readings in 10 increments/)).toBeVisible({ timeout: 60_000 });
  await expect(page.getByText('The imported deformations look wrong')).toHaveCount(0);
  await waitForStatus(page, 'Reduced');
  await expectCc(page, truth[file]?.compressionIndex ?? Number.NaN);
});
