import type { Browser } from './browser.js';

/** A file download through the API as raw bytes, whatever its content type. */
export async function download(browser: Browser, url: string, expectedStatus = 200): Promise<{ bytes: Buffer; headers: Record<string, string> }> {
  const res = await browser.agent
    .get(url)
    .buffer(true)
    .parse((response, done) => {
      const chunks: Buffer[] = [];
      response.on('data', (chunk: Buffer) => chunks.push(chunk));
      response.on('end', () => done(null, Buffer.concat(chunks)));
    })
    .expect(expectedStatus);
  return { bytes: res.body as Buffer, headers: res.headers as Record<string, string> };
}
