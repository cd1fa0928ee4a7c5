import type { Response } from 'express';
import { currentUser } from '../../http/request-context.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { RECORD_READERS, REVIEWERS } from '../projects/lab-roles.js';
import { findReport, reportFile, retryReport, toIssuedReport } from './reports.service.js';
import { versionInScope } from './version-subject.js';

/** Sends a stored file as a download, with its SHA-256 so a recipient can check their copy. */
export function sendDownload(res: Response, file: { bytes: Buffer; fileName: string; contentType: string; sha256?: string }): void {
  res.setHeader('Content-Type', file.contentType);
  res.setHeader('Content-Disposition', `attachment; filename="${file.fileName}"`);
  res.setHeader('Cache-Control', 'private, no-store');
  if (file.sha256) {
    res.setHeader('ETag', `"${file.sha256}"`);
    res.setHeader('X-Content-SHA256', file.sha256);
  }
  res.send(file.bytes);
}

export function reportsRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId/soil-records/:recordId/versions/:version/report', [
    {
      method: 'get',
      path: '/',
      access: RECORD_READERS,
      handler: async (req, res) => {
        const { orgId, versionId } = await versionInScope(req);
        res.json(toIssuedReport(await findReport(orgId, 'test-report', versionId)));
      },
    },
    {
      method: 'get',
      path: '/pdf',
      access: RECORD_READERS,
      handler: async (req, res) => {
        const { orgId, versionId } = await versionInScope(req);
        sendDownload(res, { ...(await reportFile(orgId, 'test-report', versionId)), contentType: 'application/pdf' });
      },
    },
    {
      method: 'post',
      path: '/retry',
      access: REVIEWERS,
      handler: async (req, res) => {
        const { orgId, versionId, testId } = await versionInScope(req);
        res.status(202).json(await retryReport(orgId, 'test-report', versionId, currentUser(req), testId));
      },
    },
  ]);
}
