import { Controller, Get, Header, Param, ParseUUIDPipe, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ExportsService } from './exports.service';
import type { FhirBundle } from './fhir/fhir-bundle';

const uuid = new ParseUUIDPipe({ version: undefined });

@ApiTags('exports')
@ApiBearerAuth()
@Controller('resuscitations/:id')
export class ExportsController {
  constructor(private readonly exportsService: ExportsService) {}

  @Roles('lead', 'quality')
  @Get('report.pdf')
  async pdf(@CurrentUser() user: AuthUser, @Param('id', uuid) id: string, @Res() res: Response) {
    const { file, name } = await this.exportsService.pdf(user, id);
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Disposition', `attachment; filename="${name}"`);
    res.setHeader('Cache-Control', 'no-store');
    res.end(file);
  }

  @Roles('lead', 'quality')
  @Get('fhir')
  @Header('Content-Type', 'application/fhir+json; charset=utf-8')
  @Header('Cache-Control', 'no-store')
  fhir(@CurrentUser() user: AuthUser, @Param('id', uuid) id: string): Promise<FhirBundle> {
    return this.exportsService.fhir(user, id);
  }
}
