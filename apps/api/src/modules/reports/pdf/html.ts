/**
 * A tiny HTML builder for the server-rendered reports: every interpolated value is escaped
 * unless it is itself an Html fragment, so a project or sample name can never inject markup.
 */
export class Html {
  constructor(readonly text: string) {}
  toString(): string {
    return this.text;
  }
}

const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => ESCAPES[c] ?? c);
}

type Part = Html | string | number | null | undefined | false | readonly Part[];

function render(part: Part): string {
  if (part === null || part === undefined || part === false) return '';
  if (part instanceof Html) return part.text;
  if (Array.isArray(part)) return part.map(render).join('');
  return escapeHtml(String(part));
}

/** Tagged template: html`<td>${name}</td>` escapes `name`; nested html`` fragments pass through. */
export function html(strings: TemplateStringsArray, ...values: Part[]): Html {
  let out = strings[0] ?? '';
  values.forEach((value, i) => {
    out += render(value) + (strings[i + 1] ?? '');
  });
  return new Html(out);
}

/** Markup produced by our own code (an SVG drawing), passed through as it is. */
export function trusted(markup: string): Html {
  return new Html(markup);
}
