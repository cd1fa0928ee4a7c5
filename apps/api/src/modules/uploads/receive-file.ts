import multer from 'multer';
import type { RequestHandler } from 'express';
import { importLimits } from '../readings-import/import-limits.js';
import { fileTooLarge } from './upload.exception.js';

/**
 * multer in memory for the one `file` field, stopped at the size limit: the bytes are held
 * only for this request (sniffed, hashed, stored), so an oversized file is never stored.
 */
export function receiveFile(): RequestHandler {
  const limits = importLimits();
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: limits.maxFileBytes, files: 1, fields: 10 },
    // Browsers send the file name as UTF-8 without saying so.
    defParamCharset: 'utf8',
  }).single('file');
  return (req, res, next) => {
    upload(req, res, (error: unknown) => {
      if (error instanceof multer.MulterError && error.code === 'LIMIT_FILE_SIZE') {
        next(fileTooLarge(limits.maxFileBytes / 1024 / 1024));
        return;
      }
      next(error);
    });
  };
}
