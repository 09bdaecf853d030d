import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentPrincipal, MinRole, type Principal } from '../auth/principal.js';
import { CaughtMailService, type CaughtMailDto } from './caught-mail.service.js';

/** Mail the local catcher caught: on only where MAIL_CAUGHT_DIR is set (npm start, npm test). */
@ApiTags('dev')
@ApiBearerAuth()
@Controller('dev')
export class DevMailController {
  constructor(private readonly caught: CaughtMailService) {}

  @Get('mail')
  @MinRole('admin')
  mail(@CurrentPrincipal() p: Principal): Promise<CaughtMailDto[]> {
    return this.caught.list(p.clubId);
  }
}
