/**
 * A client of the mail fake's REST API (maildev: GET /api/email), for tests that follow
 * links from real e-mails. Filters by recipient, so tests sharing the fake never clash.
 */
export interface ReceivedMail {
  id: string;
  subject: string;
  text: string;
  html: string;
  to: Array<{ address: string }>;
}

function inboxUrl(): string {
  const url = process.env['MAIL_INBOX_URL'];
  if (!url) throw new Error('MAIL_INBOX_URL is not set: it should point at the mail fake, like http://127.0.0.1:1080');
  return url.replace(/\/$/, '');
}

export async function mailsTo(address: string): Promise<ReceivedMail[]> {
  const res = await fetch(`${inboxUrl()}/api/email`);
  if (!res.ok) throw new Error(`The mail fake answered ${res.status}`);
  const all = (await res.json()) as ReceivedMail[];
  return all.filter((mail) => mail.to.some((to) => to.address.toLowerCase() === address.toLowerCase()));
}

/** Waits (up to `timeoutMs`) for the `count`-th mail to `address`, and returns it. */
export async function waitForMail(address: string, count = 1, timeoutMs = 5_000): Promise<ReceivedMail> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const mails = await mailsTo(address);
    const mail = mails[count - 1];
    if (mail) return mail;
    if (Date.now() > deadline) throw new Error(`No mail #${count} to ${address} arrived within ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

/** The first link in the mail's text that starts with `prefix`. */
export function linkIn(mail: ReceivedMail, prefix: string): string {
  const escaped = prefix.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  const match = new RegExp(`${escaped}[^\\s"<>]*`).exec(mail.text);
  if (!match) throw new Error(`No link starting with ${prefix} in mail "${mail.subject}":\n${mail.text}`);
  return match[0];
}
