import multer from 'multer';
import type { RequestHandler } from 'express';
import { importLimits } from '../readings-import/import-limits.js';
import { fileTooLarge, malformedUpload } from './upload.exception.js';

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
      // Anything else multer or busboy refuses is a body the client sent wrong (a cut-off or
      // malformed form, a file name with control characters such as NUL, which busboy refuses
      // as a malformed part header): 400 saying how to send it, never a 500.
      next(error ? malformedUpload() : undefined);
    });
  };
}
