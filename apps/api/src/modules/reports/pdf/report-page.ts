import { html, trusted, type Html } from './html.js';
import { reportFontFaces } from './report-fonts.js';

/**
 * The printed page every report kind shares: A4, IBM Plex Sans, black on white with grey
 * rules only (it must photocopy), tables whose header rows repeat on each page.
 */
const STYLES = `
* { box-sizing: border-box; }
html { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
body { margin: 0; font-family: 'IBM Plex Sans', 'DejaVu Sans', sans-serif; font-size: 8.6pt; line-height: 1.35; color: #111827; }
h1 { font-size: 15pt; font-weight: 600; margin: 0 0 1mm; }
h2 { font-size: 10.5pt; font-weight: 600; margin: 5mm 0 1.5mm; padding-bottom: 0.8mm; border-bottom: 0.6pt solid #111827; break-after: avoid; }
h3 { font-size: 9pt; font-weight: 600; margin: 3mm 0 1mm; break-after: avoid; }
p { margin: 0 0 1.5mm; }
.masthead { display: flex; justify-content: space-between; gap: 8mm; border-bottom: 1.2pt solid #111827; padding-bottom: 3mm; margin-bottom: 3mm; }
.masthead .lab { font-size: 11pt; font-weight: 600; }
.masthead .address { white-space: pre-line; color: #374151; }
.masthead .issue { text-align: right; white-space: nowrap; }
.subtitle { color: #374151; margin-bottom: 2mm; }
.caution { border: 0.8pt solid #111827; padding: 2mm 3mm; margin: 3mm 0; font-size: 8.2pt; break-inside: avoid; }
.grid { display: grid; grid-template-columns: 1fr 1fr; gap: 0 8mm; }
table { width: 100%; border-collapse: collapse; margin: 0 0 2mm; }
thead { display: table-header-group; }
tr { break-inside: avoid; }
th, td { padding: 0.9mm 1.2mm; text-align: left; vertical-align: top; border-bottom: 0.4pt solid #9ca3af; }
th { font-weight: 600; border-bottom: 0.8pt solid #111827; }
td.num, th.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
table.facts th { width: 42%; font-weight: 400; color: #374151; border-bottom: 0.4pt solid #d1d5db; }
table.facts td { border-bottom: 0.4pt solid #d1d5db; }
table.dense { font-size: 7.6pt; }
tr.adopted td { font-weight: 600; }
.figure { break-inside: avoid; margin: 2mm 0 3mm; }
.figure .caption { font-size: 8pt; color: #374151; margin-top: 1mm; }
.pair { display: grid; grid-template-columns: 1fr 1fr; gap: 4mm; break-inside: avoid; }
.note { color: #374151; font-size: 7.8pt; }
.new-page { break-before: page; }
.keep { break-inside: avoid; }
th[scope=row] { font-weight: 400; }
.signature { display: grid; grid-template-columns: 1fr 1fr 1fr; gap: 6mm; margin-top: 3mm; break-inside: avoid; }
.signature div { border-top: 0.6pt solid #111827; padding-top: 1mm; }
ul { margin: 0 0 2mm; padding-left: 5mm; }
li { margin-bottom: 0.8mm; }
`;

/** A complete, self-contained HTML document (fonts inlined, no external resources). */
export function reportPage(title: string, body: Html): string {
  return html`<!doctype html>
<html lang="en-GB"><head><meta charset="utf-8"><title>${title}</title>
<style>${trusted(reportFontFaces())}${trusted(STYLES)}</style></head>
<body>${body}</body></html>`.text;
}
