import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsOptional, IsString, Matches, MaxLength, MinLength } from 'class-validator';
import { ROLES, type Role } from '@breakline/sync-protocol';
import { EmailField, LinkTokenField } from './fields.js';

export class CreateInviteDto {
  @EmailField()
  email: string;

  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of ${ROLES.join(', ')}.` })
  role: Role;
}

export class AcceptInviteDto {
  @LinkTokenField()
  token: string;

  @ApiPropertyOptional({ description: 'Needed for a new account; ignored when the address already has one.' })
  @IsOptional()
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @MaxLength(120, { message: 'A name is at most 120 characters.' })
  @Matches(/\S/, { message: 'Enter the name other members will see.' })
  @IsString({ message: 'Enter the name other members will see.' })
  displayName?: string;

  @ApiProperty({ description: 'A new password (at least 10 characters), or the existing account\'s password.' })
  @MaxLength(200, { message: 'A password is at most 200 characters.' })
  @MinLength(1, { message: 'Enter a password.' })
  @IsString({ message: 'Enter a password.' })
  password: string;
}

export type InviteStatus = 'pending' | 'accepted' | 'expired' | 'withdrawn';

/** What the invitation routes answer; the token itself is only ever in the e-mail. */
export interface InviteDto {
  id: string;
  email: string;
  role: Role;
  status: InviteStatus;
  invitedBy: { id: string; name: string | null };
  createdAt: string;
  expiresAt: string;
  acceptedAt: string | null;
}
