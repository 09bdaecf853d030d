import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import bcrypt from 'bcryptjs';
import { Env } from '../config/env.js';
import { AppError } from '../common/app-error.js';
import { UsersService } from '../users/users.service.js';
import { MembershipsService } from '../clubs/memberships.service.js';
import { toClubDto } from '../clubs/clubs.service.js';
import type { User } from '../users/user.entity.js';
import { RefreshTokensService } from './refresh-tokens.service.js';
import type { AccessClaims, Principal } from './principal.js';
import type { MeDto, SessionDto } from './dto/session.dto.js';

const BAD_CREDENTIALS = 'E-mail or password is not right.';
// Compared against when the e-mail is unknown, so both failures take the same time.
const DUMMY_HASH = bcrypt.hashSync('not-a-real-password', 10);

@Injectable()
export class AuthService {
  constructor(
    private readonly env: Env,
    private readonly jwt: JwtService,
    private readonly users: UsersService,
    private readonly memberships: MembershipsService,
    private readonly refreshTokens: RefreshTokensService,
  ) {}

  async login(email: string, password: string, clubId?: string): Promise<SessionDto> {
    const user = await this.users.findByEmail(email);
    const ok = await bcrypt.compare(password, user?.passwordHash ?? DUMMY_HASH);
    if (!user || !ok) throw new AppError(401, 'invalid_credentials', BAD_CREDENTIALS);
    return this.session(user, clubId);
  }

  async refresh(token: string, clubId?: string): Promise<SessionDto> {
    const spent = await this.refreshTokens.rotate(token);
    const user = await this.users.findById(spent.userId);
    if (!user) throw new AppError(401, 'unauthorized', 'This sign-in has ended. Sign in again.');
    return this.session(user, clubId ?? spent.clubId, spent.next);
  }

  /** Signs in a person whose identity another step proved (an accepted invitation, a reset link). */
  startSession(user: User, clubId?: string): Promise<SessionDto> {
    return this.session(user, clubId);
  }

  logout(token: string) {
    return this.refreshTokens.revoke(token);
  }

  async me(p: Principal): Promise<MeDto> {
    const user = await this.users.findById(p.userId);
    if (!user) throw new AppError(401, 'unauthorized', 'Sign in to continue.');
    return this.describe(user, p.clubId);
  }

  private async session(user: User, clubId?: string, next?: (clubId?: string) => Promise<string>): Promise<SessionDto> {
    const me = await this.describe(user, clubId);
    const membershipId = me.membershipId;
    const claims: AccessClaims = { sub: user.id, mid: membershipId };
    const accessToken = await this.jwt.signAsync(claims, { expiresIn: this.env.ACCESS_TOKEN_TTL_SECONDS });
    const refreshToken = next ? await next(me.activeClub.id) : await this.refreshTokens.issue(user.id, me.activeClub.id);
    const accessExpiresAt = new Date(Date.now() + this.env.ACCESS_TOKEN_TTL_SECONDS * 1000).toISOString();
    const { membershipId: _, ...dto } = me;
    return { ...dto, accessToken, refreshToken, accessExpiresAt };
  }

  /** The person, their clubs, and the active one: the asked-for club if theirs, else the first. */
  private async describe(user: User, clubId?: string): Promise<MeDto & { membershipId: string }> {
    const all = await this.memberships.forUser(user.id);
    if (!all.length) throw new AppError(403, 'forbidden', 'Your account is not a member of any club yet. Ask your club admin for an invitation.');
    const active = clubId ? all.find((m) => m.clubId === clubId) : all[0];
    if (!active) throw new AppError(403, 'forbidden', 'You are not a member of that club.');
    return {
      membershipId: active.id,
      user: { id: user.id, email: user.email, displayName: user.displayName },
      activeClub: { ...toClubDto(active.club!), role: active.role },
      memberships: all.map((m) => ({ clubId: m.clubId, clubName: m.club!.name, role: m.role })),
    };
  }
}
