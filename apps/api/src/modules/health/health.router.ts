import type { Router } from 'express';
import { dataSource } from '../../data-source.js';
import { DomainError } from '../../errors/domain-error.js';
import { defineRoutes } from '../../http/routes.js';

export function healthRouter(): Router {
  return defineRoutes('/api/health', [
    {
      method: 'get',
      path: '/',
      access: 'public',
      handler: async (_req, res) => {
        try {
          await dataSource.query('SELECT 1');
        } catch {
          throw new DomainError('service_unavailable', 'The database is not answering. Try again in a moment.');
        }
        res.json({ status: 'ok', database: 'ok' });
      },
    },
  ]);
}
