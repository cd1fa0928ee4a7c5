import { inflateRawSync } from 'node:zlib';

const END_OF_DIRECTORY = 0x06054b50;
const DIRECTORY_ENTRY = 0x02014b50;
const LOCAL_HEADER = 0x04034b50;
/** The end-of-directory record sits in the last 22 bytes plus a comment of at most 65,535. */
const END_SEARCH = 22 + 0xffff;

/**
 * One small entry of a zip archive held in memory, found through the archive's central
 * directory and inflated (stored or deflated entries; not ZIP64), or null when the archive
 * has no such entry or cannot be read that far. Inflation stops at `maxBytes`, so a damaged
 * or hostile entry cannot blow up.
 */
export function zipEntry(bytes: Buffer, name: string, maxBytes = 4 * 1024 * 1024): Buffer | null {
  const searchFrom = Math.max(0, bytes.length - END_SEARCH);
  let end = -1;
  for (let at = bytes.length - 22; at >= searchFrom; at -= 1) {
    if (bytes.readUInt32LE(at) === END_OF_DIRECTORY) {
      end = at;
      break;
    }
  }
  if (end === -1) return null;
  const count = bytes.readUInt16LE(end + 10);
  let at = bytes.readUInt32LE(end + 16);
  for (let entry = 0; entry < count; entry += 1) {
    if (at + 46 > bytes.length || bytes.readUInt32LE(at) !== DIRECTORY_ENTRY) return null;
    const method = bytes.readUInt16LE(at + 10);
    const compressedSize = bytes.readUInt32LE(at + 20);
    const nameLength = bytes.readUInt16LE(at + 28);
    const extraLength = bytes.readUInt16LE(at + 30);
    const commentLength = bytes.readUInt16LE(at + 32);
    const localOffset = bytes.readUInt32LE(at + 42);
    const entryName = bytes.toString('utf8', at + 46, at + 46 + nameLength);
    at += 46 + nameLength + extraLength + commentLength;
    if (entryName !== name) continue;
    if (localOffset + 30 > bytes.length || bytes.readUInt32LE(localOffset) !== LOCAL_HEADER) return null;
    const start = localOffset + 30 + bytes.readUInt16LE(localOffset + 26) + bytes.readUInt16LE(localOffset + 28);
    const data = bytes.subarray(start, start + compressedSize);
    if (method === 0) return data.length <= maxBytes ? Buffer.from(data) : null;
    if (method !== 8) return null;
    return inflateRawSync(data, { maxOutputLength: maxBytes });
  }
  return null;
}
