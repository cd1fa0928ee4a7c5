import { createHash } from 'node:crypto';
import pg from 'pg';
import type { PostgresDriver } from 'typeorm/driver/postgres/PostgresDriver.js';
import { dataSource } from '../data-source.js';

/** Statement names by SQL text: a short digest, the same in every process. */
const names = new Map<string, string>();

function statementName(text: string): string {
  let name = names.get(text);
  if (name === undefined) {
    name = `porestack_${createHash('sha256').update(text).digest('hex').slice(0, 24)}`;
    names.set(text, name);
  }
  return name;
}

interface PreparingClient {
  query: (config: { name: string; text: string; values: unknown[] }) => Promise<{ rows: unknown[] }>;
}

/**
 * One query as a named prepared statement on a pooled connection. PostgreSQL parses and plans
 * an SQL text once per connection instead of once per call; for the routes every page reads (a
 * session, the tests list, a test) planning was most of the database's work — with the
 * row-level-security policies, a 5-table join planned for 4 ms and ran in 1. The connection
 * comes through the tenant wall (db/tenant-wall.ts) like every other, so the same policies bind.
 *
 * For reads on the hot paths; `text` should be one of a few fixed texts (each distinct text
 * stays prepared on each pooled connection), with every varying value a parameter.
 */
export async function preparedQuery<T>(text: string, values: unknown[]): Promise<T[]> {
  const [client, release] = (await (dataSource.driver as PostgresDriver).obtainMasterConnection()) as [PreparingClient, (error?: unknown) => void];
  try {
    const result = await client.query({ name: statementName(text), text, values });
    release();
    return result.rows as T[];
  } catch (error) {
    // A connection that broke (rather than a query PostgreSQL refused) leaves the pool.
    release(error instanceof pg.DatabaseError ? undefined : error);
    throw error;
  }
}
