import { createServer } from 'node:net';
import { env } from '../config/env.js';
import { closeMailer } from '../mail/mailer.js';

/**
 * Runs `work` while the mailer talks to a real SMTP peer on loopback that turns every client
 * away (554), standing in for a mail server that is down; then puts the working server back.
 */
export async function withRefusingMailServer<T>(work: () => Promise<T>): Promise<T> {
  const refusing = createServer((socket) => socket.end('554 5.3.2 Service not available\r\n'));
  await new Promise<void>((resolve) => refusing.listen(0, '127.0.0.1', resolve));
  const settings = env() as { SMTP_URL: string };
  const working = settings.SMTP_URL;
  const address = refusing.address();
  settings.SMTP_URL = `smtp://127.0.0.1:${typeof address === 'object' && address ? address.port : 0}`;
  closeMailer();
  try {
    return await work();
  } finally {
    settings.SMTP_URL = working;
    closeMailer();
    await new Promise<void>((resolve) => refusing.close(() => resolve()));
  }
}
