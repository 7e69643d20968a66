import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import type { ApiErrorBody } from '../../shared/schemas/api-error';
import { HttpError } from '../lib/http-error';

export const apiNotFound: RequestHandler = (req, res) => {
  const body: ApiErrorBody = { error: { code: 'not_found', message: `No API route ${req.method} ${req.originalUrl.split('?')[0]}.` } };
  res.status(404).json(body);
};

function isSqliteConstraint(error: unknown): error is Error & { code: string } {
  return error instanceof Error && 'code' in error && String(error.code).startsWith('SQLITE_CONSTRAINT');
}

function clientErrorStatus(error: unknown): number | undefined {
  if (typeof error !== 'object' || !error || !('status' in error)) return undefined;
  const { status } = error;
  return typeof status === 'number' && status >= 400 && status < 500 ? status : undefined;
}

/** The one JSON error handler, registered last. */
export const errorHandler: ErrorRequestHandler = (error, _req, res, _next) => {
  const clientStatus = clientErrorStatus(error);
  let status = 500;
  let body: ApiErrorBody = { error: { code: 'internal', message: 'Something went wrong on our side.' } };
  if (error instanceof HttpError) {
    status = error.status;
    body = { error: { code: error.code, message: error.message } };
  } else if (error instanceof ZodError) {
    status = 422;
    body = {
      error: {
        code: 'invalid_input',
        message: 'Some fields need attention.',
        issues: error.issues.map((issue) => ({ path: issue.path.join('.'), message: issue.message })),
      },
    };
  } else if (isSqliteConstraint(error) && error.code === 'SQLITE_CONSTRAINT_UNIQUE') {
    status = 409;
    body = { error: { code: 'conflict', message: 'That already exists.' } };
  } else if (error instanceof SyntaxError && 'status' in error && error.status === 400) {
    status = 400;
    body = { error: { code: 'malformed_json', message: 'The request body is not valid JSON.' } };
  } else if (typeof error === 'object' && error && 'status' in error && error.status === 413) {
    status = 413;
    body = { error: { code: 'too_large', message: 'The request is too large.' } };
  } else if (error instanceof URIError) {
    // Express could not decode a percent-escape in the path (`/musicians/%E0%A4%A`).
    status = 400;
    body = { error: { code: 'malformed_url', message: 'The address is not valid: a %-escape in it cannot be read.' } };
  } else if (clientStatus) {
    // Express and its body parsers mark what was wrong with the request itself (http-errors' `status`).
    status = clientStatus;
    body = { error: { code: 'bad_request', message: 'The request could not be read.' } };
  } else {
    console.error('[error]', error);
  }
  res.status(status).json(body);
};
