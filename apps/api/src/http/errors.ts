import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import type { ErrorBody, ErrorCode, FieldErrors } from '@keybed/shared';

/** The one error type services throw; the central handler turns it into the shared error shape. */
export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    readonly status: number,
    message: string,
    readonly fields?: FieldErrors,
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
  }
}

export const notFound = (what = 'That record') => new AppError('not_found', 404, `${what} was not found`);

export function fieldErrorsOf(error: ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.') || '_';
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}

function body(code: ErrorCode, message: string, requestId: string, fields?: FieldErrors): ErrorBody {
  return { error: { code, message, ...(fields ? { fields } : {}), requestId } };
}

/** Body-parser failures carry `type` and `status`; nothing else from outside is trusted. */
function bodyParserError(err: unknown): AppError | null {
  const e = err as { type?: string; status?: number };
  if (e?.type === 'entity.parse.failed') return new AppError('validation_failed', 400, 'The request body is not valid JSON');
  if (e?.type === 'entity.too.large') return new AppError('payload_too_large', 413, 'The request body is too large');
  if (typeof e?.status === 'number' && e.status >= 400 && e.status < 500 && e.type) {
    return new AppError('validation_failed', 400, 'The request could not be read');
  }
  return null;
}

export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const requestId = String(req.id ?? '');
  if (err instanceof ZodError) {
    res.status(400).json(body('validation_failed', 'Some fields need attention', requestId, fieldErrorsOf(err)));
    return;
  }
  const known = err instanceof AppError ? err : bodyParserError(err);
  if (known) {
    res.status(known.status).json({ ...body(known.code, known.message, requestId, known.fields), ...known.extra });
    return;
  }
  req.log.error({ err }, 'unhandled error');
  res.status(500).json(body('internal', 'Something went wrong on our side. Try again; if it keeps happening, tell us the request id.', requestId));
};

export const apiNotFound: RequestHandler = (_req, _res, next) => next(new AppError('not_found', 404, 'No such API route'));
