import { expect, test } from '@playwright/test';
import { linkFromMail } from './support/mail';
import { newPerson, signIn, signOut, signUp } from './support/people';

test('a forgotten password is replaced through the e-mailed link, once', async ({ page }) => {
  const person = newPerson('forgetful');
  await signUp(page, person);
  await signOut(page, person.name);

  await page.getByRole('link', { name: 'Forgotten your password?' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Reset your password' })).toBeVisible();
  await page.getByLabel('E-mail address').fill(person.email);
  await page.getByRole('button', { name: 'Send reset link' }).click();
  await expect(page.getByText('Check your inbox')).toBeVisible();

  const link = await linkFromMail(person.email, '/reset-password');
  const newPassword = `${person.password}-renewed`;
  await page.goto(link);
  await page.getByLabel('New password', { exact: true }).fill(newPassword);
  await page.getByLabel('New password, again').fill(newPassword);
  await page.getByRole('button', { name: 'Save new password' }).click();
  await expect(page.getByText('Your new password is saved.')).toBeVisible();

  await signIn(page, person.email, person.password);
  await expect(page.getByRole('alert')).toContainText('not right');
  await page.getByLabel('Password').fill(newPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('heading', { level: 1, name: person.organisationName })).toBeVisible();

  // A used link is refused with the server's explanation.
  await signOut(page, person.name);
  await page.goto(link);
  await page.getByLabel('New password', { exact: true }).fill('another-password-123');
  await page.getByLabel('New password, again').fill('another-password-123');
  await page.getByRole('button', { name: 'Save new password' }).click();
  await expect(page.getByRole('alert')).toContainText('already been used');
});
