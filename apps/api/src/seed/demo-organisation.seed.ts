import type { Role } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { MembershipEntity } from '../modules/organisations/membership.entity.js';
import { OrganisationEntity } from '../modules/organisations/organisation.entity.js';
import { hashPassword } from '../modules/users/passwords.js';
import { UserEntity } from '../modules/users/user.entity.js';

/** A fixed id, so every run finds the organisation an earlier run made. */
export const DEMO_ORGANISATION_ID = '5eed0000-0000-4000-8000-000000000001';
export const DEMO_ORGANISATION_NAME = 'Pellowmere Demo Soil Laboratory';
export const DEMO_PASSWORD = 'porestack-demo';
export const DEMO_EMAIL_DOMAIN = 'demo.porestack.test';

/** Invented people, one per role. */
export const DEMO_ACCOUNTS: ReadonlyArray<{ role: Role; name: string; email: string }> = [
  { role: 'admin', name: 'Ilse Varnhold', email: `admin@${DEMO_EMAIL_DOMAIN}` },
  { role: 'technician', name: 'Tomas Reedley', email: `technician@${DEMO_EMAIL_DOMAIN}` },
  { role: 'lab_manager', name: 'Priya Kestrelle', email: `lab-manager@${DEMO_EMAIL_DOMAIN}` },
  { role: 'designer', name: 'Oren Callowby', email: `designer@${DEMO_EMAIL_DOMAIN}` },
  { role: 'client', name: 'Wynne Ashdale', email: `client@${DEMO_EMAIL_DOMAIN}` },
];

export interface DemoOrganisation {
  organisation: OrganisationEntity;
  /** user id by role */
  userIds: Record<Role, string>;
  created: number;
}

/** The demo organisation and its five accounts; creates only what is missing. */
export async function seedDemoOrganisation(manager: EntityManager): Promise<DemoOrganisation> {
  let created = 0;
  const organisations = manager.getRepository(OrganisationEntity);
  let organisation = await organisations.findOneBy({ id: DEMO_ORGANISATION_ID });
  if (!organisation) {
    organisation = await organisations.save(organisations.create({ id: DEMO_ORGANISATION_ID, name: DEMO_ORGANISATION_NAME }));
    created += 1;
  }
  const users = manager.getRepository(UserEntity);
  const memberships = manager.getRepository(MembershipEntity);
  const userIds = {} as Record<Role, string>;
  for (const account of DEMO_ACCOUNTS) {
    let user = await users.findOneBy({ email: account.email });
    if (!user) {
      user = await users.save(users.create({ email: account.email, name: account.name, passwordHash: await hashPassword(DEMO_PASSWORD) }));
      created += 1;
    }
    if (!(await memberships.existsBy({ organisationId: organisation.id, userId: user.id }))) {
      await memberships.insert({ organisationId: organisation.id, userId: user.id, roles: [account.role] });
      created += 1;
    }
    userIds[account.role] = user.id;
  }
  return { organisation, userIds, created };
}
