import { expect, test, type Page } from '@playwright/test';
import { linkFromMail } from './support/mail';
import { newPerson, signIn, signUp } from './support/people';

// Writes a PNG of every page to apps/web/screenshots/ for a visual check by a person.
// Runs only with SCREENSHOTS=1 (see testIgnore in playwright.config.ts).

const shot = (page: Page, name: string) => page.screenshot({ path: `screenshots/${name}.png`, fullPage: true });

test('screenshots of every page', async ({ page, browser }) => {
  test.setTimeout(90_000);
  await page.setViewportSize({ width: 1280, height: 800 });
  await page.goto('/sign-in');
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
  await shot(page, 'sign-in');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await shot(page, 'sign-in-errors');

  await page.goto('/sign-up');
  await page.getByRole('button', { name: 'Create account' }).click();
  await shot(page, 'sign-up-errors');

  await page.goto('/forgot-password');
  await shot(page, 'forgot-password');
  await page.goto('/reset-password?token=abc');
  await shot(page, 'reset-password');
  await page.goto('/invitations/not-a-real-token-123');
  await expect(page.getByRole('alert')).toBeVisible();
  await shot(page, 'invitation-invalid');
  await page.goto('/no-such-page');
  await shot(page, 'not-found');

  const admin = newPerson('admin');
  const orgId = await signUp(page, admin);
  await shot(page, 'org-home-admin');
  await page.getByRole('button', { name: admin.name }).click();
  await shot(page, 'user-menu');
  await page.keyboard.press('Escape');

  await page.goto(`/orgs/${orgId}/members`);
  const inviteForm = page.getByRole('form', { name: 'Invite a colleague' });
  const invitee = newPerson('technician');
  await inviteForm.getByLabel('E-mail address').fill(invitee.email);
  await inviteForm.getByRole('button', { name: 'Send invitation' }).click();
  await expect(page.getByText(`Invitation sent to ${invitee.email}`)).toBeVisible();
  for (const role of ['Designer', 'Lab manager']) {
    await inviteForm.getByLabel('E-mail address').fill(newPerson(role.toLowerCase().replace(' ', '-')).email);
    await inviteForm.getByRole('checkbox', { name: 'Technician' }).uncheck();
    await inviteForm.getByRole('checkbox', { name: role }).check();
    await inviteForm.getByRole('button', { name: 'Send invitation' }).click();
  }
  await inviteForm.getByLabel('E-mail address').fill('broken');
  await inviteForm.getByRole('button', { name: 'Send invitation' }).click();
  await shot(page, 'members');
  await page.getByRole('button', { name: /^Revoke the invitation/ }).first().click();
  await shot(page, 'confirm-dialog');
  await page.keyboard.press('Escape');

  const link = await linkFromMail(invitee.email, '/invitations/');
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  const other = await context.newPage();
  await other.goto(link);
  await expect(other.getByRole('heading', { name: /^Join/ })).toBeVisible();
  await shot(other, 'invitation-accept');
  await other.getByLabel('Your name').fill(invitee.name);
  await other.getByLabel('Choose a password').fill(invitee.password);
  await other.getByRole('button', { name: /^Join/ }).click();
  await expect(other.getByRole('heading', { level: 1, name: admin.organisationName, exact: true })).toBeVisible();
  await shot(other, 'org-home-technician');
  await other.goto(`/orgs/${orgId}/members`);
  await shot(other, 'not-allowed');
  await context.close();

  await page.goto(`/orgs/${orgId}/members`);
  await expect(page.getByRole('cell', { name: invitee.email, exact: true })).toBeVisible();
  await shot(page, 'members-after-accept');
  // A one-person lab: the only administrator takes the lab manager role as well.
  await page.getByRole('group', { name: `Roles of ${admin.name}` }).getByRole('checkbox', { name: 'Lab manager' }).check();
  await expect(page.getByRole('navigation', { name: 'Organisation' }).getByRole('link', { name: 'Review queue' })).toBeVisible();
  await shot(page, 'members-two-roles');
  await page.goto(`/orgs/${orgId}`);
  await expect(page.getByRole('heading', { name: 'What your roles cover' })).toBeVisible();
  await shot(page, 'org-home-two-roles');
  await page.goto(`/orgs/${orgId}/activity`);
  await expect(page.getByRole('heading', { level: 1, name: 'Activity' })).toBeVisible();
  await shot(page, 'activity');
  await page.goto(`/orgs/${orgId}/nothing-here`);
  await shot(page, 'not-found-in-org');
  await page.goto(`/orgs/00000000-0000-4000-8000-000000000000`);
  await shot(page, 'other-organisation');

  await page.setViewportSize({ width: 390, height: 800 });
  await page.goto(`/orgs/${orgId}/members`);
  await expect(page.getByRole('heading', { level: 1, name: 'Members' })).toBeVisible();
  await shot(page, 'members-narrow');
  await page.goto(`/orgs/${orgId}`);
  await shot(page, 'org-home-two-roles-narrow');
});

/** The lab pages, on the demo organisation's lab (whatever tests it holds in each status). */
test('screenshots of the lab pages', async ({ browser }) => {
  test.setTimeout(120_000);
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  const page = await context.newPage();
  await signIn(page, 'lab-manager@demo.porestack.test', 'porestack-demo');
  await page.waitForURL(/\/orgs\/[^/]+/);
  const orgId = /\/orgs\/([^/?]+)/.exec(page.url())?.[1] ?? '';

  await page.goto(`/orgs/${orgId}/projects`);
  await expect(page.getByRole('table', { name: 'Projects' }).or(page.getByText('No projects yet'))).toBeVisible();
  await shot(page, 'lab-projects');
  await page.getByRole('button', { name: 'New project' }).click();
  await shot(page, 'lab-project-new');

  await page.goto(`/orgs/${orgId}/tests`);
  await expect(page.getByRole('table', { name: 'Consolidation tests' })).toBeVisible();
  await shot(page, 'lab-tests');

  // An analysed (or later) test shows every part of the test page.
  await page.getByLabel('Status').selectOption('analysed');
  await page.getByRole('table', { name: 'Consolidation tests' }).getByRole('link').first().click();
  await expect(page.getByRole('heading', { level: 1, name: /^Test / })).toBeVisible();
  const projectLink = page.getByRole('link', { name: /^← / });
  const parts = page.getByRole('navigation', { name: 'Parts of the test' });
  await shot(page, 'lab-test-setup');
  await parts.getByRole('link', { name: 'Readings' }).click();
  await expect(page.getByRole('table', { name: 'Readings of this test' })).toBeVisible();
  await shot(page, 'lab-test-readings');
  await parts.getByRole('link', { name: 'Results' }).click();
  await expect(page.getByRole('table', { name: 'Parameters of the whole test' })).toBeVisible();
  await shot(page, 'lab-test-results');
  await parts.getByRole('link', { name: 'Curves' }).click();
  await expect(page.locator('[data-testid="plotly-chart"] .main-svg').first()).toBeVisible({ timeout: 30_000 });
  await expect(page.locator('[data-testid="plotly-chart"]:not(:has(.main-svg))')).toHaveCount(0, { timeout: 30_000 });
  await page.waitForTimeout(500);
  await shot(page, 'lab-test-curves');
  await parts.getByRole('link', { name: 'Review' }).click();
  await shot(page, 'lab-test-review');

  await projectLink.click();
  await expect(page.getByRole('heading', { name: 'Boreholes, samples and tests' })).toBeVisible();
  await shot(page, 'lab-project');

  await page.goto(`/orgs/${orgId}/review-queue`);
  await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
  await page.waitForLoadState('networkidle');
  await shot(page, 'lab-review-queue');

  await page.goto(`/orgs/${orgId}/soil-records`);
  await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
  await page.waitForLoadState('networkidle');
  await shot(page, 'lab-soil-records');
  const record = page.getByRole('table').getByRole('link').first();
  let recordUrl = '';
  if (await record.count()) {
    await record.click();
    await expect(page.getByRole('navigation', { name: 'Versions' })).toBeVisible();
    // The seeded approvals' reports are printed by the worker after the seed.
    await expect(page.getByRole('link', { name: 'Download the test report (PDF)' })).toBeVisible({ timeout: 60_000 });
    recordUrl = page.url();
    await shot(page, 'lab-soil-record');
  }

  await page.setViewportSize({ width: 390, height: 800 });
  await page.goto(`/orgs/${orgId}/tests`);
  await expect(page.getByRole('table', { name: 'Consolidation tests' })).toBeVisible();
  await shot(page, 'lab-tests-narrow');
  if (recordUrl) {
    await page.goto(recordUrl);
    await expect(page.getByRole('link', { name: 'Download the test report (PDF)' })).toBeVisible();
    await shot(page, 'lab-soil-record-narrow');
  }
  await context.close();
});

/** Every role's home page, the client's pages and the sharing panel, wide and at 390 px, on the demo lab. */
test('screenshots of the home pages and the client pages', async ({ browser }) => {
  test.setTimeout(300_000);
  const demo = (role: string) => `${role}@demo.porestack.test`;
  for (const [role, email] of [
    ['admin', demo('admin')],
    ['technician', demo('technician')],
    ['lab-manager', demo('lab-manager')],
    ['designer', demo('designer')],
    ['client', demo('client')],
  ] as const) {
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page = await context.newPage();
    await signIn(page, email, 'porestack-demo');
    await page.waitForURL(/\/orgs\/[^/]+/);
    const orgId = /\/orgs\/([^/?]+)/.exec(page.url())?.[1] ?? '';
    await expect(page.getByRole('heading', { level: 2 }).first()).toBeVisible();
    for (const width of [1280, 390]) {
      await page.setViewportSize({ width, height: 800 });
      await page.goto(`/orgs/${orgId}`);
      await expect(page.getByRole('heading', { level: 2 }).first()).toBeVisible();
      await shot(page, `home-${role}-${width}`);
    }
    if (role === 'lab-manager' || role === 'client' || role === 'admin') {
      for (const width of [1280, 390]) {
        await page.setViewportSize({ width, height: 800 });
        await page.goto(`/orgs/${orgId}/projects`);
        await page.getByRole('link', { name: 'Saltmarsh Lane Pumping Station' }).click();
        await expect(page.getByRole('region', { name: 'Approved test results' }).getByRole('table')).toBeVisible();
        await shot(page, `project-${role}-${width}`);
      }
    }
    if (role === 'admin') {
      for (const width of [1280, 390]) {
        await page.setViewportSize({ width, height: 800 });
        await page.goto(`/orgs/${orgId}/activity`);
        await expect(page.getByRole('heading', { level: 1, name: 'Activity' })).toBeVisible();
        await shot(page, `activity-${width}`);
      }
    }
    if (role === 'client') {
      await page.goto(`/orgs/${orgId}/projects`);
      await shot(page, 'projects-client-1280');
      await page.getByRole('link', { name: 'Saltmarsh Lane Pumping Station' }).click();
      await page.getByRole('region', { name: 'Approved test results' }).getByRole('link', { name: 'PLM-OED-01' }).click();
      await expect(page.getByRole('heading', { level: 1, name: /^Test PLM-OED-01/ })).toBeVisible();
      const charts = page.getByRole('region', { name: 'Curves' }).getByTestId('plotly-chart');
      await expect(charts.locator('.main-svg').first()).toBeVisible({ timeout: 90_000 });
      await expect(page.locator('[data-testid="plotly-chart"]:not(:has(.main-svg))')).toHaveCount(0, { timeout: 30_000 });
      await shot(page, 'issued-test-client-1280');
      await page.setViewportSize({ width: 390, height: 800 });
      await page.waitForTimeout(1_000);
      await shot(page, 'issued-test-client-390');
      await page.screenshot({ path: 'screenshots/issued-test-client-390-top.png' });
    }
    await context.close();
  }
});
