/** A failure the client can act on: status, a stable code and a plain message. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

export class NotFoundError extends AppError {
  constructor(what: string, id?: string | number) {
    super(404, 'NOT_FOUND', id === undefined ? `${what} not found` : `${what} ${id} not found`);
  }
}

export class ConflictError extends AppError {
  constructor(message: string, details?: unknown) {
    super(409, 'CONFLICT', message, details);
  }
}

export class ParseFailedError extends AppError {
  constructor(message: string, details?: unknown) {
    super(422, 'PARSE_FAILED', message, details);
  }
}

export class UnauthorizedError extends AppError {
  constructor(message = 'Sign in first') {
    super(401, 'UNAUTHORIZED', message);
  }
}

export class ForbiddenError extends AppError {
  constructor(message = 'You do not have the role this needs') {
    super(403, 'FORBIDDEN', message);
  }
}

export class InvalidStateError extends AppError {
  constructor(message: string, details?: unknown) {
    super(409, 'INVALID_STATE', message, details);
  }
}
