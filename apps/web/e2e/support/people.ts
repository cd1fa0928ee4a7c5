import { expect, type Page } from '@playwright/test';
import { linkFromMail } from './mail';

/** A fresh, unique person per test run, so runs never collide in the shared database. */
export function newPerson(label: string) {
  const unique = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
  return {
    name: `${label[0]?.toUpperCase() ?? ''}${label.slice(1)} Tester ${unique}`,
    email: `${label}-${unique}@e2e.porestack.test`,
    password: `stiff-clay-${unique}`,
    organisationName: `Lowmoor Soil Lab ${unique}`,
  };
}
export type Person = ReturnType<typeof newPerson>;

/** Fills and sends the sign-up form; the account waits for the e-mailed link. */
export async function sendSignUp(page: Page, person: Person, organisationName = person.organisationName): Promise<void> {
  await page.goto('/sign-up');
  await page.getByLabel('Your name').fill(person.name);
  await page.getByLabel('E-mail address').fill(person.email);
  await page.getByLabel('Password').fill(person.password);
  await page.getByLabel('Organisation name').fill(organisationName);
  await page.getByRole('button', { name: 'Create account' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Check your inbox' })).toContainText(`We sent a link to ${person.email}.`);
}

/**
 * Signs a new person up through the form and the e-mailed link, and waits for their
 * organisation home. Returns its id.
 */
export async function signUp(page: Page, person: Person): Promise<string> {
  await sendSignUp(page, person);
  await page.goto(await linkFromMail(person.email, '/finish-sign-up'));
  await page.getByRole('button', { name: 'Create my account' }).click();
  await expect(page.getByRole('heading', { level: 1, name: person.organisationName })).toBeVisible();
  const orgId = /\/orgs\/([^/]+)/.exec(page.url())?.[1];
  if (!orgId) throw new Error(`After sign-up the page is ${page.url()}, not an organisation home.`);
  return orgId;
}

export async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

export async function signOut(page: Page, name: string): Promise<void> {
  await page.getByRole('button', { name }).click();
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Sign in' })).toBeVisible();
}
