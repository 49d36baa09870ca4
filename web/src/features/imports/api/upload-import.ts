import { type ApiError, type MonitorImport, monitorImportSchema } from '@upstroke/contracts';
import { ApiRequestError } from '../../../lib/api-client';
import { authStore } from '../../../lib/auth-store';
import { deviceId } from '../../../lib/device';

/**
 * Uploads a monitor file with XMLHttpRequest (fetch reports no upload progress).
 * `onProgress` gets 0–1; a refusal arrives as ApiRequestError with the line errors.
 */
export function uploadImport(
  resuscitationId: string,
  file: File,
  onProgress: (fraction: number) => void,
): Promise<MonitorImport> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/resuscitations/${resuscitationId}/imports`);
    const token = authStore.get()?.accessToken;
    if (token) xhr.setRequestHeader('Authorization', `Bearer ${token}`);
    xhr.setRequestHeader('X-Device-Id', deviceId());
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress(e.loaded / e.total);
    };
    xhr.onload = () => {
      let body: unknown = null;
      try {
        body = JSON.parse(xhr.responseText);
      } catch {
        body = null;
      }
      if (xhr.status >= 200 && xhr.status < 300) resolve(monitorImportSchema.parse(body));
      else reject(new ApiRequestError(xhr.status, body as ApiError | null));
    };
    xhr.onerror = () => reject(new ApiRequestError(0, null));
    const form = new FormData();
    form.append('file', file, file.name);
    xhr.send(form);
  });
}
