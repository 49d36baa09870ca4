import { ApiRequestError } from '../../../lib/api-client';

/** What to tell the admin when a request fails: the API's own message where there is one. */
export function apiErrorText(error: unknown): string {
  if (error instanceof ApiRequestError)
    return error.body?.message ?? `Request failed (${error.status})`;
  return 'The server cannot be reached. Check the network and try again.';
}
