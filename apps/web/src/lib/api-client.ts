import { ERROR_CODES, type ErrorCode, type FieldErrors } from '@keybed/shared';

/** Codes the client adds for failures that never reached the API or came back unreadable. */
export type ClientErrorCode = 'network_error' | 'bad_response';

export class ApiError extends Error {
  override readonly name = 'ApiError';
  readonly status: number;
  readonly code: ErrorCode | ClientErrorCode;
  readonly fields: FieldErrors | undefined;
  readonly requestId: string | undefined;
  /** What else the error body carried beside `error`, e.g. `current` on a version conflict. */
  readonly details: Readonly<Record<string, unknown>>;

  constructor(init: {
    status: number;
    code: ErrorCode | ClientErrorCode;
    message: string;
    fields?: FieldErrors | undefined;
    requestId?: string | undefined;
    details?: Record<string, unknown> | undefined;
  }) {
    super(init.message);
    this.status = init.status;
    this.code = init.code;
    this.fields = init.fields;
    this.requestId = init.requestId;
    this.details = init.details ?? {};
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

/** Anything with zod's `safeParse`; keeps this module free of a direct zod import. */
export interface ResponseSchema<T> {
  safeParse(value: unknown): { success: true; data: T } | { success: false };
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

const isErrorCode = (value: unknown): value is ErrorCode =>
  typeof value === 'string' && (ERROR_CODES as readonly string[]).includes(value);

function codeForStatus(status: number): ErrorCode {
  if (status === 401) return 'unauthenticated';
  if (status === 403) return 'forbidden';
  if (status === 404) return 'not_found';
  if (status === 409) return 'conflict';
  if (status === 413) return 'payload_too_large';
  if (status === 429) return 'rate_limited';
  if (status === 503) return 'service_unavailable';
  if (status >= 400 && status < 500) return 'validation_failed';
  return 'internal';
}

async function toApiError(response: Response): Promise<ApiError> {
  const body: unknown = await response.json().catch(() => undefined);
  const { error, ...details } = (typeof body === 'object' && body !== null ? body : {}) as { error?: Record<string, unknown> };
  const requestId =
    (typeof error?.requestId === 'string' ? error.requestId : undefined) ??
    response.headers.get('x-request-id') ??
    undefined;
  return new ApiError({
    status: response.status,
    code: isErrorCode(error?.code) ? error.code : codeForStatus(response.status),
    message: typeof error?.message === 'string' ? error.message : `Request failed (${response.status})`,
    fields: error?.fields && typeof error.fields === 'object' ? (error.fields as FieldErrors) : undefined,
    requestId,
    details,
  });
}

/** The part of an error body named `key`, checked with `schema`; undefined when absent or malformed. */
export function errorDetail<T>(error: unknown, key: string, schema: ResponseSchema<T>): T | undefined {
  if (!isApiError(error)) return undefined;
  const parsed = schema.safeParse(error.details[key]);
  return parsed.success ? parsed.data : undefined;
}

async function request<T>(method: Method, path: string, schema?: ResponseSchema<T>, body?: unknown): Promise<T> {
  let response: Response;
  try {
    response = await fetch(`/api${path}`, {
      method,
      credentials: 'same-origin',
      headers: body === undefined ? { Accept: 'application/json' } : { Accept: 'application/json', 'Content-Type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    throw new ApiError({ status: 0, code: 'network_error', message: 'Could not reach the server' });
  }
  if (!response.ok) throw await toApiError(response);
  if (response.status === 204 || !schema) return undefined as T;

  const json: unknown = await response.json().catch(() => undefined);
  const parsed = schema.safeParse(json);
  if (!parsed.success) {
    throw new ApiError({
      status: response.status,
      code: 'bad_response',
      message: `Unexpected response from ${method} /api${path}`,
      requestId: response.headers.get('x-request-id') ?? undefined,
    });
  }
  return parsed.data;
}

/** Paths are relative to `/api`. Pass a response schema to get typed, checked data back. */
export const api = {
  get: <T>(path: string, schema: ResponseSchema<T>) => request('GET', path, schema),
  post: <T = undefined>(path: string, body?: unknown, schema?: ResponseSchema<T>) => request<T>('POST', path, schema, body ?? {}),
  patch: <T>(path: string, body: unknown, schema: ResponseSchema<T>) => request('PATCH', path, schema, body),
  put: <T = undefined>(path: string, body: unknown, schema?: ResponseSchema<T>) => request<T>('PUT', path, schema, body),
  delete: (path: string) => request<undefined>('DELETE', path),
};

/** Checks `body[key]` with `schema` and returns just that part, for `{ members: [...] }`-style replies. */
export function field<T>(key: string, schema: ResponseSchema<T>): ResponseSchema<T> {
  return {
    safeParse: (body) => schema.safeParse(typeof body === 'object' && body !== null ? (body as Record<string, unknown>)[key] : undefined),
  };
}
