/** Errors that carry their HTTP status; the error middleware turns them into `{error, message, details}`. */
export class HttpError extends Error {
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

export class BadRequestError extends HttpError {
  constructor(message: string, details?: unknown) {
    super(400, 'bad_request', message, details);
  }
}

export class UnauthorizedError extends HttpError {
  constructor(message = 'Sign-in required') {
    super(401, 'unauthorized', message);
  }
}

export class ForbiddenError extends HttpError {
  constructor(message = 'You do not have the role this action needs') {
    super(403, 'forbidden', message);
  }
}

export class NotFoundError extends HttpError {
  constructor(message: string) {
    super(404, 'not_found', message);
  }
}

export class ConflictError extends HttpError {
  constructor(message: string, details?: unknown) {
    super(409, 'conflict', message, details);
  }
}

export class PayloadTooLargeError extends HttpError {
  constructor(message: string) {
    super(413, 'payload_too_large', message);
  }
}

export class UnsupportedMediaTypeError extends HttpError {
  constructor(message: string) {
    super(415, 'unsupported_media_type', message);
  }
}

export class UnprocessableError extends HttpError {
  constructor(message: string, details?: unknown) {
    super(422, 'unprocessable', message, details);
  }
}

export class TooManyRequestsError extends HttpError {
  constructor(message: string) {
    super(429, 'too_many_requests', message);
  }
}

export class ServiceUnavailableError extends HttpError {
  constructor(message: string) {
    super(503, 'service_unavailable', message);
  }
}
