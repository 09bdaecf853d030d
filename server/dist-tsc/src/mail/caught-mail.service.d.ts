import { DataSource } from 'typeorm';
import { Env } from '../config/env.js';
export interface CaughtMailDto {
    id: string;
    to: string[];
    subject: string;
    text: string;
    at: string;
    tag: string | null;
}
/**
 * Reads what the local mail catcher caught (MAIL_CAUGHT_DIR), for the admin's caught-mail page.
 * An admin sees only mail addressed to their own club's members and invitees.
 */
export declare class CaughtMailService {
    private readonly env;
    private readonly db;
    constructor(env: Env, db: DataSource);
    get on(): boolean;
    list(clubId: string): Promise<CaughtMailDto[]>;
    private clubAddresses;
}
