/**
 * Errors the data layer raises on purpose. Route handlers turn them into HTTP answers; anything
 * else is a fault and becomes a plain 500 without details.
 */
export class NotFoundError extends Error {
  readonly status = 404;
  constructor(what = 'Not found') {
    super(what);
  }
}
export class ForbiddenError extends Error {
  readonly status = 403;
}
export class ConflictError extends Error {
  readonly status = 409;
  /** Plain facts the answer carries beside the message (e.g. `{ confirm: 'unapproved-revision' }`). */
  constructor(message?: string, readonly extra: Record<string, string | number | boolean | null> = {}) {
    super(message);
  }
}
export class VersionConflictError<T = unknown> extends Error {
  readonly status = 412;
  constructor(readonly current: T) {
    super('Someone saved this layout after you opened it.');
  }
}
export class BadRequestError extends Error {
  readonly status = 400;
}
