import { expect, test } from '@playwright/test';
import { linkFromMail } from './support/mail';
import { newPerson, signUp } from './support/people';

test('an admin invites a technician, who joins from the e-mailed link and sees only what a technician may use', async ({
  page,
  browser,
}) => {
  const admin = newPerson('admin');
  const technician = newPerson('technician');
  const orgId = await signUp(page, admin);

  await page.getByRole('navigation', { name: 'Organisation' }).getByRole('link', { name: 'Members' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Members' })).toBeVisible();
  const inviteForm = page.getByRole('form', { name: 'Invite a colleague' });
  await inviteForm.getByLabel('E-mail address').fill(technician.email);
  await expect(inviteForm.getByRole('checkbox', { name: 'Technician' })).toBeChecked();
  await inviteForm.getByRole('button', { name: 'Send invitation' }).click();
  await expect(page.getByText(`Invitation sent to ${technician.email}`)).toBeVisible();
  const pending = page.getByRole('region', { name: 'Pending invitations' });
  await expect(pending.getByRole('cell', { name: technician.email, exact: true })).toBeVisible();

  // The invitee opens the link in their own browser, with no session.
  const link = await linkFromMail(technician.email, '/invitations/');
  const inviteeContext = await browser.newContext();
  const invitee = await inviteeContext.newPage();
  await invitee.goto(link);
  await expect(invitee.getByRole('heading', { level: 1, name: `Join ${admin.organisationName}` })).toBeVisible();
  await invitee.getByLabel('Your name').fill(technician.name);
  await invitee.getByLabel('Choose a password').fill(technician.password);
  await invitee.getByRole('button', { name: `Join ${admin.organisationName}` }).click();

  await expect(invitee.getByRole('heading', { level: 1, name: admin.organisationName, exact: true })).toBeVisible();
  await expect(invitee.getByText('technician', { exact: true })).toBeVisible();
  const nav = invitee.getByRole('navigation', { name: 'Organisation' });
  await expect(nav.getByRole('link', { name: 'Home' })).toBeVisible();
  await expect(nav.getByRole('link', { name: 'Members' })).toHaveCount(0);
  await expect(nav.getByRole('link', { name: 'Activity' })).toHaveCount(0);

  await invitee.goto(`/orgs/${orgId}/members`);
  await expect(invitee.getByRole('heading', { name: 'This page is not available to your role' })).toBeVisible();
  await invitee.goto(`/orgs/${orgId}/activity`);
  await expect(invitee.getByRole('heading', { name: 'This page is not available to your role' })).toBeVisible();

  // The link works once.
  await invitee.goto(link);
  await expect(invitee.getByRole('alert')).toContainText('already been accepted');
  await inviteeContext.close();

  // The admin now sees the technician as a member and no pending invitation.
  await page.reload();
  const members = page.getByRole('region', { name: 'Members', exact: true });
  const row = members.getByRole('row').filter({ hasText: technician.email });
  const roles = row.getByRole('group', { name: `Roles of ${technician.name}` });
  await expect(roles.getByRole('checkbox', { name: 'Technician' })).toBeChecked();
  await expect(roles.getByRole('checkbox', { name: 'Lab manager' })).not.toBeChecked();
  await expect(page.getByText('No invitations waiting')).toBeVisible();

  // Role changes take effect and are logged: the technician becomes lab manager as well.
  await roles.getByRole('checkbox', { name: 'Lab manager' }).check();
  await page.reload();
  await expect(roles.getByRole('checkbox', { name: 'Lab manager' })).toBeChecked();
  await expect(roles.getByRole('checkbox', { name: 'Technician' })).toBeChecked();
  await page.getByRole('navigation', { name: 'Organisation' }).getByRole('link', { name: 'Activity' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Activity' })).toBeVisible();
  // The log says it in words: who was invited as what, and the roles before and after.
  await expect(page.getByRole('cell', { name: `Invited ${technician.email} as Technician` })).toBeVisible();
  await expect(page.getByRole('cell', { name: `Changed the roles of ${technician.name}: Technician → Technician and Lab manager` })).toBeVisible();
});

test('an admin revokes an invitation and the link stops working', async ({ page, browser }) => {
  const admin = newPerson('revoker');
  const invitee = newPerson('designer');
  await signUp(page, admin);
  await page.getByRole('navigation', { name: 'Organisation' }).getByRole('link', { name: 'Members' }).click();
  const inviteForm = page.getByRole('form', { name: 'Invite a colleague' });
  await inviteForm.getByLabel('E-mail address').fill(invitee.email);
  await inviteForm.getByRole('checkbox', { name: 'Technician' }).uncheck();
  await inviteForm.getByRole('checkbox', { name: 'Designer' }).check();
  await inviteForm.getByRole('button', { name: 'Send invitation' }).click();
  await expect(page.getByText(`Invitation sent to ${invitee.email}`)).toBeVisible();

  await page.getByRole('button', { name: `Revoke the invitation for ${invitee.email}` }).click();
  const dialog = page.getByRole('alertdialog', { name: 'Revoke this invitation?' });
  await dialog.getByRole('button', { name: 'Revoke invitation' }).click();
  await expect(dialog).toHaveCount(0);
  await expect(page.getByText('No invitations waiting')).toBeVisible();

  const link = await linkFromMail(invitee.email, '/invitations/');
  const context = await browser.newContext();
  const other = await context.newPage();
  await other.goto(link);
  await expect(other.getByRole('heading', { name: 'This invitation cannot be used' })).toBeVisible();
  await expect(other.getByRole('alert')).toContainText('withdrawn');
  await context.close();
});

test('the only administrator of a one-person lab makes herself lab manager too, from the keyboard, and gets the review queue', async ({ page }) => {
  const admin = newPerson('one-person-lab');
  await signUp(page, admin);
  const nav = page.getByRole('navigation', { name: 'Organisation' });
  await expect(nav.getByRole('link', { name: 'Review queue' })).toHaveCount(0);
  await nav.getByRole('link', { name: 'Members' }).click();

  const own = page.getByRole('group', { name: `Roles of ${admin.name}` });
  await expect(own.getByRole('checkbox', { name: 'Administrator' })).toBeChecked();
  await page.waitForLoadState('networkidle');
  // From her own Administrator box, two Tabs reach Lab manager. Tried again if a late refresh of
  // the list re-renders the row under the keyboard (the focus is then lost, not misplaced).
  await expect(async () => {
    await own.getByRole('checkbox', { name: 'Administrator' }).focus();
    await page.keyboard.press('Tab');
    await page.keyboard.press('Tab');
    await expect(own.getByRole('checkbox', { name: 'Lab manager' })).toBeFocused({ timeout: 1_000 });
  }).toPass({ timeout: 15_000 });
  await page.keyboard.press('Space');
  await expect(own.getByRole('checkbox', { name: 'Lab manager' })).toBeChecked();

  await expect(nav.getByRole('link', { name: 'Review queue' })).toBeVisible();
  await nav.getByRole('link', { name: 'Home' }).click();
  await expect(page.getByText('administrator and lab manager', { exact: true })).toBeVisible();
  await nav.getByRole('link', { name: 'Review queue' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Review queue' })).toBeVisible();
});
