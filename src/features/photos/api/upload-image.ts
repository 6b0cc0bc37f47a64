import { ApiError } from '@/lib/api-client';

/**
 * Sends a multipart upload with XMLHttpRequest, which (unlike fetch) reports upload progress.
 * It carries the same X-Requested-With header as every other state-changing call, and the
 * server's error shape becomes the same ApiError.
 * @param onProgress called with the fraction sent, 0 to 1
 */
export function uploadImage<T>(path: string, method: 'POST' | 'PUT', form: FormData, onProgress?: (fraction: number) => void): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open(method, `/api${path}`);
    xhr.setRequestHeader('X-Requested-With', 'XMLHttpRequest');
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.addEventListener('progress', (event) => {
      if (event.lengthComputable && event.total > 0) onProgress?.(event.loaded / event.total);
    });
    xhr.addEventListener('load', () => {
      let data: unknown;
      try {
        data = xhr.responseText ? JSON.parse(xhr.responseText) : undefined;
      } catch {
        data = undefined;
      }
      if (xhr.status >= 200 && xhr.status < 300) return resolve(data as T);
      const err = (data as { error?: { code?: string; message?: string; fields?: Record<string, string> } } | undefined)?.error;
      reject(new ApiError(xhr.status, err?.code ?? 'http_error', err?.message ?? `The server answered ${xhr.status}.`, err?.fields ?? {}));
    });
    xhr.addEventListener('error', () => reject(new ApiError(0, 'network', 'The upload was cut off: check the connection and try again.')));
    xhr.addEventListener('abort', () => reject(new ApiError(0, 'aborted', 'The upload was stopped.')));
    xhr.send(form);
  });
}
