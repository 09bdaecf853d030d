import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Public } from '../auth/principal.js';
import type { SessionDto } from '../auth/dto/session.dto.js';
import { Env } from '../config/env.js';
import { PasswordResetService } from './password-reset.service.js';
import { PasswordResetConfirmDto, PasswordResetRequestDto } from './dto/password-reset.dto.js';

@ApiTags('auth')
@Controller('auth/password-reset')
export class PasswordResetController {
  constructor(private readonly resets: PasswordResetService, private readonly env: Env) {}

  /** Always 202 with the same words, whether or not the address has an account. */
  @Public()
  @Post()
  @HttpCode(202)
  request(@Body() dto: PasswordResetRequestDto): { message: string } {
    this.resets.request(dto.email);
    return { message: `If an account uses ${dto.email}, a link to set a new password is on its way. It works once, for ${this.env.PASSWORD_RESET_TTL_MINUTES} minutes.` };
  }

  /** Sets the new password and answers like a sign-in. */
  @Public()
  @Post('confirm')
  @HttpCode(200)
  confirm(@Body() dto: PasswordResetConfirmDto): Promise<SessionDto> {
    return this.resets.confirm(dto.token, dto.password);
  }
}
