import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, IsUUID, Matches, Max, MaxLength, Min } from 'class-validator';

const blankIsAbsent = () => Transform(({ value }) => (typeof value === 'string' && value.trim() === '' ? undefined : typeof value === 'string' ? value.trim() : value));
const DATE = /^\d{4}-\d{2}-\d{2}$/;

export const MAX_PAGE_SIZE = 200;
/** Far past any club's records, and inside what PostgreSQL takes as an OFFSET. */
export const MAX_PAGE = 100_000;

/** Filters, order and page of a Review desk table; every filter is optional. */
export class ReviewQueryDto {
  @ApiPropertyOptional({ description: 'First local date at the club, inclusive (YYYY-MM-DD).' })
  @IsOptional() @blankIsAbsent() @Matches(DATE, { message: 'from must be a date such as 2026-11-01.' })
  from?: string;

  @ApiPropertyOptional({ description: 'Last local date at the club, inclusive (YYYY-MM-DD).' })
  @IsOptional() @blankIsAbsent() @Matches(DATE, { message: 'to must be a date such as 2026-11-30.' })
  to?: string;

  @ApiPropertyOptional() @IsOptional() @blankIsAbsent() @IsUUID('all', { message: 'boatId must be a boat\'s id.' })
  boatId?: string;

  @ApiPropertyOptional() @IsOptional() @blankIsAbsent() @IsUUID('all', { message: 'motorId must be a motor\'s id.' })
  motorId?: string;

  @ApiPropertyOptional({ description: 'A member id (user id): records they did, wrote, drove or crewed, or were assigned.' })
  @IsOptional() @blankIsAbsent() @IsString() @MaxLength(64, { message: 'memberId must be a member id.' })
  memberId?: string;

  @ApiPropertyOptional() @IsOptional() @blankIsAbsent() @IsString() @MaxLength(40)
  state?: string;

  @ApiPropertyOptional({ description: 'Defects only: stand-down, limit or note.' })
  @IsOptional() @blankIsAbsent() @IsString() @MaxLength(40)
  severity?: string;

  @ApiPropertyOptional({ description: 'Check type (checks), purpose (trips) or kind (incident notes).' })
  @IsOptional() @blankIsAbsent() @IsString() @MaxLength(40)
  type?: string;

  @ApiPropertyOptional() @IsOptional() @blankIsAbsent() @Matches(/^[A-Za-z]{1,40}$/, { message: 'sort must be a field name such as startedAt.' })
  sort?: string;

  @ApiPropertyOptional({ enum: ['asc', 'desc'] }) @IsOptional() @blankIsAbsent() @IsIn(['asc', 'desc'], { message: 'dir must be asc or desc.' })
  dir?: 'asc' | 'desc';

  @ApiPropertyOptional({ default: 0 }) @IsOptional() @blankIsAbsent() @Type(() => Number)
  @IsInt({ message: `page must be a whole number from 0 to ${MAX_PAGE}.` }) @Min(0, { message: `page must be a whole number from 0 to ${MAX_PAGE}.` })
  @Max(MAX_PAGE, { message: `page must be a whole number from 0 to ${MAX_PAGE}.` })
  page?: number;

  @ApiPropertyOptional({ default: 50, maximum: MAX_PAGE_SIZE }) @IsOptional() @blankIsAbsent() @Type(() => Number)
  @IsInt({ message: `pageSize must be a whole number from 1 to ${MAX_PAGE_SIZE}.` }) @Min(1, { message: `pageSize must be a whole number from 1 to ${MAX_PAGE_SIZE}.` })
  @Max(MAX_PAGE_SIZE, { message: `pageSize must be a whole number from 1 to ${MAX_PAGE_SIZE}.` })
  pageSize?: number;
}
