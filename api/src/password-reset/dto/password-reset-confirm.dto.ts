import { ApiProperty } from '@nestjs/swagger';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH, type PasswordResetConfirmRequest } from '@peakwise/shared';
import { IsNotEmpty, IsString, MaxLength } from 'class-validator';

export class PasswordResetConfirmDto implements PasswordResetConfirmRequest {
  @ApiProperty({ description: 'The token from the link in the e-mail' })
  @MaxLength(200, { message: 'This link is not valid.' })
  @IsNotEmpty({ message: 'This link is not valid.' })
  @IsString({ message: 'This link is not valid.' })
  token: string;

  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, maxLength: PASSWORD_MAX_LENGTH })
  // Length and common-password rules: password-policy.ts (see SignUpDto).
  @MaxLength(1024, { message: `Use at most ${PASSWORD_MAX_LENGTH} characters.` })
  @IsString({ message: 'Enter a new password.' })
  password: string;
}
