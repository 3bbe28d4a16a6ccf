// Receives one uploaded file (multer, to disk) and turns multer's failures into our error shape.
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import multer from 'multer';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { AppError } from '../http/app-error.js';

/** Files go to disk first: a 50 MB logger file is read from there as a stream, never held whole. */
export function fileUpload(uploadsDir: string, maxBytes: number, what: string): RequestHandler {
  const dir = join(uploadsDir, 'incoming');
  mkdirSync(dir, { recursive: true });
  const upload = multer({ dest: dir, limits: { fileSize: maxBytes, files: 1, fields: 20 } }).single('file');
  return (req: Request, res: Response, next: NextFunction) => {
    upload(req, res, (error?: unknown) => {
      if (!error) return next();
      if (error instanceof multer.MulterError) {
        if (error.code === 'LIMIT_FILE_SIZE') return next(new AppError(413, 'too_large', `The ${what} is larger than ${Math.round(maxBytes / 1024 / 1024)} MB.`, [{ field: 'file', message: 'Too large.' }]));
        return next(AppError.badRequest(`The upload is not valid (${error.message}).`, [{ field: error.field ?? 'file', message: error.message }]));
      }
      next(error);
    });
  };
}

export const LOG_FILE_MAX_BYTES = 50 * 1024 * 1024;
export const CERTIFICATE_MAX_BYTES = 10 * 1024 * 1024;
