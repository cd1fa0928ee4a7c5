import { jobQueue } from './boss.js';

export const AUTH_MAIL_QUEUE = 'auth-mail';

/**
 * Mails about accounts are sent by the worker, never while the request waits: a request
 * then takes as long whether or not the address has an account (no enumeration by timing),
 * and a mail server that is down is tried again.
 */
export type AuthMailJobData = { readonly kind: 'password-reset'; readonly email: string } | { readonly kind: 'sign-up'; readonly requestId: string };

let queueReady: Promise<void> | undefined;

export async function enqueueAuthMail(data: AuthMailJobData): Promise<void> {
  const boss = await jobQueue();
  // pg-boss 10 refuses to send to a queue that does not exist yet (the worker may not have started).
  queueReady ??= boss.createQueue(AUTH_MAIL_QUEUE);
  await queueReady;
  await boss.send(AUTH_MAIL_QUEUE, data, { retryLimit: 4, retryDelay: 30, retryBackoff: true, expireInSeconds: 120 });
}
