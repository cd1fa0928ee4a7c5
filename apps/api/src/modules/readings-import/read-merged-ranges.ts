/**
 * exceljs's streaming reader skips `<mergeCell>` elements, so merged cells would arrive
 * as silently empty cells. This taps the sheet's XML as the reader consumes it and
 * collects the merged ranges (they follow the rows in the file); call the returned
 * function after the rows have been read.
 */
export function readMergedRanges(sheet: { iterator: AsyncIterable<unknown> }): () => string[] {
  const ranges: string[] = [];
  const source = sheet.iterator;
  let tail = '';
  sheet.iterator = (async function* tap() {
    for await (const chunk of source) {
      const text = tail + (Buffer.isBuffer(chunk) ? chunk.toString('utf8') : String(chunk));
      const pattern = /<(?:\w+:)?mergeCell\b[^>]*\bref="([A-Z]+\d+:[A-Z]+\d+)"/g;
      let lastEnd = 0;
      for (let match = pattern.exec(text); match; match = pattern.exec(text)) {
        ranges.push(match[1] as string);
        lastEnd = pattern.lastIndex;
      }
      // Keep the end of the chunk: an element may be split across two chunks.
      tail = text.slice(Math.max(lastEnd, text.length - 200));
      yield chunk;
    }
  })();
  return () => ranges;
}
