import { describe, expect, it } from 'vitest';
import { sniffFileType } from '../sniff-file-type.js';
import { csv, fixture } from './import-test-files.js';

describe('sniffFileType(bytes)', () => {
  it('recognises a workbook by its zip signature and xl/ entry, and a CSV as UTF-8 text', () => {
    expect(sniffFileType(fixture('canonical.xlsx'))).toBe('xlsx');
    expect(sniffFileType(csv('1,25,0,0'))).toBe('csv');
  });

  it('refuses an empty file, or one of only blank lines, saying it is empty', () => {
    expect(() => sniffFileType(Buffer.alloc(0))).toThrow('The file is empty');
    expect(() => sniffFileType(Buffer.from('\n\r\n  \n'))).toThrow('The file is empty');
  });

  it('refuses a PDF renamed to .csv by its content, naming what it is', () => {
    expect(() => sniffFileType(Buffer.from('%PDF-1.7\n%âãÏÓ\n1 0 obj'))).toThrow("The file's content is a PDF document, not readings as CSV or XLSX");
  });

  it('refuses random binary data (NUL bytes) and gives the byte position', () => {
    const bytes = Buffer.from([0x41, 0x42, 0x00, 0x13, 0x37]);
    expect(() => sniffFileType(bytes)).toThrow('The file holds binary data (a NUL byte at byte 3)');
  });

  it('refuses a zip that is not a workbook (e.g. a .docx renamed to .xlsx)', () => {
    const docx = Buffer.concat([Buffer.from([0x50, 0x4b, 0x03, 0x04]), Buffer.from('....word/document.xml....')]);
    expect(() => sniffFileType(docx)).toThrow('a ZIP archive but not an Excel workbook');
  });

  it('refuses an old .xls workbook and Latin-1 text with advice on how to save them', () => {
    expect(() => sniffFileType(Buffer.from([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1, 0, 0]))).toThrow('Excel 97–2003 workbook (.xls); save it as .xlsx or CSV');
    expect(() => sniffFileType(Buffer.from('Stufe;Last\n1;25 kPa \xb5m', 'latin1'))).toThrow('save it again as "CSV UTF-8"');
  });
});
