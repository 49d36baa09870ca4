import type { ApiError } from '@upstroke/contracts';
import type { z } from 'zod';
import { authStore } from './auth-store';
import { deviceId } from './device';

/** An API failure in the one error shape, with the HTTP status. */
export class ApiRequestError extends Error {
  constructor(
    readonly status: number,
    readonly body: ApiError | null,
  ) {
    super(body?.message ?? `Request failed (${status})`);
  }
}

export interface ApiOptions<S extends z.ZodType | undefined> {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: unknown;
  schema?: S;
  headers?: Record<string, string>;
  signal?: AbortSignal;
}

/**
 * Calls the API with the signed-in user's token. A 401 signs the user out (the router
 * then shows Sign in); a response is checked against `schema` when one is given.
 */
export async function apiFetch<S extends z.ZodType | undefined = undefined>(
  path: string,
  options: ApiOptions<S> = {},
): Promise<S extends z.ZodType ? z.infer<S> : unknown> {
  const token = authStore.get()?.accessToken;
  const headers: Record<string, string> = {
    Accept: 'application/json',
    'X-Device-Id': deviceId(),
    ...options.headers,
  };
  if (token) headers.Authorization = `Bearer ${token}`;
  let body: BodyInit | undefined;
  if (options.body instanceof FormData) body = options.body;
  else if (options.body !== undefined) {
    headers['Content-Type'] = 'application/json';
    body = JSON.stringify(options.body);
  }
  const res = await fetch(`/api${path}`, {
    method: options.method ?? 'GET',
    headers,
    body,
    signal: options.signal,
  });
  const text = await res.text();
  const json: unknown = text ? safeJson(text) : null;
  if (!res.ok) {
    if (res.status === 401 && token) authStore.clear();
    throw new ApiRequestError(res.status, (json as ApiError | null) ?? null);
  }
  return (options.schema ? options.schema.parse(json) : json) as S extends z.ZodType
    ? z.infer<S>
    : unknown;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}
