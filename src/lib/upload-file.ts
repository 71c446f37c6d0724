import type { z } from 'zod';
import { ApiError } from './api-error';
import { forgetCsrfToken, getCsrfToken, toApiError } from './api-client';

/*
 * Multipart uploads with progress. fetch cannot report upload progress, so this one write uses
 * XMLHttpRequest; the CSRF token and the error parsing are api-client's, so both paths behave alike.
 */

type Progress = (fraction: number) => void;

function sendOnce(path: string, form: FormData, token: string, onProgress: Progress): Promise<Response> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', path);
    xhr.withCredentials = true;
    xhr.setRequestHeader('X-CSRF-Token', token);
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded / event.total);
    };
    xhr.onload = () =>
      resolve(new Response(xhr.responseText, { status: xhr.status, headers: { 'Content-Type': xhr.getResponseHeader('Content-Type') ?? '' } }));
    xhr.onerror = () => reject(new ApiError(0, 'NETWORK', 'The upload could not reach the server. Check your connection and try again.'));
    xhr.send(form);
  });
}

/** Posts a multipart form, reporting 0…1 as bytes go out; parses the answer or throws ApiError. */
export async function uploadForm<S extends z.ZodType>(path: string, form: FormData, schema: S, onProgress: Progress = () => {}): Promise<z.output<S>> {
  let response = await sendOnce(path, form, await getCsrfToken(), onProgress);
  if (response.status === 403 && (await toApiError(response.clone())).code === 'CSRF') {
    // Same rule as api-client: the token went stale with the session, so fetch a new one and try once more.
    forgetCsrfToken();
    onProgress(0);
    response = await sendOnce(path, form, await getCsrfToken(), onProgress);
  }
  if (!response.ok) throw await toApiError(response);
  return schema.parse(await response.json());
}
