import { ROLES } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../app.js';
import { dataSource } from '../../data-source.js';
import { MembershipEntity } from '../../modules/organisations/membership.entity.js';
import { UserEntity } from '../../modules/users/user.entity.js';
import { openBrowser } from '../../testing/browser.js';
import { DEMO_ACCOUNTS, DEMO_ORGANISATION_ID, DEMO_PASSWORD } from '../demo-organisation.seed.js';
import { seed } from '../seed.js';

describe('seed()', () => {
  it('when run twice, then the second run creates nothing and the banner names every demo account', async () => {
    const first = await seed(dataSource);
    const usersAfterFirst = await dataSource.getRepository(UserEntity).count();
    const second = await seed(dataSource);
    expect(second.demo.created).toBe(0);
    expect(await dataSource.getRepository(UserEntity).count()).toBe(usersAfterFirst);
    expect(await dataSource.getRepository(MembershipEntity).countBy({ organisationId: DEMO_ORGANISATION_ID })).toBe(ROLES.length);
    expect(second.banner).toEqual(first.banner);
    expect(second.banner).toContain(`  Demo accounts (password: ${DEMO_PASSWORD}):`);
    for (const account of DEMO_ACCOUNTS) expect(second.banner.some((line) => line.endsWith(account.email))).toBe(true);
  });

  it('when a demo account signs in with the demo password, then it holds its role in the demo organisation', async () => {
    await seed(dataSource);
    const app = createApp();
    for (const account of DEMO_ACCOUNTS) {
      const browser = await openBrowser(app);
      const res = await browser.post('/api/auth/sign-in', { email: account.email, password: DEMO_PASSWORD }).expect(200);
      expect(res.body.memberships).toContainEqual(expect.objectContaining({ organisationId: DEMO_ORGANISATION_ID, roles: [account.role] }));
    }
  });
});
