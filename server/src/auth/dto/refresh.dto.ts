import { ApiProperty } from '@nestjs/swagger';
import { IsString, IsUUID, MaxLength, MinLength } from 'class-validator';

export class RefreshDto {
  @ApiProperty()
  @IsString({ message: 'refreshToken is required.' })
  @MinLength(10, { message: 'refreshToken is not a refresh token.' })
  @MaxLength(200)
  refreshToken: string;
}

export class SwitchClubDto extends RefreshDto {
  @ApiProperty()
  @IsUUID('all', { message: 'clubId must be a club id.' })
  clubId: string;
}
