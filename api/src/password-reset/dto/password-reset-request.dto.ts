import { ApiProperty } from '@nestjs/swagger';
import { EMAIL_MAX_LENGTH, type PasswordResetRequest } from '@peakwise/shared';
import { IsEmail, MaxLength } from 'class-validator';
import { NormaliseEmail } from '../../common/dto-helpers.js';

export class PasswordResetRequestDto implements PasswordResetRequest {
  @ApiProperty({ example: 'theo@example.com' })
  @NormaliseEmail()
  @MaxLength(EMAIL_MAX_LENGTH, { message: `Use at most ${EMAIL_MAX_LENGTH} characters.` })
  @IsEmail({}, { message: 'Enter an e-mail address like name@example.com.' })
  email: string;
}
