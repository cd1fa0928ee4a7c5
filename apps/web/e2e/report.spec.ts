import { createHash } from 'node:crypto';
import { expect, test } from '@playwright/test';
import { downloadFrom } from './support/downloads';
import { signIn } from './support/people';

// The seeded demo laboratory: PLM-OED-03 (BH02 / U1) waits in the review queue, run by the technician.
const MANAGER = 'lab-manager@demo.porestack.test';

test('a lab manager approves a test, and its printed report is downloaded, the same file each time, with the reduced data', async ({ page }) => {
  test.setTimeout(150_000);
  await page.setViewportSize({ width: 1400, height: 900 });
  await signIn(page, MANAGER, 'porestack-demo');
  await page.waitForURL(/\/orgs\/[^/]+/);
  const orgId = /\/orgs\/([^/?]+)/.exec(page.url())?.[1] ?? '';

  await page.goto(`/orgs/${orgId}/review-queue`);
  await page.getByRole('link', { name: 'PLM-OED-03' }).click();
  await page.getByRole('navigation', { name: 'Parts of the test' }).getByRole('link', { name: 'Review' }).click();
  await page.getByRole('button', { name: 'Approve PLM-OED-03' }).click();
  await expect(page.getByText(/approved\. A new soil record version/)).toBeVisible({ timeout: 20_000 });

  await page.goto(`/orgs/${orgId}/soil-records`);
  await page.getByRole('link', { name: 'BH02 / U1' }).click();
  await expect(page.getByText('Version 1 is the current version of this record.')).toBeVisible();
  // The worker prints it after the approval; the page follows the report's state.
  const reportLink = page.getByRole('link', { name: 'Download the test report (PDF)' });
  await expect(reportLink).toBeVisible({ timeout: 90_000 });
  const first = await downloadFrom(page, reportLink);
  const second = await downloadFrom(page, reportLink);
  expect(first.name).toBe('oedometer-report-PLM-OED-03-v1.pdf');
  expect(first.bytes.subarray(0, 5).toString()).toBe('%PDF-');
  expect(second.bytes.equals(first.bytes)).toBe(true);
  const shown = await page.getByTitle('Every download of this version is this same file.').textContent();
  expect(createHash('sha256').update(first.bytes).digest('hex')).toBe(shown);

  const data = await downloadFrom(page, page.getByRole('link', { name: 'Reduced data (XLSX)' }));
  expect(data.name).toBe('reduced-data-PLM-OED-03-v1.xlsx');
  // An XLSX file is a zip archive.
  expect(data.bytes.subarray(0, 2).toString()).toBe('PK');
});
