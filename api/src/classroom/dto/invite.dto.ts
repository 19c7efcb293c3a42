import { ApiProperty } from '@nestjs/swagger';
import {
  CLASS_INVITES_MAX_PER_REQUEST,
  EMAIL_MAX_LENGTH,
  JOIN_CODE_LENGTH,
  type CreateClassInvitesRequest,
  type JoinClassByCodeRequest,
} from '@peakwise/shared';
import { Transform } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsString,
  Matches,
  isEmail,
  registerDecorator,
  type ValidationArguments,
} from 'class-validator';
import { JOIN_CODE_PATTERN, normaliseJoinCode } from '../join-code.js';

export const JOIN_CODE_MESSAGE = `Enter the ${JOIN_CODE_LENGTH}-character join code your instructor gave you.`;

/** Why this list of addresses is refused, naming the entries to fix (a pasted list is long). */
function emailListProblem(value: unknown): string | null {
  if (!Array.isArray(value)) return null;
  const bad = value.filter((v) => typeof v !== 'string' || v.length > EMAIL_MAX_LENGTH || !isEmail(v));
  if (bad.length === 0) return null;
  const shown = bad.slice(0, 5).map((v) => (typeof v === 'string' ? `"${v.slice(0, 60)}"` : String(v)));
  const more = bad.length > 5 ? ` and ${bad.length - 5} more` : '';
  return `Check ${bad.length === 1 ? 'this address' : 'these addresses'}: ${shown.join(', ')}${more}. Write each like name@example.com.`;
}

function IsEmailList() {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isEmailList',
      target: object.constructor,
      propertyName,
      validator: {
        validate: (value: unknown) => emailListProblem(value) === null,
        defaultMessage: (args: ValidationArguments) => emailListProblem(args.value) ?? '',
      },
    });
}

export class CreateClassInvitesDto implements CreateClassInvitesRequest {
  @ApiProperty({
    type: [String],
    minItems: 1,
    maxItems: CLASS_INVITES_MAX_PER_REQUEST,
    example: ['amara@example.com'],
    description: 'Lower-cased; the same address twice in one request gets one invitation',
  })
  @Transform(({ value }: { value: unknown }) =>
    Array.isArray(value)
      ? (value as unknown[]).map((v) => (typeof v === 'string' ? v.trim().toLowerCase() : v))
      : value,
  )
  // Lowest first: a non-list is reported as such, not as "too short".
  @IsEmailList()
  @ArrayMaxSize(CLASS_INVITES_MAX_PER_REQUEST, {
    message: `Invite at most ${CLASS_INVITES_MAX_PER_REQUEST} addresses at a time.`,
  })
  @ArrayMinSize(1, { message: 'Enter at least one e-mail address.' })
  @IsArray({ message: 'Send the addresses as a list.' })
  emails: string[];
}

export class JoinClassByCodeDto implements JoinClassByCodeRequest {
  @ApiProperty({ example: 'K7QW3MXP', description: 'Case and spaces do not matter' })
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? normaliseJoinCode(value) : value))
  @Matches(JOIN_CODE_PATTERN, { message: JOIN_CODE_MESSAGE })
  @IsString({ message: JOIN_CODE_MESSAGE })
  code: string;
}
