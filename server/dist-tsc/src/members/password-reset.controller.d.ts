import type { SessionDto } from '../auth/dto/session.dto.js';
import { Env } from '../config/env.js';
import { PasswordResetService } from './password-reset.service.js';
import { PasswordResetConfirmDto, PasswordResetRequestDto } from './dto/password-reset.dto.js';
export declare class PasswordResetController {
    private readonly resets;
    private readonly env;
    constructor(resets: PasswordResetService, env: Env);
    /** Always 202 with the same words, whether or not the address has an account. */
    request(dto: PasswordResetRequestDto): {
        message: string;
    };
    /** Sets the new password and answers like a sign-in. */
    confirm(dto: PasswordResetConfirmDto): Promise<SessionDto>;
}
