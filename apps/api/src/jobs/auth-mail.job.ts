import { sendPasswordResetMail } from '../modules/auth/password-reset.service.js';
import { sendSignUpMail } from '../modules/auth/sign-up.service.js';
import { AUTH_MAIL_QUEUE, type AuthMailJobData } from './auth-mail-queue.js';
import type { JobDefinition } from './job-definition.js';

/** Sends one account mail; a failure (mail server down) is thrown, so pg-boss tries again. */
export async function sendAuthMail(data: AuthMailJobData): Promise<void> {
  if (data.kind === 'password-reset') await sendPasswordResetMail(data.email);
  else await sendSignUpMail(data.requestId);
}

export const authMailJob: JobDefinition = {
  name: AUTH_MAIL_QUEUE,
  // A person waits for this mail in their inbox.
  pollingIntervalSeconds: 0.5,
  handler: (data) => sendAuthMail(data as AuthMailJobData),
};
