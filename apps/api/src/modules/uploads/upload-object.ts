import type { Readable } from 'node:stream';
import { bucketName, objectBytes, storage } from '../../storage/storage.js';

/** orgs/<orgId>/tests/<testId>/uploads/<uploadId>/<safe file name>: the tenant first, so a prefix policy can fence it. */
export function uploadObjectKey(orgId: string, testId: string, uploadId: string, originalName: string): string {
  return `orgs/${orgId}/tests/${testId}/uploads/${uploadId}/${safeFileName(originalName)}`;
}

/** The base name with anything but letters, digits, dot, dash and underscore made '_' (max 120 characters). */
export function safeFileName(originalName: string): string {
  const base = originalName.split(/[\\/]/).pop() ?? '';
  const safe = base.normalize('NFKD').replace(/[^A-Za-z0-9._-]+/g, '_').replace(/^[._]+/, '').slice(-120);
  return safe === '' ? 'readings' : safe;
}

export async function putUploadObject(key: string, bytes: Buffer, contentType: string, sha256: string): Promise<void> {
  // A Buffer with its size: the S3 fake has no multipart upload, which size-less streams use.
  await storage().putObject(bucketName(), key, bytes, bytes.length, { 'Content-Type': contentType, 'x-amz-meta-sha256': sha256 });
}

export function getUploadObject(key: string): Promise<Buffer> {
  return objectBytes(key);
}

/** The first `length` bytes of the object (all of it when it is shorter). */
export async function getUploadObjectStart(key: string, length: number): Promise<Buffer> {
  const stream = await storage().getPartialObject(bucketName(), key, 0, length);
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

export function streamUploadObject(key: string): Promise<Readable> {
  return storage().getObject(bucketName(), key);
}

export async function removeUploadObject(key: string): Promise<void> {
  await storage().removeObject(bucketName(), key);
}
