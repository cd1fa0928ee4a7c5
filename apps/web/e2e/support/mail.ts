/** Reads the mail fake's REST API (maildev) to find what the portal sent. */
const inboxUrl = process.env['MAIL_INBOX_URL'] ?? 'http://127.0.0.1:1090';

type MaildevEmail = {
  id: string;
  subject: string;
  text?: string;
  html?: string;
  to: { address: string }[];
  date?: string;
};

async function emailsTo(address: string): Promise<MaildevEmail[]> {
  const response = await fetch(`${inboxUrl}/api/email`);
  if (!response.ok) throw new Error(`The mail inbox at ${inboxUrl} answered ${response.status}.`);
  const all = (await response.json()) as MaildevEmail[];
  return all.filter((email) => email.to.some((recipient) => recipient.address.toLowerCase() === address.toLowerCase()));
}

/**
 * Polls the inbox until a mail to `address` contains a link to `pathPrefix`, and returns that
 * link's path and query (the host in the mail may differ from the test's base URL).
 */
export async function linkFromMail(address: string, pathPrefix: string, timeoutMs = 15_000): Promise<string> {
  const deadline = Date.now() + timeoutMs;
  const pattern = new RegExp(`https?://[^\\s"'<>]+${pathPrefix.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&')}[^\\s"'<>]*`);
  while (Date.now() < deadline) {
    for (const email of (await emailsTo(address)).reverse()) {
      const match = pattern.exec(`${email.text ?? ''}\n${email.html ?? ''}`);
      if (match) {
        const url = new URL(match[0].replaceAll('&amp;', '&'));
        return `${url.pathname}${url.search}`;
      }
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`No mail to ${address} with a link to ${pathPrefix} arrived within ${timeoutMs} ms (inbox: ${inboxUrl}).`);
}
