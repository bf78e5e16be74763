/** Small typed errors thrown by services; the one error handler maps them to RFC 9457 problems. */
export type FieldErrors = Record<string, string[]>;

export class HttpError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: string,
    message: string,
    public readonly extra: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

export class ValidationError extends HttpError {
  constructor(message: string, public readonly errors: FieldErrors) {
    super(400, 'validation', message, { errors });
  }
  static field(field: string, message: string): ValidationError {
    return new ValidationError(`${field}: ${message}`, { [field]: [message] });
  }
}

export class NotFound extends HttpError {
  constructor(what = 'Resource') {
    super(404, 'not_found', `${what} not found`);
  }
}

export class Unauthorized extends HttpError {
  constructor(message = 'Sign in to continue') {
    super(401, 'unauthorized', message);
  }
}

/** Wrong e-mail or password: the same answer for both. */
export class BadCredentials extends HttpError {
  constructor() {
    super(401, 'bad_credentials', 'Wrong e-mail or password');
  }
}

export class Forbidden extends HttpError {
  constructor(message = 'Your role cannot do this') {
    super(403, 'forbidden', message);
  }
}

export class Conflict extends HttpError {
  constructor(message: string, extra: Record<string, unknown> = {}) {
    super(409, 'conflict', message, extra);
  }
}

/** A stale edit: carries the current version (and, when given, the current record) so the UI can reload or merge. */
export class StaleEdit extends HttpError {
  constructor(currentVersion: number | null, current?: unknown) {
    super(409, 'stale_version', 'Someone else changed this since you opened it', {
      currentVersion,
      ...(current === undefined ? {} : { current }),
    });
  }
}

export class TooMany extends HttpError {
  constructor(message = 'Too many attempts; try again later') {
    super(429, 'too_many_requests', message);
  }
}
