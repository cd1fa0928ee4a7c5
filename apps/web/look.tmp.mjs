import { chromium } from '@playwright/test';
const base = 'http://127.0.0.1:3112';
const [, , email, ...paths] = process.argv;
const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu'] });
for (const width of [1280, 390]) {
  const page = await browser.newPage({ viewport: { width, height: 900 }, locale: 'en-GB' });
  await page.goto(`${base}/sign-in`);
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Password').fill('porestack-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/orgs\/[^/]+/);
  const orgId = /\/orgs\/([^/?]+)/.exec(page.url())[1];
  for (const p of paths) {
    const [name, rel] = p.split('=');
    await page.goto(`${base}/orgs/${orgId}${rel}`);
    await page.waitForTimeout(Number(process.env.WAIT ?? 2500));
    await page.screenshot({ path: `/tmp/clients-e2e/shots/${name}-${width}.png`, fullPage: true });
  }
  await page.close();
}
await browser.close();
