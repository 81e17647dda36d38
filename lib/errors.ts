// Typed application errors: each maps to one HTTP status and one clear message.
export type FieldErrors = Record<string, string[]>;

export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
  }
}

export class UnauthenticatedError extends AppError {
  constructor(message = "Sign in to do this.") {
    super(401, "unauthenticated", message);
  }
}

export class ForbiddenError extends AppError {
  constructor(message = "Your role does not allow this.") {
    super(403, "forbidden", message);
  }
}

export class NotFoundError extends AppError {
  constructor(what = "record") {
    super(404, "not_found", `No such ${what}.`);
  }
}

export class ValidationError extends AppError {
  constructor(message: string, fields: FieldErrors = {}) {
    super(400, "invalid_input", message, { fields });
  }
}

/** Someone else saved the record since the caller read it; `current` is what is stored now. */
export class ConflictError extends AppError {
  constructor(message: string, current?: unknown) {
    super(409, "version_conflict", message, current === undefined ? undefined : { current });
  }
}

export class TooManyRequestsError extends AppError {
  constructor(message: string, retryAfterSeconds: number) {
    super(429, "too_many_requests", message, { retryAfterSeconds });
  }
}
