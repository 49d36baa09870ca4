/** Domain errors thrown by services; the exception filter maps each to one HTTP status. */
export class DomainError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: { path: string; message: string }[],
  ) {
    super(message);
  }
}

export const notFound = (what: string) => new DomainError(404, 'Not Found', `${what} not found`);
export const forbidden = (message = 'You do not have access to this') =>
  new DomainError(403, 'Forbidden', message);
export const conflict = (message: string) => new DomainError(409, 'Conflict', message);
export const badRequest = (message: string, details?: { path: string; message: string }[]) =>
  new DomainError(400, 'Bad Request', message, details);
