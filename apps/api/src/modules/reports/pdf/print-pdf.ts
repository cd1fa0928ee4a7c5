import { chromium } from 'playwright-core';

/**
 * Why Chromium prints our reports (and not a PDF library): the report is an HTML page of our
 * own, so tables that run over several pages repeat their header rows, long text wraps and
 * page breaks follow CSS rules we already know; the plots are SVG and stay vector in the PDF;
 * the text (IBM Plex Sans, embedded) stays selectable; and the browser is the one the
 * end-to-end tests already drive — Debian's `chromium` package, installed by infra/lib.sh's
 * apt_install in `npm start` and `npm test` — driven through playwright-core, which never
 * downloads a browser of its own. A PDF library would have meant hand-placing every table
 * row and page break, and a second way of drawing text.
 */
export interface PrintOptions {
  /** The Chromium binary (CHROMIUM_PATH, Debian's /usr/bin/chromium by default). */
  executablePath: string;
  /** Small print in the top margin of every page (plain text). */
  headerText: string;
  /** Small print in the bottom margin, left of "Page n of N" (plain text). */
  footerText: string;
}

const ARGS = ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--font-render-hinting=none'];

function escape(text: string): string {
  return text.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c] ?? c);
}

/** Margin templates: Chromium fills the pageNumber and totalPages spans on every page. */
function marginTemplates(options: PrintOptions): { headerTemplate: string; footerTemplate: string } {
  const style = "font-family:'DejaVu Sans',sans-serif;font-size:7.5px;color:#374151;width:100%;padding:0 15mm;display:flex;justify-content:space-between;gap:8mm;";
  return {
    headerTemplate: `<div style="${style}"><span>${escape(options.headerText)}</span></div>`,
    footerTemplate: `<div style="${style}"><span style="flex:1">${escape(options.footerText)}</span><span style="white-space:nowrap">Page <span class="pageNumber"></span> of <span class="totalPages"></span></span></div>`,
  };
}

/** Prints a self-contained HTML document (no external resources) to an A4 PDF. */
export async function printPdf(documentHtml: string, options: PrintOptions): Promise<Buffer> {
  const browser = await chromium.launch({ executablePath: options.executablePath, args: ARGS });
  try {
    const page = await browser.newPage();
    // Nothing outside the document may be fetched: the page is printed from this string only.
    await page.route('**/*', (route) => route.abort());
    await page.setContent(documentHtml, { waitUntil: 'load' });
    // The inlined fonts must be decoded before printing, or the first glyphs print in a fallback face.
    await page.evaluate('document.fonts.ready.then(() => true)');
    const pdf = await page.pdf({
      format: 'A4',
      printBackground: true,
      displayHeaderFooter: true,
      ...marginTemplates(options),
      margin: { top: '16mm', bottom: '18mm', left: '15mm', right: '15mm' },
      tagged: true,
      outline: true,
    });
    return pdf;
  } finally {
    await browser.close();
  }
}
