import express, { type NextFunction, type Request, type RequestHandler, type Response } from 'express';

import { AppError, toAppError } from './errors';

// The body parser's failures, each a client error with words for the caller.
const BODY_ERRORS: Record<string, (err: { limit?: number }) => AppError> = {
  'entity.too.large': (err) => new AppError('TOO_LARGE', `The request body is too large: at most ${err.limit ?? 'a few'} bytes here.`),
  'entity.parse.failed': () => new AppError('BAD_INPUT', 'The request body is not valid JSON.'),
  'encoding.unsupported': () => new AppError('UNSUPPORTED_TYPE', 'The request body is in an encoding the server does not read: send it uncompressed or gzip.'),
  'charset.unsupported': () => new AppError('UNSUPPORTED_TYPE', 'The request body must be in UTF-8.'),
  'request.aborted': () => new AppError('BAD_INPUT', 'The request ended before its body was complete.'),
  'request.size.invalid': () => new AppError('BAD_INPUT', 'The request body is not as long as its Content-Length says.'),
  'parameters.too.many': () => new AppError('TOO_LARGE', 'The request has too many parameters.'),
};

const hasBody = (req: Request) => req.headers['transfer-encoding'] !== undefined || (req.headers['content-length'] ?? '0') !== '0';

/** Refuses a body that is not of `type` with 415, before any parser reads it. */
export function requireContentType(type: string, what = type): RequestHandler {
  return (req, _res, next) => {
    if (hasBody(req) && !req.is(type)) return next(new AppError('UNSUPPORTED_TYPE', `Send the request body as ${what} (Content-Type: ${what}).`));
    next();
  };
}

/** A JSON body of at most `limit`: anything else is refused with 415, too much with 413. */
/** Middleware typed loosely on route parameters, so a route that uses it keeps its own inferred. */
export type Middleware = RequestHandler<any>;

export function jsonBody(limit: string): Middleware {
  const check = requireContentType('application/json');
  const parse = express.json({ limit });
  return (req, res, next) => check(req, res, (err?: unknown) => (err ? next(err) : parse(req, res, next)));
}

/** A GraphQL path answers errors in GraphQL's shape; every other path in the REST one. */
export function sendError(req: Request, res: Response, err: AppError, status = err.status): void {
  const body = req.path === '/graphql' ? { errors: [{ message: err.message, extensions: { code: err.code } }] } : { error: err.message };
  // A handler may have set another type (a page, a PDF) before it failed.
  res.removeHeader('Content-Disposition');
  res.status(status).type('json').send(JSON.stringify(body));
}

// Another library's client error (a malformed percent-encoding in the path, a bad range): its own status and words.
function exposedClientError(err: unknown): { status: number; error: AppError } | null {
  const e = err as { status?: unknown; expose?: unknown; message?: unknown };
  if (err instanceof AppError || typeof e.status !== 'number' || e.status < 400 || e.status > 499 || e.expose === false || typeof e.message !== 'string') return null;
  return { status: e.status, error: new AppError(e.status === 404 ? 'NOT_FOUND' : 'BAD_INPUT', e.message) };
}

export function routeNotFound(req: Request, res: Response): void {
  sendError(req, res, new AppError('NOT_FOUND', `Not found: no such route, ${req.method} ${req.path}.`));
}

/** The last middleware: every failure becomes a status and a message; only the unforeseen ones are logged. */
export function errorHandler(err: unknown, req: Request, res: Response, next: NextFunction): void {
  if (res.headersSent) return next(err);
  const type = (err as { type?: unknown }).type;
  if (typeof type === 'string' && BODY_ERRORS[type]) return sendError(req, res, BODY_ERRORS[type](err as { limit?: number }));
  const exposed = exposedClientError(err);
  if (exposed) return sendError(req, res, exposed.error, exposed.status);
  const mapped = toAppError(err);
  if (mapped.code === 'INTERNAL') console.error(err);
  sendError(req, res, mapped);
}
