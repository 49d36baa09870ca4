import { rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import {
  type CallHandler,
  type ExecutionContext,
  Injectable,
  type NestInterceptor,
  PayloadTooLargeException,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { IMPORT_MAX_BYTES } from '@upstroke/contracts';
import { EMPTY, finalize, type Observable } from 'rxjs';
import type { AuthUser } from '../../common/auth.decorators';
import { badRequest, DomainError } from '../../common/errors';
import { ResuscitationAccess } from '../resuscitations/resuscitation-access.service';

const MultipartFile = FileInterceptor('file', {
  // On disk, not in memory: a 50 MB file must not cost 50 MB of heap per upload.
  dest: tmpdir(),
  limits: { fileSize: IMPORT_MAX_BYTES, files: 1, fields: 10, parts: 12 },
});

const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * Checks that the caller may write to the record before reading a byte of the body (the
 * token and role were checked by the guards), then receives the `file` part to a temporary
 * file, names the size limit when it is exceeded, and removes the temporary file once the
 * request is answered.
 */
@Injectable()
export class ImportUploadInterceptor implements NestInterceptor {
  private readonly multipart = new MultipartFile();

  constructor(private readonly access: ResuscitationAccess) {}

  async intercept(ctx: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    const req = ctx.switchToHttp().getRequest<{ user: AuthUser; params: { id?: string } }>();
    const id = req.params.id ?? '';
    if (!uuidPattern.test(id)) throw badRequest('id: not a valid id');
    await this.access.writable(req.user, id);
    try {
      await this.multipart.intercept(ctx, { handle: () => EMPTY });
    } catch (e) {
      if (e instanceof PayloadTooLargeException)
        throw new DomainError(413, 'Payload Too Large', 'file: larger than the 50 MB limit');
      throw e;
    }
    const file = ctx.switchToHttp().getRequest<{ file?: Express.Multer.File }>().file;
    return next.handle().pipe(
      finalize(() => {
        if (file?.path) void rm(file.path, { force: true });
      }),
    );
  }
}
