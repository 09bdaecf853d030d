import { Body, Controller, Get, HttpCode, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { AuthService } from './auth.service.js';
import { LoginDto } from './dto/login.dto.js';
import { RefreshDto, SwitchClubDto } from './dto/refresh.dto.js';
import { CurrentPrincipal, Public, type Principal } from './principal.js';
import type { MeDto, SessionDto } from './dto/session.dto.js';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Public()
  @Post('login')
  @HttpCode(200)
  login(@Body() dto: LoginDto): Promise<SessionDto> {
    return this.auth.login(dto.email, dto.password, dto.clubId);
  }

  @Public()
  @Post('refresh')
  @HttpCode(200)
  refresh(@Body() dto: RefreshDto): Promise<SessionDto> {
    return this.auth.refresh(dto.refreshToken);
  }

  @Public()
  @Post('logout')
  @HttpCode(204)
  async logout(@Body() dto: RefreshDto): Promise<void> {
    await this.auth.logout(dto.refreshToken);
  }

  @ApiBearerAuth()
  @Post('switch-club')
  @HttpCode(200)
  switchClub(@Body() dto: SwitchClubDto): Promise<SessionDto> {
    return this.auth.refresh(dto.refreshToken, dto.clubId);
  }

  @ApiBearerAuth()
  @Get('me')
  me(@CurrentPrincipal() p: Principal): Promise<MeDto> {
    return this.auth.me(p);
  }
}
