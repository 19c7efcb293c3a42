import { ApiProperty } from '@nestjs/swagger';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH, type ChangePasswordRequest } from '@peakwise/shared';
import { IsNotEmpty, IsString, MaxLength } from 'class-validator';

export class ChangePasswordDto implements ChangePasswordRequest {
  @ApiProperty()
  @MaxLength(1024)
  @IsNotEmpty({ message: 'Enter your current password.' })
  @IsString({ message: 'Enter your current password.' })
  currentPassword: string;

  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, maxLength: PASSWORD_MAX_LENGTH })
  // Length and common-password rules: password-policy.ts (see SignUpDto).
  @MaxLength(1024, { message: `Use at most ${PASSWORD_MAX_LENGTH} characters.` })
  @IsString({ message: 'Enter a new password.' })
  newPassword: string;
}
