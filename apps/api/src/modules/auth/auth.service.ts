import type { Session, SignIn } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { audit } from '../audit/audit.service.js';
import { MembershipEntity } from '../organisations/membership.entity.js';
import { OrganisationEntity } from '../organisations/organisation.entity.js';
import { verifyAgainstNothing, verifyPassword } from '../users/passwords.js';
import { sessionFor } from '../users/sessions.service.js';
import { UserEntity } from '../users/user.entity.js';
import { emailTaken, invalidCredentials } from './auth.exception.js';
import { assertSignInAllowed, recordFailedSignIn, recordSignedIn } from './sign-in-limits.js';

export interface SignedIn {
  user: UserEntity;
  session: Session;
}

/**
 * Creates the account and its organisation, with the new user as its admin (a confirmed
 * sign-up; the tests' and the demo's accounts). Two at once with one e-mail: the unique
 * index decides and the second answers email_taken.
 */
export async function createAccount(input: NewAccount, passwordHash: string, manager?: EntityManager): Promise<SignedIn> {
  try {
    return await (manager ? createAccountIn(manager, input, passwordHash) : dataSource.transaction((inner) => createAccountIn(inner, input, passwordHash)));
  } catch (error) {
    if (isUniqueViolation(error, 'users_email_key')) throw emailTaken();
    throw error;
  }
}

function isUniqueViolation(error: unknown, constraint: string): boolean {
  const driverError = (error as { driverError?: { code?: string; constraint?: string } }).driverError;
  return driverError?.code === '23505' && driverError.constraint === constraint;
}

export interface NewAccount {
  name: string;
  email: string;
  organisationName: string;
}

async function createAccountIn(manager: EntityManager, input: NewAccount, passwordHash: string): Promise<SignedIn> {
  const users = manager.getRepository(UserEntity);
  if (await users.existsBy({ email: input.email })) throw emailTaken();
  const user = await users.save(users.create({ email: input.email, name: input.name, passwordHash }));
  const organisations = manager.getRepository(OrganisationEntity);
  const organisation = await organisations.save(organisations.create({ name: input.organisationName }));
  await manager.getRepository(MembershipEntity).insert({ organisationId: organisation.id, userId: user.id, roles: ['admin'] });
  await audit.record(
    { organisationId: null, actorUserId: user.id, action: 'user.signed_up', objectType: 'user', objectId: user.id },
    manager,
  );
  await audit.record(
    {
      organisationId: organisation.id,
      actorUserId: user.id,
      action: 'organisation.created',
      objectType: 'organisation',
      objectId: organisation.id,
      details: { name: organisation.name },
    },
    manager,
  );
  return { user, session: await sessionFor(user, manager) };
}

/** Checks the password, within the per-account and per-client limits of failed attempts. */
export async function signIn(input: SignIn, client: string): Promise<SignedIn> {
  const attempt = { email: input.email, client };
  await assertSignInAllowed(attempt);
  const user = await dataSource.getRepository(UserEntity).findOneBy({ email: input.email });
  const valid = user ? await verifyPassword(input.password, user.passwordHash) : await verifyAgainstNothing(input.password);
  if (!user || !valid) {
    await recordFailedSignIn(attempt);
    await audit.record({
      organisationId: null,
      actorUserId: user?.id ?? null,
      action: 'auth.sign_in_failed',
      objectType: 'user',
      objectId: user?.id ?? null,
      details: { email: input.email, ip: client },
    });
    throw invalidCredentials();
  }
  await audit.record({
    organisationId: null,
    actorUserId: user.id,
    action: 'auth.signed_in',
    objectType: 'user',
    objectId: user.id,
    details: { ip: client },
  });
  await recordSignedIn(attempt);
  return { user, session: await sessionFor(user) };
}

export async function recordSignOut(userId: string): Promise<void> {
  await audit.record({ organisationId: null, actorUserId: userId, action: 'auth.signed_out', objectType: 'user', objectId: userId });
}
