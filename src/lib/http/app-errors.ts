// Domain failures of the portal, each mapped once to an HTTP status (see to-http-response.ts).

/** One refused field: its machine path (for programs), optionally its name in words, and what is wrong, in words. */
export interface FieldIssue {
  path: string;
  label?: string;
  message: string;
}

export class AppError extends Error {
  constructor(
    message: string,
    readonly status: 400 | 401 | 403 | 404 | 409 | 413 | 422 | 429 | 503,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

export class UnauthenticatedError extends AppError {
  constructor(message = 'Sign in to continue.') {
    super(message, 401);
  }
}

export class ForbiddenError extends AppError {
  constructor(message = 'Your role does not allow this.') {
    super(message, 403);
  }
}

export class NotFoundError extends AppError {
  constructor(message = 'Not found.') {
    super(message, 404);
  }
}

export class ConflictError extends AppError {
  constructor(message: string) {
    super(message, 409);
  }
}

/** 429 when one client asks too often; 503 when the server as a whole is too busy, whoever asks. */
export class ThrottledError extends AppError {
  constructor(
    message: string,
    /** Sent as Retry-After when set. */
    readonly retryAfterSeconds?: number,
    status: 429 | 503 = 429,
  ) {
    super(message, status);
  }
}

export class InvalidRequestError extends AppError {
  constructor(
    readonly issues: FieldIssue[],
    message = 'Some fields need attention.',
  ) {
    super(message, 400);
  }
}

/** Well-formed input that the domain cannot act on (for example a case with no physical solution). */
export class UnprocessableError extends AppError {
  constructor(
    message: string,
    readonly issues: FieldIssue[] = [],
  ) {
    super(message, 422);
  }
}
