import { MiddlewareConsumer, NestModule } from '@nestjs/common';
import { Env } from '../config/env.js';
/** Joining and belonging: invitations, password reset by e-mail, roles per club. */
export declare class MembersModule implements NestModule {
    private readonly env;
    constructor(env: Env);
    configure(consumer: MiddlewareConsumer): void;
}
