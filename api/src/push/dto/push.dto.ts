import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  PUSH_ENDPOINT_MAX_LENGTH,
  PUSH_LABEL_MAX_LENGTH,
  type CreatePushSubscriptionRequest,
  type PushDevice,
  type PushDeviceListResponse,
  type PushPublicKey,
  type PushTestResponse,
} from '@peakwise/shared';
import { Type } from 'class-transformer';
import { IsDefined, IsObject, IsString, Matches, MaxLength, MinLength, ValidateNested } from 'class-validator';
import { Omittable } from '../../common/dto-helpers.js';

export class PushKeysDto {
  @ApiProperty({ description: "The browser's P-256 public key, base64url (65 bytes)" })
  @Matches(/^[A-Za-z0-9_-]{86,88}$/, { message: 'Expected the browser’s P-256 key (base64url, 65 bytes).' })
  p256dh: string;

  @ApiProperty({ description: 'The auth secret, base64url (16 bytes)' })
  @Matches(/^[A-Za-z0-9_-]{22,24}$/, { message: 'Expected a 16-byte auth secret (base64url).' })
  auth: string;
}

export class CreatePushSubscriptionDto implements CreatePushSubscriptionRequest {
  @ApiProperty({ description: "The push service URL from the browser's PushSubscription" })
  @MaxLength(PUSH_ENDPOINT_MAX_LENGTH, { message: `At most ${PUSH_ENDPOINT_MAX_LENGTH} characters.` })
  @IsString({ message: 'Expected the subscription’s endpoint URL.' })
  endpoint: string;

  @ApiProperty({ type: PushKeysDto })
  @IsDefined({ message: 'Send the subscription’s keys (p256dh and auth).' })
  // ValidateNested lets an array through (it checks each item, and [] has none): a 500 at insert.
  @IsObject({ message: 'Send the subscription’s keys (p256dh and auth).' })
  @ValidateNested()
  @Type(() => PushKeysDto)
  keys: PushKeysDto;

  @ApiPropertyOptional({ maxLength: PUSH_LABEL_MAX_LENGTH, example: 'Chrome on Android' })
  @Omittable()
  @MaxLength(PUSH_LABEL_MAX_LENGTH, { message: `At most ${PUSH_LABEL_MAX_LENGTH} characters.` })
  @MinLength(1, { message: 'Give the device a name, or leave it out.' })
  @IsString({ message: 'Expected text.' })
  label?: string;
}

export class PushPublicKeyView implements PushPublicKey {
  @ApiProperty() publicKey: string;
}

export class PushDeviceView implements PushDevice {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() label: string;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
  @ApiProperty({ format: 'date-time', nullable: true, type: String }) lastSentAt: string | null;
  @ApiProperty({ nullable: true, type: String }) lastError: string | null;
}

export class PushDeviceListView implements PushDeviceListResponse {
  @ApiProperty({ type: [PushDeviceView] }) items: PushDeviceView[];
}

export class PushTestView implements PushTestResponse {
  @ApiProperty() delivered: boolean;
  @ApiPropertyOptional() problem?: string;
}
