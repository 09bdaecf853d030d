var __decorate = (this && this.__decorate) || function (decorators, target, key, desc) {
    var c = arguments.length, r = c < 3 ? target : desc === null ? desc = Object.getOwnPropertyDescriptor(target, key) : desc, d;
    if (typeof Reflect === "object" && typeof Reflect.decorate === "function") r = Reflect.decorate(decorators, target, key, desc);
    else for (var i = decorators.length - 1; i >= 0; i--) if (d = decorators[i]) r = (c < 3 ? d(r) : c > 3 ? d(target, key, r) : d(target, key)) || r;
    return c > 3 && r && Object.defineProperty(target, key, r), r;
};
var __metadata = (this && this.__metadata) || function (k, v) {
    if (typeof Reflect === "object" && typeof Reflect.metadata === "function") return Reflect.metadata(k, v);
};
// Reads and validates the server's settings once at start-up. A bad or missing setting stops the
// server with the whole list of what to fix, rather than failing later on first use.
import 'reflect-metadata';
import { plainToInstance, Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsOptional, IsString, IsUrl, Matches, Max, Min, MinLength, ValidateIf, validateSync } from 'class-validator';
export class Env {
    DATABASE_URL;
    PORT = 3000;
    HOST = '127.0.0.1';
    JWT_SECRET;
    ACCESS_TOKEN_TTL_SECONDS = 900;
    REFRESH_TOKEN_TTL_DAYS = 30;
    LOGIN_MAX_FAILURES = 5;
    LOGIN_WINDOW_MINUTES = 15;
    TOMBSTONE_RETENTION_DAYS = 180;
    REQUEST_BODY_LIMIT_MB = 16;
    CLIENT_DIST;
    // Photo storage over the S3 API. Without S3_ENDPOINT (unset or empty) the photo routes answer 503
    // and the rest of the server runs.
    S3_ENDPOINT;
    S3_BUCKET = 'breakline-photos';
    S3_REGION = 'us-east-1';
    // A key id needs its secret and the other way round; with neither, a loopback fake gets its
    // own well-known keys and a real endpoint gets the SDK's usual credential chain.
    S3_ACCESS_KEY_ID;
    S3_SECRET_ACCESS_KEY;
    // Path-style addressing is what local fakes and most S3-compatible stores expect.
    S3_FORCE_PATH_STYLE = true;
    PHOTO_MAX_MB = 8;
    // Mail over SMTP. Without SMTP_HOST (unset or empty) nothing is mailed: invitations answer 503
    // and alerts are logged as not sent; the rest of the server runs.
    SMTP_HOST;
    SMTP_PORT = 587;
    // true: TLS from the first byte (usually port 465); false: the server may upgrade with STARTTLS.
    SMTP_SECURE = false;
    SMTP_USER;
    SMTP_PASSWORD;
    SMTP_FROM = 'Breakline <breakline@localhost.localdomain>';
    // First wait before a failed send is tried again; each later wait doubles (about 7 tries).
    MAIL_RETRY_SECONDS = 30;
    // Where the local mail catcher keeps caught messages; set by npm start and npm test, which
    // turns on the caught-mail page for admins. Never set it in production.
    MAIL_CAUGHT_DIR;
    // The address people open Breakline at, for links in e-mails; http://HOST:PORT when unset.
    APP_URL;
    INVITE_TTL_HOURS = 168;
    PASSWORD_RESET_TTL_MINUTES = 60;
    // Reset requests per address and e-mail in each LOGIN_WINDOW_MINUTES.
    PASSWORD_RESET_MAX_REQUESTS = 5;
    NODE_ENV = 'development';
}
__decorate([
    Matches(/^postgres(ql)?:\/\/.+/, { message: 'DATABASE_URL must be a postgres:// connection string' }),
    __metadata("design:type", String)
], Env.prototype, "DATABASE_URL", void 0);
__decorate([
    IsOptional(),
    Type(() => Number),
    IsInt(),
    Min(1),
    Max(65535),
    __metadata("design:type", Object)
], Env.prototype, "PORT", void 0);
__decorate([
    IsOptional(),
    IsString(),
    __metadata("design:type", Object)
], Env.prototype, "HOST", void 0);
__decorate([
    IsString(),
    MinLength(32, { message: 'JWT_SECRET must be at least 32 characters long' }),
    __metadata("design:type", String)
], Env.prototype, "JWT_SECRET", void 0);
__decorate([
    IsOptional(),
    Type(() => Number),
    IsInt(),
    Min(30),
    Max(86400),
    __metadata("design:type", Object)
], Env.prototype, "ACCESS_TOKEN_TTL_SECONDS", void 0);
__decorate([
    IsOptional(),
    Type(() => Number),
    IsInt(),
    Min(1),
    Max(365),
    __metadata("design:type", Object)
], Env.prototype, "REFRESH_TOKEN_TTL_DAYS", void 0);
__decorate([
    IsOptional(),
    Type(() => Number),
    IsInt(),
    Min(1),
    Max(1000),
    __metadata("design:type", Object)
], Env.prototype, "LOGIN_MAX_FAILURES", void 0);
__decorate([
    IsOptional(),
    Type(() => Number),
    IsInt(),
    Min(1),
    Max(1440),
    __metadata("design:type", Object)
], Env.prototype, "LOGIN_WINDOW_MINUTES", void 0);
__decorate([
    IsOptional(),
    Type(() => Number),
    IsInt(),
    Min(7),
    Max(3650),
    __metadata("design:type", Object)
], Env.prototype, "TOMBSTONE_RETENTION_DAYS", void 0);
__decorate([
    IsOptional(),
    Type(() => Number),
    IsInt(),
    Min(1),
    Max(256),
    __metadata("design:type", Object)
], Env.prototype, "REQUEST_BODY_LIMIT_MB", void 0);
__decorate([
    IsOptional(),
    IsString(),
    __metadata("design:type", String)
], Env.prototype, "CLIENT_DIST", void 0);
__decorate([
    IsOptional(),
    Transform(({ value }) => (value === '' ? undefined : value)),
    IsUrl({ require_tld: false, require_protocol: true, protocols: ['http', 'https'] }, { message: 'S3_ENDPOINT must be an http:// or https:// address, e.g. http://127.0.0.1:4568' }),
    __metadata("design:type", String)
], Env.prototype, "S3_ENDPOINT", void 0);
__decorate([
    IsOptional(),
    Matches(/^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/, { message: 'S3_BUCKET must be 3 to 63 lower-case letters, digits, dots or hyphens' }),
    __metadata("design:type", Object)
], Env.prototype, "S3_BUCKET", void 0);
__decorate([
    IsOptional(),
    Matches(/^[a-z]{2}(-[a-z0-9]+)+$/, { message: 'S3_REGION must be a region name such as us-east-1' }),
    __metadata("design:type", Object)
], Env.prototype, "S3_REGION", void 0);
__decorate([
    ValidateIf((e) => e.S3_SECRET_ACCESS_KEY !== undefined),
    IsString({ message: 'S3_ACCESS_KEY_ID must be set when S3_SECRET_ACCESS_KEY is' }),
    MinLength(1),
    __metadata("design:type", String)
], Env.prototype, "S3_ACCESS_KEY_ID", void 0);
__decorate([
    ValidateIf((e) => e.S3_ACCESS_KEY_ID !== undefined),
    IsString({ message: 'S3_SECRET_ACCESS_KEY must be set when S3_ACCESS_KEY_ID is' }),
    MinLength(1),
    __metadata("design:type", String)
], Env.prototype, "S3_SECRET_ACCESS_KEY", void 0);
__decorate([
    IsOptional(),
    Transform(({ value }) => (typeof value === 'string' ? { true: true, false: false }[value.toLowerCase()] ?? value : value)),
    IsBoolean({ message: 'S3_FORCE_PATH_STYLE must be true or false' }),
    __metadata("design:type", Object)
], Env.prototype, "S3_FORCE_PATH_STYLE", void 0);
__decorate([
    IsOptional(),
    Type(() => Number),
    IsInt(),
    Min(1),
    Max(100),
    __metadata("design:type", Object)
], Env.prototype, "PHOTO_MAX_MB", void 0);
__decorate([
    IsOptional(),
    Transform(({ value }) => (value === '' ? undefined : value)),
    IsString(),
    Matches(/^[A-Za-z0-9.-]+$|^\[[0-9a-fA-F:.]+\]$/, { message: 'SMTP_HOST must be a host name or address, e.g. smtp.example.org or 127.0.0.1' }),
    __metadata("design:type", String)
], Env.prototype, "SMTP_HOST", void 0);
__decorate([
    IsOptional(),
    Type(() => Number),
    IsInt({ message: 'SMTP_PORT must be a port number, e.g. 587' }),
    Min(1),
    Max(65535),
    __metadata("design:type", Object)
], Env.prototype, "SMTP_PORT", void 0);
__decorate([
    IsOptional(),
    Transform(({ value }) => (typeof value === 'string' ? { true: true, false: false }[value.toLowerCase()] ?? value : value)),
    IsBoolean({ message: 'SMTP_SECURE must be true or false' }),
    __metadata("design:type", Object)
], Env.prototype, "SMTP_SECURE", void 0);
__decorate([
    ValidateIf((e) => e.SMTP_PASSWORD !== undefined),
    IsString({ message: 'SMTP_USER must be set when SMTP_PASSWORD is' }),
    MinLength(1),
    __metadata("design:type", String)
], Env.prototype, "SMTP_USER", void 0);
__decorate([
    ValidateIf((e) => e.SMTP_USER !== undefined),
    IsString({ message: 'SMTP_PASSWORD must be set when SMTP_USER is' }),
    MinLength(1),
    __metadata("design:type", String)
], Env.prototype, "SMTP_PASSWORD", void 0);
__decorate([
    IsOptional(),
    Matches(/^([^<>@]*<[^<>@\s]+@[^<>@\s]+\.[^<>@\s]+>|[^<>@\s]+@[^<>@\s]+\.[^<>@\s]+)$/, { message: 'SMTP_FROM must be an address such as breakline@club.example or "Breakline <breakline@club.example>"' }),
    __metadata("design:type", Object)
], Env.prototype, "SMTP_FROM", void 0);
__decorate([
    IsOptional(),
    Type(() => Number),
    IsInt(),
    Min(1),
    Max(3600),
    __metadata("design:type", Object)
], Env.prototype, "MAIL_RETRY_SECONDS", void 0);
__decorate([
    IsOptional(),
    Transform(({ value }) => (value === '' ? undefined : value)),
    IsString(),
    __metadata("design:type", String)
], Env.prototype, "MAIL_CAUGHT_DIR", void 0);
__decorate([
    IsOptional(),
    Transform(({ value }) => (value === '' ? undefined : value)),
    IsUrl({ require_tld: false, require_protocol: true, protocols: ['http', 'https'] }, { message: 'APP_URL must be an http:// or https:// address, e.g. https://breakline.club.example' }),
    __metadata("design:type", String)
], Env.prototype, "APP_URL", void 0);
__decorate([
    IsOptional(),
    Type(() => Number),
    IsInt(),
    Min(1),
    Max(720),
    __metadata("design:type", Object)
], Env.prototype, "INVITE_TTL_HOURS", void 0);
__decorate([
    IsOptional(),
    Type(() => Number),
    IsInt(),
    Min(5),
    Max(1440),
    __metadata("design:type", Object)
], Env.prototype, "PASSWORD_RESET_TTL_MINUTES", void 0);
__decorate([
    IsOptional(),
    Type(() => Number),
    IsInt(),
    Min(1),
    Max(100),
    __metadata("design:type", Object)
], Env.prototype, "PASSWORD_RESET_MAX_REQUESTS", void 0);
__decorate([
    IsOptional(),
    IsIn(['development', 'production', 'test']),
    __metadata("design:type", String)
], Env.prototype, "NODE_ENV", void 0);
export class ConfigError extends Error {
}
/** Validates raw environment values; throws ConfigError listing every problem. */
export function validateEnv(raw) {
    const env = plainToInstance(Env, raw, { exposeDefaultValues: true });
    const errors = validateSync(env, { whitelist: false, forbidUnknownValues: false });
    if (errors.length) {
        const lines = errors.flatMap((e) => Object.values(e.constraints ?? { [e.property]: `${e.property} is not valid` }));
        throw new ConfigError(`The server cannot start; fix these settings:\n  - ${lines.join('\n  - ')}`);
    }
    return env;
}
//# sourceMappingURL=env.js.map