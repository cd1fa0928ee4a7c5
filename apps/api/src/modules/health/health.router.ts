import { dataSource } from '../../data-source.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { bucketName, storage } from '../../storage/storage.js';

/** How long a check may take before its service counts as down. */
const CHECK_MS = 2_000;

async function answers(check: () => Promise<unknown>): Promise<'ok' | 'down'> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<never>((_resolve, reject) => {
    timer = setTimeout(() => reject(new Error('no answer')), CHECK_MS);
  });
  try {
    await Promise.race([check(), timeout]);
    return 'ok';
  } catch {
    return 'down';
  } finally {
    clearTimeout(timer);
  }
}

/**
 * For a load balancer or a person: 200 when the database and the file storage both answer,
 * otherwise 503, saying which is down.
 */
export function healthRouter(): RouteGroup {
  return defineRoutes('/api/health', [
    {
      method: 'get',
      path: '/',
      access: 'public',
      handler: async (_req, res) => {
        const [database, fileStorage] = await Promise.all([answers(() => dataSource.query('SELECT 1')), answers(() => storage().bucketExists(bucketName()))]);
        const ok = database === 'ok' && fileStorage === 'ok';
        res.status(ok ? 200 : 503).json({ status: ok ? 'ok' : 'degraded', database, storage: fileStorage });
      },
    },
  ]);
}
