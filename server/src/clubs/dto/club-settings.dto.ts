import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsLatitude, IsLongitude, IsOptional, IsString, MaxLength, MinLength, Validate, ValidatorConstraint, type ValidatorConstraintInterface } from 'class-validator';
import { AWARD_CHECKS, PRESSURE_UNITS, WIND_UNITS, type AwardCheck, type PressureUnit, type WindUnit } from '../club.entity.js';

@ValidatorConstraint({ name: 'ianaTimeZone' })
class IanaTimeZone implements ValidatorConstraintInterface {
  validate(value: unknown) {
    if (typeof value !== 'string' || !value.includes('/')) return value === 'UTC';
    try {
      new Intl.DateTimeFormat('en', { timeZone: value });
      return true;
    } catch {
      return false;
    }
  }
  defaultMessage() {
    return 'Give the time zone by its IANA name, such as Australia/Sydney or Pacific/Auckland.';
  }
}

/** The settings an admin may change; fields left out stay as they are. */
export class ClubSettingsDto {
  @ApiPropertyOptional({ example: 'Gannet Bay Surf Life Saving Club' })
  @IsOptional() @IsString({ message: 'The club name must be text.' }) @MinLength(2, { message: 'The club name needs at least 2 characters.' }) @MaxLength(120, { message: 'The club name is at most 120 characters.' })
  name?: string;

  @ApiPropertyOptional({ example: 'Australia/Sydney' })
  @IsOptional() @Validate(IanaTimeZone)
  timeZone?: string;

  @ApiPropertyOptional({ description: 'WGS 84 latitude of the beach, for sunrise and sunset' })
  @IsOptional() @IsLatitude({ message: 'Latitude is a number of degrees from -90 to 90 (south is negative).' })
  latitude?: number;

  @ApiPropertyOptional({ description: 'WGS 84 longitude of the beach' })
  @IsOptional() @IsLongitude({ message: 'Longitude is a number of degrees from -180 to 180 (west is negative).' })
  longitude?: number;

  @ApiPropertyOptional({ enum: PRESSURE_UNITS })
  @IsOptional() @IsIn(PRESSURE_UNITS, { message: `The pressure unit is one of ${PRESSURE_UNITS.join(', ')}.` })
  pressureUnit?: PressureUnit;

  @ApiPropertyOptional({ enum: WIND_UNITS })
  @IsOptional() @IsIn(WIND_UNITS, { message: `The wind unit is one of ${WIND_UNITS.join(', ')}.` })
  windUnit?: WindUnit;

  @ApiPropertyOptional({ enum: AWARD_CHECKS, description: 'Sign-on without a current award: warn, or refuse' })
  @IsOptional() @IsIn(AWARD_CHECKS, { message: 'The award check is "warn" (sign-on goes ahead with a warning) or "block" (sign-on is refused).' })
  awardCheck?: AwardCheck;
}
