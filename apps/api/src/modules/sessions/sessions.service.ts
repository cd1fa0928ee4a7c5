import type { EntityManager } from 'typeorm';
import { env } from '../../config/env.js';
import { dataSource } from '../../data-source.js';
import { UserEntity } from '../users/user.entity.js';
import { SessionEntity } from './session.entity.js';

/** Starts a session for the user; its id goes into the cookie. */
export async function startSession(userId: string, manager: EntityManager = dataSource.manager): Promise<SessionEntity> {
  const repo = manager.getRepository(SessionEntity);
  return repo.save(repo.create({ userId, expiresAt: new Date(Date.now() + env().SESSION_DAYS * 24 * 3600_000), endedAt: null }));
}

/**
 * The user of a live session: not ended, not expired, and issued under the user's current
 * password (a reset bumps session_version). One query, on every signed-in request.
 */
export async function userOfSession(sessionId: string, userId: string, sessionVersion: number): Promise<UserEntity | null> {
  return dataSource
    .getRepository(UserEntity)
    .createQueryBuilder('user')
    .innerJoin(SessionEntity, 'session', 'session.user_id = user.id')
    .where('session.id = :sessionId AND user.id = :userId AND user.session_version = :sessionVersion', { sessionId, userId, sessionVersion })
    .andWhere('session.ended_at IS NULL AND session.expires_at > now()')
    .getOne();
}

/** Ends the session (sign-out). Ending an ended or unknown session does nothing. */
export async function endSession(sessionId: string): Promise<void> {
  await dataSource.query('UPDATE sessions SET ended_at = now() WHERE id = $1 AND ended_at IS NULL', [sessionId]);
}

/** Ends every session of the user (a password reset, a removed account). */
export async function endSessionsOf(userId: string, manager: EntityManager = dataSource.manager): Promise<void> {
  await manager.query('UPDATE sessions SET ended_at = now() WHERE user_id = $1 AND ended_at IS NULL', [userId]);
}
