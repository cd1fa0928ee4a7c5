import { AsyncLocalStorage } from 'node:async_hooks';
import { PostgresDriver } from 'typeorm/driver/postgres/PostgresDriver.js';

/**
 * The organisation a piece of work acts for (a request under /api/orgs/:orgId, or a job of
 * that organisation). PostgreSQL's row-level security (the tenant_wall policies of the
 * row-level-security migration) reads it from the connection's `porestack.org_id` setting,
 * so a query that forgets its `organisation_id = …` filter still sees only this tenant's rows.
 * Outside any organisation (sign-in, migrations, housekeeping) the setting is empty and the
 * walls stand open, as before.
 */
const tenant = new AsyncLocalStorage<{ readonly orgId: string }>();

export function runInTenant<T>(orgId: string, work: () => T): T {
  return tenant.run({ orgId }, work);
}

/** Runs `work` outside any organisation (the walls open), whichever organisation the caller acts for. */
export function outsideTenant<T>(work: () => T): T {
  return tenant.exit(work);
}

export function currentTenantOrg(): string | null {
  return tenant.getStore()?.orgId ?? null;
}

/** The role the row-level-security migration made; the tenant_wall policies bind it. */
export const TENANT_ROLE = 'porestack_tenant';

/** The organisation each pooled connection was last set to; empty for none. */
const SET_FOR = Symbol('porestack.org');
type Tagged = { [SET_FOR]?: string; query: (config: { name: string; text: string; values: unknown[] }) => Promise<unknown> };

let installed = false;

/**
 * Every connection TypeORM takes from its pool (for a query, a transaction or a COPY) is set
 * to the current organisation before use — one round trip, and only when it was last set to
 * another — so a connection never carries one tenant's setting into another's work.
 */
export function installTenantWall(): void {
  if (installed) return;
  installed = true;
  const obtain = PostgresDriver.prototype.obtainMasterConnection;
  PostgresDriver.prototype.obtainMasterConnection = async function obtainForTenant(this: PostgresDriver) {
    const [connection, release] = (await obtain.call(this)) as [Tagged, (error?: unknown) => void];
    const orgId = currentTenantOrg() ?? '';
    if (connection[SET_FOR] !== orgId) {
      try {
        // Inside an organisation the connection acts as porestack_tenant, whom the policies bind;
        // outside, as the login role again.
        await connection.query({
          name: 'porestack_tenant_wall',
          text: "SELECT set_config('porestack.org_id', $1, false), set_config('role', $2, false)",
          values: [orgId, orgId === '' ? 'none' : TENANT_ROLE],
        });
      } catch (error) {
        release(error);
        throw error;
      }
      connection[SET_FOR] = orgId;
    }
    return [connection, release];
  };
}
