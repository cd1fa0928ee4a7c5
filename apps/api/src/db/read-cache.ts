import pg from 'pg';
import { databaseUrl, env } from '../config/env.js';
import { logger } from '../http/logger.js';

/** The channel the read-change-notices migration's triggers notify, with an organisation id or '*'. */
export const READS_CHANNEL = 'porestack_reads';

interface Entry {
  value: unknown;
  bytes: number;
  /** The organisation's generation when the value was read; a newer one makes it stale. */
  generation: number;
  storedAt: number;
}

export interface ReadCacheOptions {
  /** Most bytes kept, counted as the callers estimate them; the least recently used go first. */
  maxBytes: number;
  /** A kept read older than this is read again, notice or not (a safety net, not the mechanism). */
  maxAgeMs: number;
}

/**
 * Reads kept in this process until the database says their organisation's rows changed.
 *
 * The pages every member opens again and again (the tests list, a test) are read far more often
 * than they change. Triggers on the tables they are made of (the read-change-notices migration)
 * send a notice at every commit that changes them, from whatever process or person wrote; each
 * API process listens on its own connection and forgets that organisation's kept reads. Nothing is
 * kept while the listening connection is down (the process reads through, then listens again and
 * starts from empty), so a notice lost with a connection never leaves a stale read behind.
 *
 * A read is kept only if no notice for its organisation arrived while it was being read: a change
 * committed after the read's snapshot is either noticed before the read is kept (then it is not
 * kept) or after (then it is forgotten). Writers answer from the database, not from here — a
 * write's own notice may not have arrived when it answers — and forget their organisation's kept
 * reads in their own process as they answer (http/routes.ts).
 */
export class ReadCache {
  private readonly entries = new Map<string, Entry>();
  private readonly generations = new Map<string, number>();
  private everything = 0;
  private bytes = 0;
  private client: pg.Client | null = null;
  private listening = false;
  private stopped = false;
  private retry: NodeJS.Timeout | null = null;
  /** Reads answered from memory, and reads that went to the database (while active). */
  readonly counts = { kept: 0, read: 0 };

  constructor(private readonly options: ReadCacheOptions) {}

  /** Listens for notices; from then on reads are kept. Retries every 2 s while the database is away. */
  async start(): Promise<void> {
    this.stopped = false;
    const client = new pg.Client({ connectionString: databaseUrl(), application_name: 'porestack read notices' });
    const lost = (error?: Error) => {
      if (this.client !== client) return;
      this.client = null;
      this.forgetAll();
      if (this.stopped) return;
      logger.warn({ err: error }, 'the read-change notices stopped; reading through until they are back');
      this.retry = setTimeout(() => void this.start(), 2_000);
      this.retry.unref();
    };
    client.on('notification', (message) => {
      if (message.channel === READS_CHANNEL) this.forget(message.payload ?? '*');
    });
    client.on('error', lost);
    client.on('end', () => lost());
    this.client = client;
    try {
      await client.connect();
      await client.query(`LISTEN ${READS_CHANNEL}`);
      if (this.client === client) this.listening = true;
    } catch (error) {
      lost(error as Error);
      client.end().catch(() => undefined);
    }
  }

  async stop(): Promise<void> {
    this.stopped = true;
    if (this.retry) clearTimeout(this.retry);
    const client = this.client;
    this.client = null;
    this.forgetAll();
    await client?.end().catch(() => undefined);
  }

  /** Whether reads are being kept (the notices are being listened to). */
  get active(): boolean {
    return this.listening;
  }

  /**
   * The kept read of `key` in organisation `orgId`, or `load()`'s, kept when it may be. `bytes`
   * estimates a value's size for the bound.
   */
  async read<T>(orgId: string, key: string, load: () => Promise<T>, bytes: (value: T) => number): Promise<T> {
    if (!this.listening) return load();
    const entryKey = `${orgId}\u0000${key}`;
    const generation = this.generationOf(orgId);
    const kept = this.entries.get(entryKey);
    if (kept && kept.generation === generation && Date.now() - kept.storedAt < this.options.maxAgeMs) {
      // Most recently used last: re-insert.
      this.entries.delete(entryKey);
      this.entries.set(entryKey, kept);
      this.counts.kept += 1;
      return kept.value as T;
    }
    this.counts.read += 1;
    const value = await load();
    if (this.listening && this.generationOf(orgId) === generation) this.keep(entryKey, { value, bytes: bytes(value), generation, storedAt: Date.now() });
    return value;
  }

  private generationOf(orgId: string): number {
    return this.everything + (this.generations.get(orgId) ?? 0);
  }

  private keep(key: string, entry: Entry): void {
    if (entry.bytes > this.options.maxBytes / 4) return;
    const old = this.entries.get(key);
    if (old) {
      this.bytes -= old.bytes;
      this.entries.delete(key);
    }
    this.entries.set(key, entry);
    this.bytes += entry.bytes;
    for (const [oldest, { bytes }] of this.entries) {
      if (this.bytes <= this.options.maxBytes) break;
      this.entries.delete(oldest);
      this.bytes -= bytes;
    }
  }

  /**
   * Makes every read of the organisation ('*': of all) stale; stale entries go as they are met or
   * pushed out. The notices call it; so does a write request of this process once it has answered,
   * so that its own next read never waits on the notice.
   */
  forget(orgId: string): void {
    if (orgId === '*') this.everything += 1;
    else this.generations.set(orgId, (this.generations.get(orgId) ?? 0) + 1);
  }

  private forgetAll(): void {
    this.listening = false;
    this.everything += 1;
    this.entries.clear();
    this.bytes = 0;
  }
}

let shared: ReadCache | null = null;

/** The process's read cache: inactive until `start()` (the API server starts it unless READ_CACHE_MB is 0; tests and scripts read through). */
export function readCache(): ReadCache {
  shared ??= new ReadCache({ maxBytes: env().READ_CACHE_MB * 1024 * 1024, maxAgeMs: 5 * 60_000 });
  return shared;
}
