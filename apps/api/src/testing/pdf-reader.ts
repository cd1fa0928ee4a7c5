import { execFile } from 'node:child_process';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';

const run = promisify(execFile);

/** Runs a poppler-utils tool (Debian's package, installed by infra/lib.sh) on the PDF's bytes. */
async function withPdfFile<T>(bytes: Buffer, use: (path: string) => Promise<T>): Promise<T> {
  const dir = await mkdtemp(join(tmpdir(), 'porestack-pdf-'));
  try {
    const path = join(dir, 'report.pdf');
    await writeFile(path, bytes);
    return await use(path);
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

/** The PDF's text as pdftotext extracts it (reading order, one page after another). */
export function pdfText(bytes: Buffer): Promise<string> {
  return withPdfFile(bytes, async (path) => (await run('pdftotext', ['-enc', 'UTF-8', path, '-'], { maxBuffer: 32 * 1024 * 1024 })).stdout);
}

/** pdfinfo's fields: Pages, Title, Producer, Page size… */
export function pdfInfo(bytes: Buffer): Promise<Record<string, string>> {
  return withPdfFile(bytes, async (path) => {
    const { stdout } = await run('pdfinfo', [path]);
    return Object.fromEntries(stdout.split('\n').flatMap((line) => {
      const at = line.indexOf(':');
      return at > 0 ? [[line.slice(0, at).trim(), line.slice(at + 1).trim()]] : [];
    }));
  });
}

/** How many raster images the PDF holds (pdfimages -list): zero when every plot is vector. */
export function pdfImageCount(bytes: Buffer): Promise<number> {
  return withPdfFile(bytes, async (path) => {
    const { stdout } = await run('pdfimages', ['-list', path]);
    // Two header lines, then one line per image.
    return stdout.trim().split('\n').slice(2).filter((line) => line.trim() !== '').length;
  });
}
