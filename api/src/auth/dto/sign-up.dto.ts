import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  DISPLAY_NAME_MAX_LENGTH,
  EMAIL_MAX_LENGTH,
  PASSWORD_MAX_LENGTH,
  PASSWORD_MIN_LENGTH,
  type SignUpRequest,
} from '@peakwise/shared';
import { IsEmail, IsString, Length, MaxLength } from 'class-validator';
import { IsTimeZone, NormaliseEmail, Omittable, Trim } from '../../common/dto-helpers.js';

export class SignUpDto implements SignUpRequest {
  @ApiProperty({ example: 'theo@example.com' })
  @NormaliseEmail()
  @MaxLength(EMAIL_MAX_LENGTH, { message: `Use at most ${EMAIL_MAX_LENGTH} characters.` })
  @IsEmail({}, { message: 'Enter an e-mail address like name@example.com.' })
  email: string;

  @ApiProperty({ example: 'Theo Park' })
  @Trim()
  @Length(1, DISPLAY_NAME_MAX_LENGTH, { message: `Enter a name of 1 to ${DISPLAY_NAME_MAX_LENGTH} characters.` })
  @IsString({ message: 'Enter your name.' })
  displayName: string;

  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, maxLength: PASSWORD_MAX_LENGTH })
  // Length and common-password rules live in password-policy.ts, which counts characters the
  // same way everywhere; this bound only stops anyone making us hash a megabyte.
  @MaxLength(1024, { message: `Use at most ${PASSWORD_MAX_LENGTH} characters.` })
  @IsString({ message: 'Enter a password.' })
  password: string;

  @ApiPropertyOptional({ example: 'Europe/London' })
  @Omittable()
  @IsTimeZone()
  timeZone?: string;
}
