import { ApiProperty } from '@nestjs/swagger';
import type { SignInRequest } from '@peakwise/shared';
import { IsNotEmpty, IsString, MaxLength } from 'class-validator';
import { NormaliseEmail } from '../../common/dto-helpers.js';

export class SignInDto implements SignInRequest {
  @ApiProperty({ example: 'theo@example.com' })
  @NormaliseEmail()
  @MaxLength(320)
  @IsNotEmpty({ message: 'Enter your e-mail address.' })
  @IsString({ message: 'Enter your e-mail address.' })
  email: string;

  @ApiProperty()
  // Far above any real password: only there so nobody makes us hash a megabyte.
  @MaxLength(1024)
  @IsNotEmpty({ message: 'Enter your password.' })
  @IsString({ message: 'Enter your password.' })
  password: string;
}
