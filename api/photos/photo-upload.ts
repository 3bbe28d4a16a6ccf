// Reads photo uploads (multipart field "photos") into memory within the limits; limit breaches become clear 4xx errors.
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import multer from 'multer';
import { AppError } from '../http/app-error.js';
import { photoLimits } from './photo-limits.js';

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: photoLimits.maxBytes, files: photoLimits.maxFilesPerRequest, fields: 4, fieldSize: 512 * 1024, parts: photoLimits.maxFilesPerRequest + 4 },
}).array('photos', photoLimits.maxFilesPerRequest);

function toUploadError(error: unknown): AppError {
  if (!(error instanceof multer.MulterError)) return AppError.badRequest('The upload could not be read; send it again.', [{ field: 'photos', message: 'Unreadable upload.' }]);
  const megabytes = Math.round(photoLimits.maxBytes / 1024 / 1024);
  switch (error.code) {
    case 'LIMIT_FILE_SIZE':
      return new AppError(413, 'too_large', `A photo is larger than ${megabytes} MB.`, [{ field: 'photos', message: `At most ${megabytes} MB a photo.` }]);
    case 'LIMIT_FILE_COUNT':
    case 'LIMIT_UNEXPECTED_FILE':
      return error.field && error.field !== 'photos'
        ? AppError.badRequest(`Unexpected file field "${error.field}".`, [{ field: error.field, message: 'Send photos in the "photos" field.' }])
        : new AppError(413, 'too_large', `At most ${photoLimits.maxFilesPerRequest} photos at a time.`, [{ field: 'photos', message: `At most ${photoLimits.maxFilesPerRequest} photos.` }]);
    default:
      return AppError.badRequest(`The upload is not valid (${error.message}).`, [{ field: error.field ?? 'photos', message: error.message }]);
  }
}

/** multer's errors would otherwise reach the error handler as 500s. */
export const photoUpload: RequestHandler = (req: Request, res: Response, next: NextFunction) => {
  upload(req, res, (error?: unknown) => next(error ? toUploadError(error) : undefined));
};

/** The photos of a request (none for a JSON request). */
export function uploadedPhotos(req: Request): Express.Multer.File[] {
  return Array.isArray(req.files) ? req.files : [];
}
