/** Typed HTTP errors: thrown anywhere, turned into JSON once, in the error middleware. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

export class BadRequest extends HttpError {
  constructor(message = 'Some fields need attention.', fields?: Record<string, string>) {
    super(400, 'bad_request', message, fields);
  }
}

export class Unauthorized extends HttpError {
  constructor(message = 'Please sign in.') {
    super(401, 'unauthorized', message);
  }
}

export class Forbidden extends HttpError {
  constructor(message = 'You may not do that.') {
    super(403, 'forbidden', message);
  }
}

export class NotFound extends HttpError {
  constructor(message = 'Not found.') {
    super(404, 'not_found', message);
  }
}

export class Conflict extends HttpError {
  constructor(message: string, fields?: Record<string, string>) {
    super(409, 'conflict', message, fields);
  }
}

export class Gone extends HttpError {
  constructor(message: string) {
    super(410, 'gone', message);
  }
}
