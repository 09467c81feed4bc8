import { ERROR_CODES, UploadList, type ErrorCode, type Upload } from '@keybed/shared';
import { ApiError } from '@/lib/api-client';

interface UploadPhotoInput {
  file: File;
  surveyComponentId: string;
  /** Share of the file sent so far, 0 to 1. */
  onProgress: (fraction: number) => void;
  signal?: AbortSignal;
}

const isErrorCode = (value: unknown): value is ErrorCode => typeof value === 'string' && (ERROR_CODES as readonly string[]).includes(value);

function errorFrom(xhr: XMLHttpRequest): ApiError {
  let body: { error?: { code?: unknown; message?: unknown; fields?: unknown; requestId?: unknown } } = {};
  try {
    body = JSON.parse(xhr.responseText) as typeof body;
  } catch {
    // Not JSON (a proxy's page): the status decides.
  }
  const e = body.error ?? {};
  return new ApiError({
    status: xhr.status,
    code: isErrorCode(e.code) ? e.code : xhr.status === 413 ? 'payload_too_large' : xhr.status >= 500 ? 'internal' : 'validation_failed',
    message: typeof e.message === 'string' ? e.message : `The photo could not be uploaded (${xhr.status})`,
    fields: e.fields && typeof e.fields === 'object' ? (e.fields as Record<string, string[]>) : undefined,
    requestId: typeof e.requestId === 'string' ? e.requestId : (xhr.getResponseHeader('x-request-id') ?? undefined),
  });
}

/**
 * `POST /api/uploads` with one photo for a survey component. XMLHttpRequest rather than fetch,
 * because only it reports upload progress. Rejects with an ApiError carrying the API's message.
 */
export function uploadPhoto({ file, surveyComponentId, onProgress, signal }: UploadPhotoInput): Promise<Upload> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', '/api/uploads');
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => event.lengthComputable && onProgress(event.loaded / event.total);
    xhr.onerror = () => reject(new ApiError({ status: 0, code: 'network_error', message: 'Could not reach Keybed' }));
    xhr.onabort = () => reject(new ApiError({ status: 0, code: 'network_error', message: 'The upload was stopped' }));
    xhr.onload = () => {
      if (xhr.status < 200 || xhr.status >= 300) return reject(errorFrom(xhr));
      let json: unknown;
      try {
        json = JSON.parse(xhr.responseText);
      } catch {
        json = undefined;
      }
      const parsed = UploadList.safeParse(json);
      const upload = parsed.success ? parsed.data.uploads[0] : undefined;
      if (!upload) return reject(new ApiError({ status: xhr.status, code: 'bad_response', message: 'Unexpected reply to the upload' }));
      onProgress(1);
      resolve(upload);
    };
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    const form = new FormData();
    form.append('surveyComponentId', surveyComponentId);
    form.append('files', file, file.name || 'photo.jpg');
    xhr.send(form);
  });
}
