import { CsvDelimiterSchema, ImportRequestSchema, ImportTrialRequestSchema } from '@porestack/types';
import { z } from 'zod';
import { uuidParam } from '../../http/params.js';
import { parse } from '../../http/parse.js';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { defineRoutes, type RouteGroup } from '../../http/routes.js';
import { receiveFile } from './receive-file.js';
import { fileMissing } from './upload.exception.js';
import { IMPORTERS, UPLOAD_READERS } from './upload-roles.js';
import { createUpload, findUpload, listUploads, openDownload, previewUpload, requestImport, trialImport } from './uploads.service.js';

const PreviewQuerySchema = z.object({
  delimiter: CsvDelimiterSchema.optional(),
  headerRow: z.coerce.number({ error: 'headerRow must be the number of the row that holds the column names, e.g. 4.' }).int('headerRow must be a whole number, e.g. 4.').min(1, 'headerRow counts from 1 (the first row).').max(100, 'headerRow may be at most 100.').optional(),
});

/** RFC 6266 / 5987: an ASCII fallback and the exact UTF-8 name. */
function attachment(name: string): string {
  const ascii = name.replace(/[^\x20-\x7e]|["\\]/g, '_');
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(name)}`;
}

export function uploadsRouter(): RouteGroup {
  return defineRoutes('/api/orgs/:orgId', [
    {
      method: 'post',
      path: '/tests/:testId/uploads',
      access: IMPORTERS,
      before: [receiveFile()],
      handler: async (req, res) => {
        const testId = uuidParam(req, 'testId', 'test');
        if (!req.file) throw fileMissing();
        const user = currentUser(req);
        const result = await createUpload(currentTenant(req).orgId, testId, { id: user.id, name: user.name }, { originalName: req.file.originalname, bytes: req.file.buffer });
        res.status(201).json(result);
      },
    },
    {
      method: 'get',
      path: '/tests/:testId/uploads',
      access: UPLOAD_READERS,
      handler: async (req, res) => {
        res.json(await listUploads(currentTenant(req).orgId, uuidParam(req, 'testId', 'test')));
      },
    },
    {
      method: 'get',
      path: '/uploads/:uploadId',
      access: UPLOAD_READERS,
      handler: async (req, res) => {
        res.json(await findUpload(currentTenant(req).orgId, uuidParam(req, 'uploadId', 'upload')));
      },
    },
    {
      method: 'get',
      path: '/uploads/:uploadId/download',
      access: UPLOAD_READERS,
      handler: async (req, res) => {
        const { upload, contentType, stream } = await openDownload(currentTenant(req).orgId, uuidParam(req, 'uploadId', 'upload'));
        res.setHeader('content-type', contentType);
        res.setHeader('content-length', String(upload.sizeBytes));
        res.setHeader('content-disposition', attachment(upload.originalName));
        res.setHeader('x-content-sha256', upload.sha256);
        await new Promise<void>((resolve, reject) => {
          stream.on('error', reject);
          res.on('finish', resolve);
          stream.pipe(res);
        });
      },
    },
    {
      method: 'get',
      path: '/uploads/:uploadId/preview',
      access: UPLOAD_READERS,
      handler: async (req, res) => {
        const query = parse(PreviewQuerySchema, req.query);
        res.json(await previewUpload(currentTenant(req).orgId, uuidParam(req, 'uploadId', 'upload'), query));
      },
    },
    {
      method: 'post',
      path: '/uploads/:uploadId/trial',
      access: IMPORTERS,
      handler: async (req, res) => {
        const { mapping } = parse(ImportTrialRequestSchema, req.body);
        res.json(await trialImport(currentTenant(req).orgId, uuidParam(req, 'uploadId', 'upload'), mapping));
      },
    },
    {
      method: 'post',
      path: '/uploads/:uploadId/import',
      access: IMPORTERS,
      handler: async (req, res) => {
        const user = currentUser(req);
        const request = parse(ImportRequestSchema, req.body);
        res.status(202).json(await requestImport(currentTenant(req).orgId, uuidParam(req, 'uploadId', 'upload'), { id: user.id, name: user.name }, request));
      },
    },
  ]);
}
