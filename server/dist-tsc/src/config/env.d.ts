import 'reflect-metadata';
export declare class Env {
    DATABASE_URL: string;
    PORT: number;
    HOST: string;
    JWT_SECRET: string;
    ACCESS_TOKEN_TTL_SECONDS: number;
    REFRESH_TOKEN_TTL_DAYS: number;
    LOGIN_MAX_FAILURES: number;
    LOGIN_WINDOW_MINUTES: number;
    TOMBSTONE_RETENTION_DAYS: number;
    REQUEST_BODY_LIMIT_MB: number;
    CLIENT_DIST?: string;
    S3_ENDPOINT?: string;
    S3_BUCKET: string;
    S3_REGION: string;
    S3_ACCESS_KEY_ID?: string;
    S3_SECRET_ACCESS_KEY?: string;
    S3_FORCE_PATH_STYLE: boolean;
    PHOTO_MAX_MB: number;
    SMTP_HOST?: string;
    SMTP_PORT: number;
    SMTP_SECURE: boolean;
    SMTP_USER?: string;
    SMTP_PASSWORD?: string;
    SMTP_FROM: string;
    MAIL_RETRY_SECONDS: number;
    MAIL_CAUGHT_DIR?: string;
    APP_URL?: string;
    INVITE_TTL_HOURS: number;
    PASSWORD_RESET_TTL_MINUTES: number;
    PASSWORD_RESET_MAX_REQUESTS: number;
    NODE_ENV: 'development' | 'production' | 'test';
}
export declare class ConfigError extends Error {
}
/** Validates raw environment values; throws ConfigError listing every problem. */
export declare function validateEnv(raw: Record<string, unknown>): Env;
