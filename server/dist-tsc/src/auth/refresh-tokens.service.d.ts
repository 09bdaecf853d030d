import { Repository } from 'typeorm';
import { Env } from '../config/env.js';
import { RefreshToken } from './refresh-token.entity.js';
/** Issues, rotates and revokes refresh tokens of the form `<id>.<secret>`. */
export declare class RefreshTokensService {
    private readonly repo;
    private readonly env;
    constructor(repo: Repository<RefreshToken>, env: Env);
    issue(userId: string, clubId: string, familyId?: string): Promise<string>;
    /** Spends a token: it is revoked and its successor returned. A spent token shown again ends the family. */
    rotate(token: string): Promise<{
        userId: string;
        clubId: string;
        next: (clubId?: string) => Promise<string>;
    }>;
    revoke(token: string): Promise<void>;
    private find;
}
