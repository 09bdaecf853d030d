import { JwtService } from '@nestjs/jwt';
import { Env } from '../config/env.js';
import { UsersService } from '../users/users.service.js';
import { MembershipsService } from '../clubs/memberships.service.js';
import type { User } from '../users/user.entity.js';
import { RefreshTokensService } from './refresh-tokens.service.js';
import type { Principal } from './principal.js';
import type { MeDto, SessionDto } from './dto/session.dto.js';
export declare class AuthService {
    private readonly env;
    private readonly jwt;
    private readonly users;
    private readonly memberships;
    private readonly refreshTokens;
    constructor(env: Env, jwt: JwtService, users: UsersService, memberships: MembershipsService, refreshTokens: RefreshTokensService);
    login(email: string, password: string, clubId?: string): Promise<SessionDto>;
    refresh(token: string, clubId?: string): Promise<SessionDto>;
    /** Signs in a person whose identity another step proved (an accepted invitation, a reset link). */
    startSession(user: User, clubId?: string): Promise<SessionDto>;
    logout(token: string): Promise<void>;
    me(p: Principal): Promise<MeDto>;
    private session;
    /** The person, their clubs, and the active one: the asked-for club if theirs, else the first. */
    private describe;
}
