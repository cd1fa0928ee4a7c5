/**
 * Parse benchmark: time and peak memory of reading files on the parse threads
 * (parse-pool.ts), for the largest files an upload may be and for hostile ones.
 *
 *   pnpm --filter @porestack/api bench:parse
 *
 * Peak memory is the process's resident set (the parse thread lives in this process),
 * sampled every 10 ms, less what it was before the file was read. No services needed.
 */
import './bench-env.js';
import ExcelJS from 'exceljs';
import { canonicalXlsxTemplate } from '../src/modules/readings-import/demo-files.js';
import { CANONICAL_MAPPING } from '../src/modules/readings-import/detect-layout.js';
import { demoReadings, demoReadingsCsv } from '../src/modules/readings-import/demo-readings.js';
import { ImportProblem } from '../src/modules/readings-import/import-problem.js';
import { closeParsePool, parseOffThread } from '../src/modules/readings-import/parse-pool.js';
import type { ParseTask } from '../src/modules/readings-import/parse-task.js';

const LIMITS = { maxFileBytes: 40 * 1024 * 1024, maxRows: 500_000 };
/** The portal's default deadline (import-limits.ts with IMPORT_PARSE_SECONDS 20), without its environment. */
const deadline = (task: ParseTask) => Math.round(task.kind === 'preview' ? 2_000 + (500 * task.bytes.byteLength) / MB : 20_000 + (4_000 * task.bytes.byteLength) / MB);
const MB = 1024 * 1024;

/** Log-spaced times: a logger writing every few seconds. */
function denseTimes(count: number): number[] {
  const times = [0];
  for (let i = 0; i < count - 1; i += 1) times.push(0.01 * 144_000 ** (i / (count - 2)));
  return times;
}

async function workbookWithFarCells(rows: number): Promise<Buffer> {
  const book = new ExcelJS.Workbook();
  const sheet = book.addWorksheet('readings');
  for (let r = 1; r <= rows; r += 1) sheet.getCell(r, 16_384).value = r;
  return Buffer.from(await book.xlsx.writeBuffer());
}

async function measure(label: string, task: ParseTask): Promise<void> {
  // A fresh thread for each file, started on a small file first, so the figure is this file's.
  await closeParsePool();
  await parseOffThread({ ...warmUp, bytes: Uint8Array.from(warmUp.bytes) }, 60_000);
  global.gc?.();
  await new Promise((resolve) => setTimeout(resolve, 200));
  const before = process.memoryUsage().rss;
  let peak = before;
  const sampler = setInterval(() => {
    peak = Math.max(peak, process.memoryUsage().rss);
  }, 10);
  const started = performance.now();
  let outcome: string;
  try {
    // The bytes move to the thread: give it a copy, the same file is read again below.
    const result = await parseOffThread({ ...task, bytes: Uint8Array.from(task.bytes) }, deadline(task));
    outcome = result.kind === 'readings' ? `${result.readings.count.toLocaleString('en-GB')} readings` : result.kind === 'preview' ? `preview of ${result.table.rows.length} rows` : result.kind;
  } catch (error) {
    outcome = error instanceof ImportProblem ? `refused: ${error.message.slice(0, 90)}…` : `ERROR ${String(error)}`;
  }
  const elapsed = performance.now() - started;
  clearInterval(sampler);
  const size = `${(task.bytes.byteLength / MB).toFixed(1)} MB`.padStart(8);
  process.stdout.write(`${label.padEnd(46)} ${size} ${elapsed.toFixed(0).padStart(7)} ms  +${((peak - before) / MB).toFixed(0).padStart(4)} MB peak   ${outcome}\n`);
}

const largestRows = 499_000;
const readings = demoReadings(denseTimes(largestRows / 10));
const csv = Buffer.from(demoReadingsCsv(readings));
// The largest an upload may be: 40 MB, here 499,000 readings with eight more logger columns.
const wideLines = demoReadingsCsv(readings).split('\n');
const wide = Buffer.from(
  wideLines.map((line, i) => (line === '' ? line : i === 0 ? `${line},cell_kpa,temp_c,ch1,ch2,ch3,ch4,ch5,ch6` : `${line},${(i % 997) * 0.731},21.4,${i % 13},0.0042,${i},1.25,-0.07,12.875`)).join('\n'),
);
const xlsx = await canonicalXlsxTemplate(demoReadings(denseTimes(20_000)));
const blankLines = Buffer.from(`increment,stress_kpa,elapsed_min,deformation_mm\n${'\n'.repeat(30 * MB)}`);
const commas = Buffer.from(`increment,stress_kpa,elapsed_min,deformation_mm\n${`${','.repeat(99)}\n`.repeat(300_000)}`);
const farCells = await workbookWithFarCells(2_000);
const warmUp: ParseTask = { kind: 'import', bytes: Buffer.from(demoReadingsCsv(demoReadings())), type: 'csv', limits: LIMITS, mapping: null };
const imports = (bytes: Buffer, type: 'csv' | 'xlsx'): ParseTask => ({ kind: 'import', bytes, type, limits: LIMITS, mapping: null });
// A CSV preview reads only the file's first 256 kB (uploads.service.ts), as here.
const preview = (bytes: Buffer, type: 'csv' | 'xlsx'): ParseTask => ({
  kind: 'preview',
  bytes: type === 'csv' ? bytes.subarray(0, bytes.subarray(0, 256 * 1024).lastIndexOf(0x0a) + 1) : bytes,
  type,
  limits: LIMITS,
  delimiter: undefined,
  previewRows: 21,
});

process.stdout.write(`Parse threads: heap limit per thread, deadline by size (parse-pool.ts). Machine load: ${(await import('node:os')).loadavg()[0]?.toFixed(2)}\n\n`);
const threadStart = performance.now();
await parseOffThread({ ...warmUp, bytes: Uint8Array.from(warmUp.bytes) }, 60_000);
process.stdout.write(`Thread start and a 150-row CSV: ${(performance.now() - threadStart).toFixed(0)} ms\n`);
await measure('largest CSV: 499,000 readings, import', imports(csv, 'csv'));
await measure('largest CSV: preview', preview(csv, 'csv'));
await measure('40 MB CSV: 499,000 readings, 12 columns, import', { kind: 'import', bytes: wide, type: 'csv', limits: LIMITS, mapping: CANONICAL_MAPPING });
await measure('40 MB CSV, 12 columns, no mapping yet', imports(wide, 'csv'));
await measure('XLSX 200,000 readings, import', imports(xlsx, 'xlsx'));
await measure('XLSX 200,000 readings, preview', preview(xlsx, 'xlsx'));
await measure('30 MB of blank lines, import', imports(blankLines, 'csv'));
await measure('30 MB of blank lines, preview', preview(blankLines, 'csv'));
await measure('300,000 lines of 99 commas, import', imports(commas, 'csv'));
await measure('XLSX, 2,000 rows with one cell in column XFD', imports(farCells, 'xlsx'));
await closeParsePool();
