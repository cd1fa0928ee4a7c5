import type { EntityManager } from 'typeorm';
import { env } from '../../config/env.js';
import { dataSource } from '../../data-source.js';
import { SessionEntity } from './session.entity.js';

/** Starts a session for the user; its id goes into the cookie. */
export async function startSession(userId: string, manager: EntityManager = dataSource.manager): Promise<SessionEntity> {
  const repo = manager.getRepository(SessionEntity);
  return repo.save(repo.create({ userId, expiresAt: new Date(Date.now() + env().SESSION_DAYS * 24 * 3600_000), endedAt: null }));
}

/** Ends the session (sign-out). Ending an ended or unknown session does nothing. */
export async function endSession(sessionId: string): Promise<void> {
  await dataSource.query('UPDATE sessions SET ended_at = now() WHERE id = $1 AND ended_at IS NULL', [sessionId]);
}

/** Ends every session of the user (a password reset, a removed account). */
export async function endSessionsOf(userId: string, manager: EntityManager = dataSource.manager): Promise<void> {
  await manager.query('UPDATE sessions SET ended_at = now() WHERE user_id = $1 AND ended_at IS NULL', [userId]);
}
