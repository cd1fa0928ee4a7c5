export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);
}

interface MailParts {
  subject: string;
  /** Plain-text paragraphs; escaped for the HTML part. */
  paragraphs: string[];
  action: { label: string; url: string };
  footer: string;
}

/** Both parts of a mail from the same words: a plain-text body and a simple HTML one. */
export function renderMail(parts: MailParts): MailContent {
  const text = [...parts.paragraphs, `${parts.action.label}: ${parts.action.url}`, parts.footer, '— Porestack'].join('\n\n');
  const html = `<!doctype html>
<html><body style="font-family: 'IBM Plex Sans', Arial, sans-serif; color: #1f2933; line-height: 1.5; max-width: 560px; margin: 0 auto; padding: 24px;">
${parts.paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join('\n')}
<p><a href="${escapeHtml(parts.action.url)}" style="display: inline-block; background: #1d6f72; color: #ffffff; padding: 10px 18px; border-radius: 4px; text-decoration: none;">${escapeHtml(parts.action.label)}</a></p>
<p style="font-size: 13px; color: #52606d;">If the button does not work, copy this address into your browser:<br>${escapeHtml(parts.action.url)}</p>
<p style="font-size: 13px; color: #52606d;">${escapeHtml(parts.footer)}</p>
<p style="font-size: 13px; color: #52606d;">— Porestack</p>
</body></html>`;
  return { subject: parts.subject, text, html };
}
