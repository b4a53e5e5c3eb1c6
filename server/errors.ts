/** Base for every error the API answers on purpose; the error middleware keeps its status. */
export class AppError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: string,
    message: string,
    public readonly details?: unknown,
  ) {
    super(message);
  }
}
export class ValidationError extends AppError {
  constructor(message: string, details?: unknown) {
    super(400, 'validation_failed', message, details);
  }
}
export class UnauthorizedError extends AppError {
  constructor(message = 'Sign in to do this.') {
    super(401, 'unauthorized', message);
  }
}
export class ForbiddenError extends AppError {
  constructor(message = 'You are not allowed to do this.', code = 'forbidden') {
    super(403, code, message);
  }
}
export class NotFoundError extends AppError {
  constructor(message = 'Not found.') {
    super(404, 'not_found', message);
  }
}
export class ConflictError extends AppError {
  constructor(message: string, code = 'conflict') {
    super(409, code, message);
  }
}
/** The disk holding uploads is full (ENOSPC) or over quota (EDQUOT): 507, nothing stored. */
export class InsufficientStorageError extends AppError {
  constructor() {
    super(507, 'insufficient_storage', 'The server has no room for this upload right now; try again later.');
  }
}
