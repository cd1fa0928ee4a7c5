import { describe, expect, it } from 'vitest';
import { bucketName, ensureBucket, storage } from '../storage.js';

describe('ensureBucket()', () => {
  it('when called twice against the S3 fake, then the bucket exists and an object round-trips', async () => {
    await ensureBucket();
    await ensureBucket();
    expect(await storage().bucketExists(bucketName())).toBe(true);
    const key = `tests/roundtrip-${Date.now()}.txt`;
    await storage().putObject(bucketName(), key, Buffer.from('void ratio 0.82'));
    const stream = await storage().getObject(bucketName(), key);
    const chunks: Buffer[] = [];
    for await (const chunk of stream) chunks.push(chunk as Buffer);
    expect(Buffer.concat(chunks).toString()).toBe('void ratio 0.82');
    await storage().removeObject(bucketName(), key);
  });
});
