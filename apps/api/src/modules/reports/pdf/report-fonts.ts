import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';

const require = createRequire(import.meta.url);
/** Latin for the text, Greek for σ, α, ε and Δ; the app's typeface, so a report reads like the portal. */
const SUBSETS = ['latin', 'latin-ext', 'greek'];
const WEIGHTS = [400, 600];

let cached: string | undefined;

/**
 * @font-face rules for IBM Plex Sans with the font files inlined as data URLs: the page is
 * printed from a string, with no server to fetch fonts from, and Chromium embeds the glyphs
 * it uses in the PDF (text stays selectable and searchable).
 */
export function reportFontFaces(): string {
  if (cached) return cached;
  const rules: string[] = [];
  for (const weight of WEIGHTS) {
    const cssPath = require.resolve(`@fontsource/ibm-plex-sans/${weight}.css`);
    const css = readFileSync(cssPath, 'utf8');
    for (const block of css.split('/* ').slice(1)) {
      const subset = SUBSETS.find((s) => block.startsWith(`ibm-plex-sans-${s}-${weight}-normal */`));
      if (!subset) continue;
      const file = /url\(\.\/files\/([^)]+\.woff2)\)/.exec(block)?.[1];
      const range = /unicode-range: ([^;]+);/.exec(block)?.[1];
      if (!file || !range) continue;
      const data = readFileSync(join(dirname(cssPath), 'files', file)).toString('base64');
      rules.push(`@font-face{font-family:'IBM Plex Sans';font-style:normal;font-weight:${weight};src:url(data:font/woff2;base64,${data}) format('woff2');unicode-range:${range};}`);
    }
  }
  if (rules.length === 0) throw new Error('IBM Plex Sans font files not found for the reports');
  cached = rules.join('\n');
  return cached;
}
