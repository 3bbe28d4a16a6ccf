// The one error handler: our AppErrors as they are, body-parser and database failures mapped, anything else a logged 500.
import type { NextFunction, Request, Response } from 'express';
import { ConnectionError } from 'sequelize';
import type { Logger } from 'pino';
import type { ApiErrorBody } from '../../shared/api/error-body.js';
import { AppError } from './app-error.js';

interface HttpishError {
  status?: number;
  statusCode?: number;
  type?: string;
  code?: string;
}

function databaseUnavailable(error: unknown): boolean {
  if (error instanceof ConnectionError) return true;
  const code = (error as HttpishError)?.code;
  return code === 'ECONNREFUSED' || code === '57P01' || code === '57P03' || code === 'ECONNRESET';
}

export function toAppError(error: unknown): AppError | null {
  if (error instanceof AppError) return error;
  const e = error as HttpishError;
  if (e?.type === 'entity.parse.failed') return AppError.badRequest('The request body is not valid JSON.');
  if (e?.type === 'entity.too.large') return new AppError(413, 'too_large', 'The request body is too large.');
  if (e?.type === 'charset.unsupported' || e?.type === 'encoding.unsupported') {
    return new AppError(415, 'unsupported', 'The request body encoding is not supported.');
  }
  if (databaseUnavailable(error)) return new AppError(503, 'unavailable', 'The database is not reachable just now; try again in a moment.');
  return null;
}

export function errorHandler(logger: Logger) {
  return (error: unknown, req: Request, res: Response, _next: NextFunction) => {
    const known = toAppError(error);
    if (!known) logger.error({ err: error, url: req.originalUrl }, 'unhandled error');
    const appError = known ?? new AppError(500, 'internal', 'Something went wrong on our side; it has been logged.');
    if (res.headersSent) {
      res.end();
      return;
    }
    const body: ApiErrorBody = {
      error: { code: appError.code, message: appError.message, ...(appError.fields.length && { fields: appError.fields }) },
    };
    res.status(appError.status).json(body);
  };
}
