import { AuthService } from './auth.service.js';
import { LoginDto } from './dto/login.dto.js';
import { RefreshDto, SwitchClubDto } from './dto/refresh.dto.js';
import { type Principal } from './principal.js';
import type { MeDto, SessionDto } from './dto/session.dto.js';
export declare class AuthController {
    private readonly auth;
    constructor(auth: AuthService);
    login(dto: LoginDto): Promise<SessionDto>;
    refresh(dto: RefreshDto): Promise<SessionDto>;
    logout(dto: RefreshDto): Promise<void>;
    switchClub(dto: SwitchClubDto): Promise<SessionDto>;
    me(p: Principal): Promise<MeDto>;
}
