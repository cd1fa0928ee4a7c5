import { existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import cookieParser from 'cookie-parser';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { env } from './config/env.js';
import { createCsrf } from './http/csrf.js';
import { apiNotFound, errorMiddleware } from './http/error-middleware.js';
import { requestLog } from './http/request-log.js';
import { defineRoutes } from './http/routes.js';
import { isSecureOrigin } from './http/session-cookie.js';
import { auditRouter } from './modules/audit/audit.router.js';
import { authRouter } from './modules/auth/auth.router.js';
import { healthRouter } from './modules/health/health.router.js';
import { homeRouter } from './modules/home/home.router.js';
import { invitationsRouter, orgInvitationsRouter } from './modules/invitations/invitations.router.js';
import { membersRouter } from './modules/organisations/members.router.js';
import { consolidationTestsRouter } from './modules/consolidation-tests/consolidation-tests.router.js';
import { jobRunsRouter } from './modules/job-runs/job-runs.router.js';
import { projectClientsRouter } from './modules/projects/project-clients.router.js';
import { projectsRouter } from './modules/projects/projects.router.js';
import { reviewsRouter } from './modules/reviews/reviews.router.js';
import { issuedResultsRouter } from './modules/soil-records/issued-results.router.js';
import { exportsRouter } from './modules/exports/exports.router.js';
import { reportSettingsRouter } from './modules/organisations/report-settings.router.js';
import { reportsRouter } from './modules/reports/reports.router.js';
import { soilRecordsRouter } from './modules/soil-records/soil-records.router.js';
import { importProfilesRouter } from './modules/import-profiles/import-profiles.router.js';
import { readingsRouter } from './modules/readings/readings.router.js';
import { templatesRouter } from './modules/readings-import/templates.router.js';
import { uploadsRouter } from './modules/uploads/uploads.router.js';
import { characteristicSetsRouter } from './modules/characteristic-sets/characteristic-sets.router.js';
import { designRecordsRouter } from './modules/design-records/design-records.router.js';
import { groundModelsRouter } from './modules/ground-models/ground-models.router.js';
import { checkReportsRouter } from './modules/settlement-checks/check-reports.router.js';
import { settlementChecksRouter } from './modules/settlement-checks/settlement-checks.router.js';

/**
 * apps/web/dist, found from the API package's root: this file runs as src/app.ts under tsx and
 * as dist/src/app.js compiled, at different depths.
 */
function defaultWebDist(): string {
  let dir = path.dirname(fileURLToPath(import.meta.url));
  while (!existsSync(path.join(dir, 'package.json')) && path.dirname(dir) !== dir) dir = path.dirname(dir);
  return path.resolve(dir, '../web/dist');
}

export interface AppOptions {
  /** Serve this built web app; by default apps/web/dist, in production only, when it was built. */
  webDist?: string;
  /** Express's `trust proxy`; by default TRUST_PROXY, or none. */
  trustProxy?: string | false;
}

/** The whole HTTP application, without listening; the data source must be initialised. */
export function createApp(options: AppOptions = {}): Express {
  const config = env();
  const app = express();
  app.disable('x-powered-by');
  // X-Forwarded-For is believed only from a configured proxy; otherwise the socket's address counts.
  app.set('trust proxy', options.trustProxy ?? config.TRUST_PROXY ?? false);

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          // plotly injects <style> elements at run time.
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          workerSrc: ["'self'", 'blob:'],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          upgradeInsecureRequests: isSecureOrigin() ? [] : null,
        },
      },
      strictTransportSecurity: isSecureOrigin(),
    }),
  );
  // One short line per request: method, path, status and time — no headers, no cookies.
  if (config.NODE_ENV !== 'test') app.use(requestLog);
  app.use(express.json({ limit: '1mb' }));
  app.use(cookieParser());

  const csrf = createCsrf();
  app.use('/api', csrf.protect);

  app.use(healthRouter());
  app.use(authRouter(csrf));
  app.use(invitationsRouter());
  app.use(orgInvitationsRouter());
  app.use(membersRouter());
  app.use(reportSettingsRouter());
  app.use(auditRouter());
  app.use(homeRouter());
  app.use(projectsRouter());
  app.use(projectClientsRouter());
  app.use(consolidationTestsRouter());
  app.use(reviewsRouter());
  app.use(soilRecordsRouter());
  app.use(issuedResultsRouter());
  app.use(reportsRouter());
  app.use(exportsRouter());
  app.use(jobRunsRouter());
  app.use(uploadsRouter());
  app.use(importProfilesRouter());
  app.use(readingsRouter());
  app.use(templatesRouter());
  app.use(designRecordsRouter());
  app.use(groundModelsRouter());
  app.use(characteristicSetsRouter());
  app.use(settlementChecksRouter());
  app.use(checkReportsRouter());
  app.use('/api', apiNotFound);

  const webDist = options.webDist ?? (config.NODE_ENV === 'production' ? (config.WEB_DIST ?? defaultWebDist()) : undefined);
  if (webDist && existsSync(path.join(webDist, 'index.html'))) {
    app.use(express.static(webDist, { index: false, maxAge: '1h' }));
    // Client-side routes (/, /members, /reset-password?token=…) all load the app shell;
    // `{*splat}` (optional) so that `/` matches too.
    app.use(
      defineRoutes('', [
        { method: 'get', path: '/{*splat}', access: 'public', handler: (_req, res) => res.sendFile(path.join(webDist, 'index.html')) },
      ]),
    );
  }

  app.use(errorMiddleware);
  return app;
}
