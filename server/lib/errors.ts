/** Typed failures thrown by services; the error middleware maps each to one HTTP status. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

export class Invalid extends AppError {
  constructor(message: string, fields?: Record<string, string>) {
    super(400, 'invalid', message, fields);
  }
}

export class Unauthorized extends AppError {
  constructor(message = 'Sign in to continue.') {
    super(401, 'unauthorized', message);
  }
}

export class Forbidden extends AppError {
  constructor(message = 'Your role does not allow this.') {
    super(403, 'forbidden', message);
  }
}

export class NotFound extends AppError {
  constructor(what = 'record') {
    super(404, 'not_found', `No such ${what}.`);
  }
}

/** A stale write: `details` carries the current version so the client can show both copies. */
export class Conflict extends AppError {
  constructor(message: string, details?: unknown) {
    super(409, 'conflict', message, undefined, details);
  }
}

export class UnsupportedMediaType extends AppError {
  constructor(message = 'Send the body as JSON (Content-Type: application/json).') {
    super(415, 'unsupported_media_type', message);
  }
}

export class TooManyRequests extends AppError {
  constructor(message = 'Too many attempts. Wait a few minutes and try again.') {
    super(429, 'too_many_requests', message);
  }
}
