// Reads and validates the server's settings once at start-up. A bad or missing setting stops the
// server with the whole list of what to fix, rather than failing later on first use.
import 'reflect-metadata';
import { plainToInstance, Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsOptional, IsString, IsUrl, Matches, Max, Min, MinLength, ValidateIf, validateSync } from 'class-validator';

export class Env {
  @Matches(/^postgres(ql)?:\/\/.+/, { message: 'DATABASE_URL must be a postgres:// connection string' })
  DATABASE_URL!: string;

  @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(65535)
  PORT = 3000;

  @IsOptional() @IsString()
  HOST = '127.0.0.1';

  @IsString() @MinLength(32, { message: 'JWT_SECRET must be at least 32 characters long' })
  JWT_SECRET!: string;

  @IsOptional() @Type(() => Number) @IsInt() @Min(30) @Max(86400)
  ACCESS_TOKEN_TTL_SECONDS = 900;

  @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(365)
  REFRESH_TOKEN_TTL_DAYS = 30;

  @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(1000)
  LOGIN_MAX_FAILURES = 5;

  @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(1440)
  LOGIN_WINDOW_MINUTES = 15;

  @IsOptional() @Type(() => Number) @IsInt() @Min(7) @Max(3650)
  TOMBSTONE_RETENTION_DAYS = 180;

  @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(256)
  REQUEST_BODY_LIMIT_MB = 16;

  @IsOptional() @IsString()
  CLIENT_DIST?: string;

  // Photo storage over the S3 API. Without S3_ENDPOINT (unset or empty) the photo routes answer 503
  // and the rest of the server runs.
  @IsOptional() @Transform(({ value }) => (value === '' ? undefined : value)) @IsUrl({ require_tld: false, require_protocol: true, protocols: ['http', 'https'] }, { message: 'S3_ENDPOINT must be an http:// or https:// address, e.g. http://127.0.0.1:4568' })
  S3_ENDPOINT?: string;

  @IsOptional() @Matches(/^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/, { message: 'S3_BUCKET must be 3 to 63 lower-case letters, digits, dots or hyphens' })
  S3_BUCKET = 'breakline-photos';

  @IsOptional() @Matches(/^[a-z]{2}(-[a-z0-9]+)+$/, { message: 'S3_REGION must be a region name such as us-east-1' })
  S3_REGION = 'us-east-1';

  // A key id needs its secret and the other way round; with neither, a loopback fake gets its
  // own well-known keys and a real endpoint gets the SDK's usual credential chain.
  @ValidateIf((e: Env) => e.S3_SECRET_ACCESS_KEY !== undefined) @IsString({ message: 'S3_ACCESS_KEY_ID must be set when S3_SECRET_ACCESS_KEY is' }) @MinLength(1)
  S3_ACCESS_KEY_ID?: string;

  @ValidateIf((e: Env) => e.S3_ACCESS_KEY_ID !== undefined) @IsString({ message: 'S3_SECRET_ACCESS_KEY must be set when S3_ACCESS_KEY_ID is' }) @MinLength(1)
  S3_SECRET_ACCESS_KEY?: string;

  // Path-style addressing is what local fakes and most S3-compatible stores expect.
  @IsOptional() @Transform(({ value }) => (typeof value === 'string' ? ({ true: true, false: false } as Record<string, boolean>)[value.toLowerCase()] ?? value : value))
  @IsBoolean({ message: 'S3_FORCE_PATH_STYLE must be true or false' })
  S3_FORCE_PATH_STYLE = true;

  @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100)
  PHOTO_MAX_MB = 8;

  // Mail over SMTP. Without SMTP_HOST (unset or empty) nothing is mailed: invitations answer 503
  // and alerts are logged as not sent; the rest of the server runs.
  @IsOptional() @Transform(({ value }) => (value === '' ? undefined : value)) @IsString() @Matches(/^[A-Za-z0-9.-]+$|^\[[0-9a-fA-F:.]+\]$/, { message: 'SMTP_HOST must be a host name or address, e.g. smtp.example.org or 127.0.0.1' })
  SMTP_HOST?: string;

  @IsOptional() @Type(() => Number) @IsInt({ message: 'SMTP_PORT must be a port number, e.g. 587' }) @Min(1) @Max(65535)
  SMTP_PORT = 587;

  // true: TLS from the first byte (usually port 465); false: the server may upgrade with STARTTLS.
  @IsOptional() @Transform(({ value }) => (typeof value === 'string' ? ({ true: true, false: false } as Record<string, boolean>)[value.toLowerCase()] ?? value : value))
  @IsBoolean({ message: 'SMTP_SECURE must be true or false' })
  SMTP_SECURE = false;

  @ValidateIf((e: Env) => e.SMTP_PASSWORD !== undefined) @IsString({ message: 'SMTP_USER must be set when SMTP_PASSWORD is' }) @MinLength(1)
  SMTP_USER?: string;

  @ValidateIf((e: Env) => e.SMTP_USER !== undefined) @IsString({ message: 'SMTP_PASSWORD must be set when SMTP_USER is' }) @MinLength(1)
  SMTP_PASSWORD?: string;

  @IsOptional() @Matches(/^([^<>@]*<[^<>@\s]+@[^<>@\s]+\.[^<>@\s]+>|[^<>@\s]+@[^<>@\s]+\.[^<>@\s]+)$/, { message: 'SMTP_FROM must be an address such as breakline@club.example or "Breakline <breakline@club.example>"' })
  SMTP_FROM = 'Breakline <breakline@localhost.localdomain>';

  // First wait before a failed send is tried again; each later wait doubles (about 7 tries).
  @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(3600)
  MAIL_RETRY_SECONDS = 30;

  // Where the local mail catcher keeps caught messages; set by npm start and npm test, which
  // turns on the caught-mail page for admins. Never set it in production.
  @IsOptional() @Transform(({ value }) => (value === '' ? undefined : value)) @IsString()
  MAIL_CAUGHT_DIR?: string;

  // The address people open Breakline at, for links in e-mails; http://HOST:PORT when unset.
  @IsOptional() @Transform(({ value }) => (value === '' ? undefined : value)) @IsUrl({ require_tld: false, require_protocol: true, protocols: ['http', 'https'] }, { message: 'APP_URL must be an http:// or https:// address, e.g. https://breakline.club.example' })
  APP_URL?: string;

  @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(720)
  INVITE_TTL_HOURS = 168;

  @IsOptional() @Type(() => Number) @IsInt() @Min(5) @Max(1440)
  PASSWORD_RESET_TTL_MINUTES = 60;

  // Reset requests per address and e-mail in each LOGIN_WINDOW_MINUTES.
  @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100)
  PASSWORD_RESET_MAX_REQUESTS = 5;

  @IsOptional() @IsIn(['development', 'production', 'test'])
  NODE_ENV: 'development' | 'production' | 'test' = 'development';
}

export class ConfigError extends Error {}

/** Validates raw environment values; throws ConfigError listing every problem. */
export function validateEnv(raw: Record<string, unknown>): Env {
  const env = plainToInstance(Env, raw, { exposeDefaultValues: true });
  const errors = validateSync(env, { whitelist: false, forbidUnknownValues: false });
  if (errors.length) {
    const lines = errors.flatMap((e) => Object.values(e.constraints ?? { [e.property]: `${e.property} is not valid` }));
    throw new ConfigError(`The server cannot start; fix these settings:\n  - ${lines.join('\n  - ')}`);
  }
  return env;
}
