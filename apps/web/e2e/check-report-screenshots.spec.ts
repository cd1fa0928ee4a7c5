import { writeFile } from 'node:fs/promises';
import { expect, test, type Page } from '@playwright/test';
import { signIn } from './support/people';

// PNGs of the settlement check's issue control and the client's list of issued checks, wide and
// at 390 px, and the issued PDF itself, for a person to look at (SCREENSHOTS=1 only).
const shot = (page: Page, name: string) => page.screenshot({ path: `screenshots/check-report-${name}.png`, fullPage: false });

test('screenshots of issuing a settlement check and its PDF summary', async ({ page, browser }) => {
  test.setTimeout(300_000);
  await page.setViewportSize({ width: 1400, height: 900 });
  await signIn(page, 'designer@demo.porestack.test', 'porestack-demo');
  await page.waitForURL(/\/orgs\/[^/]+/);
  await page.getByRole('link', { name: 'Projects' }).first().click();
  await page.getByRole('link', { name: 'Saltmarsh Lane Pumping Station' }).click();
  await page.getByRole('link', { name: 'Pump hall column bases' }).click();
  const control = page.getByRole('region', { name: /Issue of revision/ });
  await expect(control.getByRole('button', { name: /Issue revision/ })).toBeVisible({ timeout: 60_000 });
  await shot(page, 'not-issued');
  const checkUrl = page.url();
  await control.getByRole('button', { name: /Issue revision/ }).click();
  const pdfLink = control.getByRole('link', { name: 'Download the summary (PDF)' });
  await expect(pdfLink).toBeVisible({ timeout: 120_000 });
  await shot(page, 'issued');
  const pdf = await page.request.get((await pdfLink.getAttribute('href')) ?? '');
  expect(pdf.status()).toBe(200);
  await writeFile('screenshots/check-report-summary.pdf', await pdf.body());

  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto(checkUrl);
  await expect(pdfLink).toBeVisible({ timeout: 60_000 });
  await control.scrollIntoViewIfNeeded();
  await shot(page, 'issued-narrow');

  const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
  const client = await context.newPage();
  await signIn(client, 'client@demo.porestack.test', 'porestack-demo');
  await client.waitForURL(/\/orgs\/[^/]+/);
  await client.getByRole('link', { name: 'Projects' }).first().click();
  await client.getByRole('link', { name: 'Saltmarsh Lane Pumping Station' }).click();
  const issued = client.getByRole('region', { name: 'Issued settlement checks' });
  await expect(issued.getByRole('link', { name: 'Download the summary (PDF)' })).toBeVisible({ timeout: 60_000 });
  await issued.scrollIntoViewIfNeeded();
  await client.screenshot({ path: 'screenshots/check-report-client.png' });
  await client.setViewportSize({ width: 390, height: 844 });
  await issued.scrollIntoViewIfNeeded();
  await client.screenshot({ path: 'screenshots/check-report-client-narrow.png' });
  await context.close();
});
