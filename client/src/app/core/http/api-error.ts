// A failed API call in one shape, whatever went wrong: status, the server's message, and field errors.
import { HttpErrorResponse } from '@angular/common/http';
import type { ApiErrorBody } from '@shared/api/error-body.js';

export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields: { field: string; message: string }[] = [],
  ) {
    super(message);
  }

  static from(error: unknown): ApiError {
    if (error instanceof ApiError) return error;
    if (error instanceof HttpErrorResponse) {
      const body = error.error as Partial<ApiErrorBody> | null;
      if (body?.error?.message) return new ApiError(error.status, body.error.message, body.error.fields ?? []);
      if (error.status === 0) return new ApiError(0, 'No connection to Vialyard. Check the network and try again.');
      return new ApiError(error.status, `The server answered ${error.status} ${error.statusText}.`);
    }
    return new ApiError(0, error instanceof Error ? error.message : 'Something went wrong.');
  }
}
