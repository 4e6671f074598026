/** An error the client should see: status, a stable code, a plain-English message and per-field hints. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
  }
}

export class BadRequest extends HttpError {
  constructor(code: string, message: string, fields?: Record<string, string>) {
    super(400, code, message, fields);
  }
}
export class Unauthorized extends HttpError {
  constructor(code = 'unauthenticated', message = 'Please sign in first.') {
    super(401, code, message);
  }
}
export class Forbidden extends HttpError {
  constructor(code = 'forbidden', message = 'You do not have permission to do that.') {
    super(403, code, message);
  }
}
export class NotFound extends HttpError {
  constructor(message = 'Not found.', code = 'not_found') {
    super(404, code, message);
  }
}
export class Conflict extends HttpError {
  constructor(code: string, message: string, fields?: Record<string, string>) {
    super(409, code, message, fields);
  }
}
