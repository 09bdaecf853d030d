import { MiddlewareConsumer, NestModule } from '@nestjs/common';
import { Env } from '../config/env.js';
export declare class AuthModule implements NestModule {
    private readonly env;
    constructor(env: Env);
    configure(consumer: MiddlewareConsumer): void;
}
