import type { DetectedFileType } from '@porestack/types';
import { ImportProblem } from './import-problem.js';

const ZIP_MAGIC = Buffer.from([0x50, 0x4b, 0x03, 0x04]);
const XLSX_ENTRY = Buffer.from('xl/', 'latin1');

/** Signatures of files people upload by mistake, to name them in the message. */
const KNOWN_BINARIES: Array<{ magic: Buffer; what: string }> = [
  { magic: Buffer.from([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1]), what: 'an Excel 97–2003 workbook (.xls); save it as .xlsx or CSV' },
  { magic: Buffer.from('%PDF', 'latin1'), what: 'a PDF document' },
  { magic: Buffer.from([0x89, 0x50, 0x4e, 0x47]), what: 'a PNG image' },
  { magic: Buffer.from([0xff, 0xd8, 0xff]), what: 'a JPEG image' },
  { magic: Buffer.from([0x1f, 0x8b]), what: 'a gzip archive; unpack it first' },
  { magic: Buffer.from([0x7f, 0x45, 0x4c, 0x46]), what: 'a program (ELF executable)' },
  { magic: Buffer.from('MZ', 'latin1'), what: 'a Windows program' },
];

const UTF16_BOMS = [Buffer.from([0xff, 0xfe]), Buffer.from([0xfe, 0xff])];

/**
 * Decides from the bytes, never from the name, whether a file is an XLSX workbook (a ZIP
 * archive with an `xl/` entry) or a CSV (UTF-8 text without NUL bytes). A `.csv` that is
 * really a PDF, or a renamed program, is refused with a message saying what it looks like.
 * @throws ImportProblem for an empty file or one that is neither.
 */
export function sniffFileType(bytes: Buffer): DetectedFileType {
  if (isBlank(bytes)) {
    throw new ImportProblem('The file is empty. Choose the file the logger wrote, or download a template to see the layout.');
  }
  if (bytes.subarray(0, 4).equals(ZIP_MAGIC)) {
    if (bytes.includes(XLSX_ENTRY)) return 'xlsx';
    throw notReadings(
      'The file is a ZIP archive but not an Excel workbook (it has no xl/ folder inside; it may be a Word or OpenDocument file). Save the readings as .xlsx or CSV and upload that.',
    );
  }
  const known = KNOWN_BINARIES.find(({ magic }) => bytes.subarray(0, magic.length).equals(magic));
  if (known) {
    throw notReadings(`The file's content is ${known.what}, not readings as CSV or XLSX, whatever its name says. Choose the CSV or XLSX file with the readings.`);
  }
  if (UTF16_BOMS.some((bom) => bytes.subarray(0, 2).equals(bom))) {
    throw notReadings('The file is text saved as UTF-16. Save it again as "CSV UTF-8" (or plain UTF-8 text) and upload that.');
  }
  const nul = bytes.indexOf(0);
  if (nul !== -1) {
    throw notReadings(`The file holds binary data (a NUL byte at byte ${nul + 1}), so it is neither CSV text nor an XLSX workbook, whatever its name says. Choose the CSV or XLSX file with the readings.`);
  }
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw notReadings(
      'The file is not UTF-8 text, so it is neither a CSV we can read nor an XLSX workbook. If it is a CSV saved in another encoding, save it again as "CSV UTF-8" and upload that.',
    );
  }
  return 'csv';
}

function notReadings(message: string): ImportProblem {
  return new ImportProblem(message, [], 0, 'not_readings');
}

/** No bytes, or only spaces and line ends (and perhaps a byte-order mark). */
function isBlank(bytes: Buffer): boolean {
  const head = bytes.toString('utf8', 0, Math.min(bytes.length, 65_536)).replace(/^\uFEFF/, '');
  if (/\S/.test(head)) return false;
  return bytes.length <= 65_536 || !/\S/.test(bytes.toString('utf8'));
}
