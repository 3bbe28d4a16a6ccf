// The one error type the API throws on purpose: an HTTP status, a stable code, and field errors for forms.
export interface FieldError {
  field: string;
  message: string;
}

export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: FieldError[] = [],
  ) {
    super(message);
  }

  static badRequest(message: string, fields: FieldError[] = []): AppError {
    return new AppError(400, 'bad_request', message, fields);
  }
  static unauthorized(message = 'Sign in to continue.'): AppError {
    return new AppError(401, 'unauthorized', message);
  }
  static forbidden(message = 'Your role does not allow this.'): AppError {
    return new AppError(403, 'forbidden', message);
  }
  static notFound(message = 'Not found.'): AppError {
    return new AppError(404, 'not_found', message);
  }
  static conflict(message: string, fields: FieldError[] = []): AppError {
    return new AppError(409, 'conflict', message, fields);
  }
  static unprocessable(message: string, fields: FieldError[] = []): AppError {
    return new AppError(422, 'unprocessable', message, fields);
  }
}
