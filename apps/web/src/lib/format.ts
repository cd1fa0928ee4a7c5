const dateTime = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' });
const date = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium' });

/** "2 Dec 2025, 14:05" in the reader's time zone. */
export function formatDateTime(iso: string): string {
  return dateTime.format(new Date(iso));
}

/** "2 Dec 2025". */
export function formatDate(iso: string): string {
  return date.format(new Date(iso));
}
