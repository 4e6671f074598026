import { z } from 'zod';
import { tourSchema, type TourDto } from '@shared/schemas/tours';
import { ApiError, apiErrorFrom, csrfHeader, forgetCsrfToken } from '@/lib/api';

/** Bytes of the request body sent so far and in all (the file plus the form's few text fields). */
export interface UploadProgress {
  sent: number;
  total: number;
}

/** Everything one upload needs; `fields` are the optional details sent before the file. */
export interface UploadRequest {
  url: string;
  file: Blob & { name?: string };
  fields?: Record<string, string>;
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
}

const tourResponse = z.object({ tour: tourSchema });

/** The reason an upload promise rejects when the author pressed Cancel. */
export class UploadCancelled extends Error {
  constructor() {
    super('The upload was cancelled.');
    this.name = 'UploadCancelled';
  }
}

/** The field name the server's upload handler reads the file from. */
const VIDEO_FIELD = 'video';

function sendOnce(req: UploadRequest, headers: Record<string, string>): Promise<TourDto> {
  return new Promise<TourDto>((resolve, reject) => {
    if (req.signal?.aborted) return reject(new UploadCancelled());
    const xhr = new XMLHttpRequest();
    const body = new FormData();
    // Text fields go first so the server has them before the (long) file part.
    for (const [key, value] of Object.entries(req.fields ?? {})) body.append(key, value);
    body.append(VIDEO_FIELD, req.file, req.file.name ?? 'video');

    const onAbort = () => xhr.abort();
    req.signal?.addEventListener('abort', onAbort, { once: true });
    const done = () => req.signal?.removeEventListener('abort', onAbort);

    xhr.open('POST', req.url);
    // Same-origin requests carry the session cookie anyway; credentials for other origins are not wanted.
    xhr.withCredentials = false;
    xhr.setRequestHeader('accept', 'application/json');
    for (const [name, value] of Object.entries(headers)) xhr.setRequestHeader(name, value);
    xhr.upload.onprogress = (event) => {
      const total = event.lengthComputable && event.total > 0 ? event.total : req.file.size;
      req.onProgress?.({ sent: Math.min(event.loaded, total), total });
    };
    xhr.onload = () => {
      done();
      if (xhr.status >= 200 && xhr.status < 300) {
        let parsed: unknown;
        try {
          parsed = JSON.parse(xhr.responseText);
        } catch {
          parsed = undefined;
        }
        const checked = tourResponse.safeParse(parsed);
        if (checked.success) return resolve(checked.data.tour);
        return reject(
          new ApiError({ status: xhr.status, code: 'bad_response', message: 'The upload finished, but the answer could not be read. Open My tours to see where it stands.' }),
        );
      }
      reject(apiErrorFrom(xhr.status, xhr.responseText, xhr.getResponseHeader('retry-after')));
    };
    xhr.onerror = () => {
      done();
      reject(apiErrorFrom(0, ''));
    };
    xhr.onabort = () => {
      done();
      reject(new UploadCancelled());
    };
    xhr.send(body);
  });
}

/**
 * Sends a video with XMLHttpRequest, the one browser API that reports upload progress, with the
 * same CSRF header and error shapes as every other call. A stale CSRF token is fetched afresh and
 * the upload sent once more, as apiRequest does; Cancel (the signal) aborts it at once.
 */
export async function uploadVideo(req: UploadRequest): Promise<TourDto> {
  try {
    return await sendOnce(req, await csrfHeader());
  } catch (error) {
    if (error instanceof ApiError && error.status === 403 && error.code === 'csrf_invalid') {
      forgetCsrfToken();
      return sendOnce(req, await csrfHeader());
    }
    throw error;
  }
}

/** Uploads a new tour (POST /api/tours) with optional details. */
export function uploadNewTour(file: UploadRequest['file'], fields: Record<string, string>, opts: Pick<UploadRequest, 'onProgress' | 'signal'> = {}) {
  return uploadVideo({ url: '/api/tours', file, fields, ...opts });
}

/** Replaces the video of an existing tour (POST /api/tours/:id/video). */
export function uploadReplacementVideo(tourId: number, file: UploadRequest['file'], opts: Pick<UploadRequest, 'onProgress' | 'signal'> = {}) {
  return uploadVideo({ url: `/api/tours/${tourId}/video`, file, ...opts });
}
