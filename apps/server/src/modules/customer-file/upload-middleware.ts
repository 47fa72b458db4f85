import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import type { RequestHandler } from 'express';
import multer from 'multer';
import { AppError } from '../common/errors.js';

/**
 * Size in plain words: "250 MB", "12 KB", "900 bytes" (1 MB = 1,048,576 bytes).
 * @param bytes - a size
 * @returns the text
 * @example
 * sizeText(200 * 1024 * 1024); // '200 MB'
 */
export function sizeText(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${Number((bytes / (1024 * 1024)).toFixed(1))} MB`;
  if (bytes >= 1024) return `${Number((bytes / 1024).toFixed(1))} KB`;
  return `${bytes} bytes`;
}

/**
 * Receives one multipart file in the field `file` onto disk under `uploadsDir` with a random name
 * (never the client's name), refusing more than `maxBytes` with 413 FILE_TOO_LARGE. Run it after
 * the permission check so refused callers never write to disk.
 * @param uploadsDir - folder for raw uploads (created on the first upload)
 * @param maxBytes - UPLOAD_MAX_BYTES
 * @returns express middleware setting `req.file`
 * @example
 * router.post('/', requireMembership(em, PERMISSIONS['customerFile.write']), uploadReceive(dir, limit), handler);
 */
export function uploadReceive(uploadsDir: string, maxBytes: number): RequestHandler {
  let folderReady = false;
  const upload = multer({
    storage: multer.diskStorage({
      destination: uploadsDir,
      filename: (_req, _file, done) => done(null, randomUUID()),
    }),
    limits: { fileSize: maxBytes, files: 1, fields: 10, fieldSize: 10_000 },
  }).single('file');
  return (req, res, next) => {
    if (!folderReady) {
      mkdirSync(uploadsDir, { recursive: true, mode: 0o700 });
      folderReady = true;
    }
    upload(req, res, (err: unknown) => {
      if (!err) {
        if (!req.file) {
          next(
            new AppError(
              400,
              'VALIDATION_FAILED',
              'Send the customer file as multipart/form-data in the field "file".',
              'file',
            ),
          );
          return;
        }
        next();
        return;
      }
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') {
          const declared = Number(req.headers['content-length']);
          const size =
            Number.isFinite(declared) && declared > maxBytes
              ? `is about ${sizeText(declared)}`
              : `is larger than ${sizeText(maxBytes)}`;
          next(
            new AppError(
              413,
              'FILE_TOO_LARGE',
              `The file ${size}; the limit is ${sizeText(maxBytes)}. Split the file or raise UPLOAD_MAX_BYTES.`,
              'file',
            ),
          );
          return;
        }
        const field = err.field ? ` (field "${err.field}")` : '';
        next(
          new AppError(
            400,
            'VALIDATION_FAILED',
            `Upload refused: ${err.message}${field}. Send one file in the field "file".`,
            'file',
          ),
        );
        return;
      }
      next(err);
    });
  };
}
