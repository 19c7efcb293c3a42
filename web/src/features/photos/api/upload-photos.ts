import { IDEMPOTENCY_KEY_HEADER, type ErrorResponse, type PhotoUploadResponse } from '@peakwise/shared';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useReducer, useRef, useState } from 'react';
import { ApiError, isApiError } from '@/lib/api-client';
import { checkPick } from '../utils/photo-checks';
import { uploadErrorMessage, worthRetrying } from '../utils/upload-errors';
import { uploadReducer, type UploadItem } from '../utils/upload-state';
import { photoKeys, photosPath, type PhotoTarget } from './query-keys';

export interface UploadOptions {
  onProgress: (sent: number, total: number) => void;
  /** The same key again only for a retry of an upload that never got an answer. */
  idempotencyKey: string;
}

function parseError(xhr: XMLHttpRequest): ErrorResponse {
  let body: unknown;
  try {
    body = JSON.parse(xhr.responseText) as unknown;
  } catch {
    body = undefined;
  }
  const server = body as Partial<ErrorResponse> | undefined;
  const message = typeof server?.message === 'string' ? server.message : null;
  return {
    statusCode: xhr.status,
    error: typeof server?.error === 'string' ? server.error : xhr.statusText,
    message: uploadErrorMessage(xhr.status, message),
    ...(Array.isArray(server?.details) ? { details: server.details } : {}),
  };
}

/**
 * POST /api/feedings/:id/photos, /api/rise-checks/:id/photos or /api/plans/:id/photos, multipart
 * with the file in the field "photos" → 201 PhotoUploadResponse. XMLHttpRequest rather than fetch,
 * because only it reports upload progress. One file per request, so each file shows its own
 * progress and its own refusal (415, 413, 422) without failing the others.
 */
export function uploadPhoto(target: PhotoTarget, file: File, options: UploadOptions): Promise<PhotoUploadResponse> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api${photosPath(target)}`);
    xhr.withCredentials = false; // same origin: the session cookie goes anyway, never to another host
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader(IDEMPOTENCY_KEY_HEADER, options.idempotencyKey);
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) options.onProgress(event.loaded, event.total);
    };
    xhr.onload = () => {
      if (xhr.status >= 200 && xhr.status < 300) {
        try {
          resolve(JSON.parse(xhr.responseText) as PhotoUploadResponse);
        } catch {
          resolve({ items: [] });
        }
      } else {
        reject(new ApiError(parseError(xhr)));
      }
    };
    // Only when no answer came at all (offline, connection dropped mid-upload).
    xhr.onerror = () =>
      reject(new ApiError({ statusCode: 0, error: 'Network Error', message: uploadErrorMessage(0, null) }));
    const form = new FormData();
    form.append('photos', file, file.name);
    xhr.send(form);
  });
}

export interface PhotoUploads {
  items: UploadItem[];
  /** Problem with the pick as a whole (too many at once); nothing of it was sent. */
  pickProblem: string | null;
  add: (files: readonly File[]) => void;
  retry: (key: string) => void;
  dismiss: (key: string) => void;
}

/**
 * The uploader's queue: files go up one after another (a phone on a kitchen's Wi-Fi does better
 * with one stream than five), each with its progress; every photo list refreshes as each lands.
 */
export function usePhotoUploads(target: PhotoTarget): PhotoUploads {
  const queryClient = useQueryClient();
  const [items, dispatch] = useReducer(uploadReducer, []);
  const [pickProblem, setPickProblem] = useState<string | null>(null);
  const files = useRef(new Map<string, File>());
  const keys = useRef(new Map<string, string>());
  const sending = useRef(false);

  const add = useCallback((picked: readonly File[]) => {
    const check = checkPick(picked);
    setPickProblem(check.problem);
    const added = check.files.map(({ file, problem }) => {
      const key = crypto.randomUUID();
      if (problem === null) files.current.set(key, file);
      return { key, name: file.name, size: file.size, problem };
    });
    if (added.length > 0) dispatch({ type: 'add', items: added });
  }, []);

  useEffect(() => {
    if (sending.current) return;
    const next = items.find((i) => i.status === 'waiting');
    const file = next && files.current.get(next.key);
    if (!next || !file) return;
    sending.current = true;
    const idempotencyKey = keys.current.get(next.key) ?? crypto.randomUUID();
    keys.current.set(next.key, idempotencyKey);
    dispatch({ type: 'start', key: next.key });
    uploadPhoto(target, file, {
      idempotencyKey,
      onProgress: (sent, total) => dispatch({ type: 'progress', key: next.key, sent, total }),
    })
      .then(() => {
        // Cleared before the dispatch, so the render it causes can start the next file.
        sending.current = false;
        files.current.delete(next.key);
        dispatch({ type: 'done', key: next.key });
        void queryClient.invalidateQueries({ queryKey: photoKeys.all });
      })
      .catch((error: unknown) => {
        sending.current = false;
        const status = isApiError(error) ? error.status : -1;
        // A new key for the next try unless this one never got an answer (the server may have it).
        if (status !== 0) keys.current.delete(next.key);
        const message = isApiError(error) ? error.message : uploadErrorMessage(-1, null);
        dispatch({ type: 'failed', key: next.key, message, retryable: worthRetrying(status) });
      });
  }, [items, target, queryClient]);

  const retry = useCallback((key: string) => dispatch({ type: 'retry', key }), []);
  const dismiss = useCallback((key: string) => {
    files.current.delete(key);
    keys.current.delete(key);
    dispatch({ type: 'dismiss', key });
  }, []);

  return { items, pickProblem, add, retry, dismiss };
}
