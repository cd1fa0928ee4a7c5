import { readFileSync, writeFileSync } from 'node:fs';
import { printPdf } from './modules/reports/pdf/print-pdf.js';
const html = readFileSync('/tmp/report.html', 'utf8');
const t = Date.now();
writeFileSync('/tmp/report.pdf', await printPdf(html, { executablePath: '/usr/bin/chromium', headerText: 'Header text · here', footerText: 'Footer caution' }));
console.log('print', Date.now() - t);
