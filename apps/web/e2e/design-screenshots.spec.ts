import { expect, test, type Page } from '@playwright/test';
import { signIn } from './support/people';

// PNGs of the design pages, wide and at 390 px, for a person to look at (SCREENSHOTS=1 only):
// the seeded demo project's ground model, characteristic set and pump hall check.
const shot = (page: Page, name: string) => page.screenshot({ path: `screenshots/design-${name}.png`, fullPage: true });

/** Every plotly chart on the page has drawn (its SVG is in place), not just started loading. */
async function waitForPlots(page: Page): Promise<void> {
  await expect(page.getByTestId('plotly-chart').first()).toBeAttached({ timeout: 60_000 });
  await expect(page.getByText('Loading the plot…')).toHaveCount(0, { timeout: 60_000 });
  const charts = page.getByTestId('plotly-chart');
  for (let i = 0; i < (await charts.count()); i += 1) await expect(charts.nth(i).locator('.main-svg').first()).toBeAttached({ timeout: 60_000 });
}

test('screenshots of the design pages', async ({ page }) => {
  test.setTimeout(600_000);
  await page.setViewportSize({ width: 1400, height: 900 });
  await signIn(page, 'designer@demo.porestack.test', 'porestack-demo');
  await page.waitForURL(/\/orgs\/[^/]+/);
  await page.getByRole('link', { name: 'Projects' }).first().click();
  await page.getByRole('link', { name: 'Saltmarsh Lane Pumping Station' }).click();
  await expect(page.getByRole('region', { name: 'Design' })).toBeVisible();
  await expect(page.getByRole('link', { name: 'Pump hall column bases' })).toBeVisible();
  await shot(page, 'project');
  const projectUrl = page.url();

  await page.getByRole('link', { name: 'Saltmarsh Lane site model' }).click();
  await waitForPlots(page);
  await shot(page, 'ground-model');

  await page.goto(projectUrl);
  await page.getByRole('link', { name: 'Soft to firm grey clay' }).click();
  await expect(page.getByRole('table', { name: 'Statistics of each parameter and the value adopted' })).toBeVisible({ timeout: 60_000 });
  await waitForPlots(page);
  await shot(page, 'characteristic-set');

  await page.goto(projectUrl);
  await page.getByRole('link', { name: 'Pump hall column bases' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Pump hall column bases' })).toBeVisible();
  await waitForPlots(page);
  await shot(page, 'check-results');
  const checkUrl = page.url();
  const trace = page.getByRole('region', { name: 'Layers used' }).getByRole('button').first();
  await trace.click();
  await expect(page.getByRole('dialog', { name: 'Where this value came from' })).toBeVisible();
  await page.getByRole('dialog', { name: 'Where this value came from' }).scrollIntoViewIfNeeded();
  await page.screenshot({ path: 'screenshots/design-trace-popover.png' });
  await page.keyboard.press('Escape');

  for (const tab of ['Schedule', 'Options', 'Sizing', 'Revisions']) {
    await page.getByRole('navigation', { name: 'Parts of the check' }).getByRole('button', { name: tab }).click();
    await page.waitForTimeout(300);
    await shot(page, `check-${tab.toLowerCase()}`);
  }

  await page.goto(`${projectUrl}/ground-models/new`);
  await shot(page, 'ground-model-new');

  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto(projectUrl);
  await shot(page, 'project-narrow');
  await page.goto(checkUrl);
  await waitForPlots(page);
  await shot(page, 'check-results-narrow');
  await page.goto(`${projectUrl}`);
  await page.getByRole('link', { name: 'Saltmarsh Lane site model' }).click();
  await waitForPlots(page);
  await shot(page, 'ground-model-narrow');
});
