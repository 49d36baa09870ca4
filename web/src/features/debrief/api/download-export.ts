import { authStore } from '../../../lib/auth-store';
import { deviceId } from '../../../lib/device';
import { ApiRequestError } from '../../../lib/api-client';

/** Fetches a chart export with the user's token and hands it to the browser as a file. */
export async function downloadExport(id: string, kind: 'pdf' | 'fhir'): Promise<void> {
  const path = kind === 'pdf' ? 'report.pdf' : 'fhir';
  const token = authStore.get()?.accessToken;
  const res = await fetch(`/api/resuscitations/${id}/${path}`, {
    headers: { 'X-Device-Id': deviceId(), ...(token ? { Authorization: `Bearer ${token}` } : {}) },
  });
  if (!res.ok) throw new ApiRequestError(res.status, null);
  const blob = await res.blob();
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = `resuscitation-${id.slice(0, 8)}.${kind === 'pdf' ? 'pdf' : 'fhir.json'}`;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
