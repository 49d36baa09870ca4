import {
  type ArgumentsHost,
  Catch,
  type ExceptionFilter,
  HttpException,
  Logger,
} from '@nestjs/common';
import type { ApiError } from '@upstroke/contracts';
import type { Response } from 'express';
import { DomainError } from './errors';

const reasons: Record<number, string> = {
  400: 'Bad Request',
  401: 'Unauthorized',
  403: 'Forbidden',
  404: 'Not Found',
  409: 'Conflict',
  413: 'Payload Too Large',
  415: 'Unsupported Media Type',
  429: 'Too Many Requests',
  503: 'Service Unavailable',
};

/** Every failure leaves the API in one shape: `{ statusCode, error, message, details? }`. */
@Catch()
export class ErrorFilter implements ExceptionFilter {
  private readonly logger = new Logger('ErrorFilter');

  catch(exception: unknown, host: ArgumentsHost): void {
    const res = host.switchToHttp().getResponse<Response>();
    const body = this.toBody(exception);
    if (body.statusCode >= 500) this.logger.error(exception);
    if (res.headersSent) return;
    res.status(body.statusCode).json(body);
  }

  private toBody(exception: unknown): ApiError {
    if (exception instanceof DomainError) {
      return {
        statusCode: exception.status,
        error: exception.code,
        message: exception.message,
        details: exception.details,
      };
    }
    if (exception instanceof HttpException) {
      const status = exception.getStatus();
      const response = exception.getResponse();
      const raw =
        typeof response === 'string' ? response : (response as { message?: unknown }).message;
      const message = Array.isArray(raw) ? raw.join('; ') : String(raw ?? exception.message);
      return { statusCode: status, error: reasons[status] ?? 'Error', message };
    }
    // An entry that reached the lock trigger while the record was being signed.
    const pg = exception as { code?: unknown; message?: unknown };
    if (pg?.code === '23514' && String(pg.message).includes('signed and locked')) {
      return {
        statusCode: 409,
        error: 'Conflict',
        message: 'This record is signed and locked; add an amendment instead',
      };
    }
    // Body-parser errors (malformed JSON, too large) carry their own status.
    const status = (exception as { status?: unknown })?.status;
    if (typeof status === 'number' && status >= 400 && status < 500) {
      const type = (exception as { type?: string }).type;
      const message =
        type === 'entity.parse.failed'
          ? 'The request body is not valid JSON'
          : String((exception as Error).message);
      return { statusCode: status, error: reasons[status] ?? 'Bad Request', message };
    }
    return {
      statusCode: 500,
      error: 'Internal Server Error',
      message: 'Something went wrong; nothing was changed',
    };
  }
}
