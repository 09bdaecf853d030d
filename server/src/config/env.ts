// Reads and validates the server's settings once at start-up. A bad or missing setting stops the
// server with the whole list of what to fix, rather than failing later on first use.
import 'reflect-metadata';
import { plainToInstance, Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, Matches, Max, Min, MinLength, validateSync } from 'class-validator';

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
