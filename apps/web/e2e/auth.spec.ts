import { expect, test } from '@playwright/test';
import { linkFromMail } from './support/mail';
import { newPerson, sendSignUp, signIn, signOut, signUp } from './support/people';

test.describe('signing up, in and out', () => {
  test('sign-up creates an organisation with the new person as its administrator', async ({ page }) => {
    const person = newPerson('founder');
    await signUp(page, person);

    await expect(page.getByText('Administrator', { exact: false }).first()).toBeVisible();
    const nav = page.getByRole('navigation', { name: 'Organisation' });
    await expect(nav.getByRole('link', { name: 'Members' })).toBeVisible();
    await expect(nav.getByRole('link', { name: 'Activity' })).toBeVisible();
    await expect(page.getByText('A qualified geotechnical engineer must review them')).toBeVisible();
  });

  test('the sign-up form checks fields with the shared rules before sending', async ({ page }) => {
    await page.goto('/sign-up');
    await page.getByLabel('E-mail address').fill('not-an-address');
    await page.getByLabel('Password').fill('short');
    await page.getByRole('button', { name: 'Create account' }).click();

    await expect(page.getByText('Enter your name.')).toBeVisible();
    await expect(page.getByText('Enter a valid e-mail address, like name@example.org.')).toBeVisible();
    await expect(page.getByText('Use a password of at least 10 characters.')).toBeVisible();
    await expect(page).toHaveURL(/\/sign-up$/);
  });

  test('signing up again with an address that has an account answers as for any address; the e-mail tells the owner', async ({ page }) => {
    const person = newPerson('twice');
    await signUp(page, person);
    await signOut(page, person.name);

    await sendSignUp(page, person, 'Second Lab');
    await expect(page.getByRole('button', { name: 'Create account' })).toHaveCount(0);
    expect(await linkFromMail(person.email, '/forgot-password')).toBe('/forgot-password');
  });

  test('a wrong password is refused with a message; the right one opens the organisation', async ({ page }) => {
    const person = newPerson('returning');
    await signUp(page, person);
    await signOut(page, person.name);

    await signIn(page, person.email, 'not-the-password');
    await expect(page.getByRole('alert')).toContainText('not right');
    await expect(page).toHaveURL(/\/sign-in$/);

    await page.getByLabel('Password').fill(person.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByRole('heading', { level: 1, name: person.organisationName })).toBeVisible();
  });

  test('after sign-out the organisation pages ask for sign-in again', async ({ page }) => {
    const person = newPerson('leaver');
    const orgId = await signUp(page, person);
    await signOut(page, person.name);
    await expect(page.getByText('You are signed out.')).toBeVisible();

    await page.goto(`/orgs/${orgId}/members`);
    await expect(page.getByRole('heading', { level: 1, name: 'Sign in' })).toBeVisible();

    // Signing in from there returns to the page that was asked for.
    await page.getByLabel('E-mail address').fill(person.email);
    await page.getByLabel('Password').fill(person.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Members' })).toBeVisible();
  });

  test('an unknown address shows the not-found page with a way home', async ({ page }) => {
    await page.goto('/no-such-page');
    await expect(page.getByRole('heading', { name: 'We could not find this page' })).toBeVisible();
    await expect(page.getByRole('link', { name: 'Go to your organisation home' })).toBeVisible();
  });
});
