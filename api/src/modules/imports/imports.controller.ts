import {
  Body,
  Controller,
  Get,
  Param,
  ParseUUIDPipe,
  Patch,
  Post,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import { ApiBearerAuth, ApiConsumes, ApiTags } from '@nestjs/swagger';
import { type PatchImport, patchImportSchema } from '@upstroke/contracts';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ZodPipe } from '../../common/zod.pipe';
import { ImportUploadInterceptor } from './import-upload.interceptor';
import { ImportsService } from './imports.service';

const uuid = new ParseUUIDPipe({ version: undefined });

/**
 * Monitor file imports (CONTRACT.md "Monitor file import"). A file already imported on the
 * record answers 409 naming the earlier import; a file with bad lines answers 400 with up to
 * 20 `details` (`path: "line N"`), and nothing is stored.
 */
@ApiTags('imports')
@ApiBearerAuth()
@Controller('resuscitations/:id/imports')
export class ImportsController {
  constructor(private readonly service: ImportsService) {}

  @Roles('recorder', 'lead', 'quality')
  @Get()
  list(@CurrentUser() user: AuthUser, @Param('id', uuid) id: string) {
    return this.service.list(user, id);
  }

  @Roles('recorder', 'lead')
  @Post()
  @ApiConsumes('multipart/form-data')
  @UseInterceptors(ImportUploadInterceptor)
  create(
    @CurrentUser() user: AuthUser,
    @Param('id', uuid) id: string,
    @UploadedFile() file?: Express.Multer.File,
  ) {
    const upload = file && { path: file.path, originalName: file.originalname, size: file.size };
    return this.service.importFile(user, id, upload);
  }

  @Roles('lead')
  @Patch(':importId')
  setOffset(
    @CurrentUser() user: AuthUser,
    @Param('id', uuid) id: string,
    @Param('importId', uuid) importId: string,
    @Body(new ZodPipe(patchImportSchema)) body: PatchImport,
  ) {
    return this.service.setOffset(user, id, importId, body.offsetSec);
  }
}
