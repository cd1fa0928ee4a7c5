import * as Minio from 'minio';
import { env } from '../config/env.js';

let client: Minio.Client | undefined;

/**
 * The object store behind S3_ENDPOINT (the local S3 fake, MinIO or S3). Path-style
 * addressing works with all three; virtual-host style does not work with the fake.
 */
export function storage(): Minio.Client {
  if (client) return client;
  const config = env();
  const url = new URL(config.S3_ENDPOINT);
  const useSSL = url.protocol === 'https:';
  client = new Minio.Client({
    endPoint: url.hostname,
    port: Number(url.port || (useSSL ? 443 : 80)),
    useSSL,
    accessKey: config.S3_ACCESS_KEY,
    secretKey: config.S3_SECRET_KEY,
    region: config.S3_REGION,
    pathStyle: true,
  });
  return client;
}

/** Drops the client, so the next call connects anew from the environment (tests that move the endpoint). */
export function forgetStorageClient(): void {
  client = undefined;
}

export function bucketName(): string {
  return env().S3_BUCKET;
}

/** Creates the bucket when missing; called at start by the server and the worker. */
export async function ensureBucket(): Promise<void> {
  const s3 = storage();
  const bucket = bucketName();
  if (await s3.bucketExists(bucket)) return;
  try {
    await s3.makeBucket(bucket, env().S3_REGION);
  } catch (error) {
    // Another process (API_PROCESSES > 1, or the worker) made it first.
    if (!(await s3.bucketExists(bucket))) throw error;
  }
}

/** The whole object as bytes (uploads and reports are small enough to hold in memory). */
export async function objectBytes(key: string): Promise<Buffer> {
  const stream = await storage().getObject(bucketName(), key);
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}
