import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsOptional, IsString, IsUUID, MaxLength, MinLength } from 'class-validator';

export class LoginDto {
  @ApiProperty({ example: 'member@example.org' })
  @Transform(({ value }) => (typeof value === 'string' ? value.trim().toLowerCase() : value))
  @MaxLength(254, { message: 'An e-mail address is at most 254 characters.' })
  @IsEmail({}, { message: 'Enter an e-mail address such as name@example.org.' })
  email: string;

  @ApiProperty()
  // class-validator runs the lowest decorator first; stopAtFirstError keeps one message a field.
  @MaxLength(200, { message: 'A password is at most 200 characters.' })
  @MinLength(1, { message: 'Enter your password.' })
  @IsString({ message: 'Enter your password.' })
  password: string;

  @ApiPropertyOptional({ description: 'Club to sign in to, when the person belongs to several.' })
  @IsOptional()
  @IsUUID('all', { message: 'clubId must be a club id.' })
  clubId?: string;
}
