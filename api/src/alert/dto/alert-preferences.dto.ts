import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  ALERT_LEAD_MINUTES_MAX,
  ALERT_LEAD_MINUTES_MIN,
  type AlertChannelChoice,
  type AlertKind,
  type AlertPreferences,
  type AlertQuietHours,
  type UpdateAlertPreferencesRequest,
} from '@peakwise/shared';
import { Type } from 'class-transformer';
import { IsBoolean, IsInt, IsObject, Matches, Max, Min, ValidateNested } from 'class-validator';
import { Omittable } from '../../common/dto-helpers.js';
import { Clearable } from '../../common/log-fields.js';

const CLOCK = /^([01]\d|2[0-3]):[0-5]\d$/;
const CLOCK_MESSAGE = 'Enter a local clock time HH:MM, e.g. 22:00.';

export class AlertQuietHoursDto implements AlertQuietHours {
  @ApiProperty({ example: '22:00' }) @Matches(CLOCK, { message: CLOCK_MESSAGE }) from: string;
  @ApiProperty({ example: '07:00' }) @Matches(CLOCK, { message: CLOCK_MESSAGE }) until: string;
}

export class AlertChannelChoiceDto implements AlertChannelChoice {
  @ApiProperty() email: boolean;
  @ApiProperty({ description: 'Web push, to every device turned on in the alert settings' }) push: boolean;
}

export class AlertChannelPatchDto implements Partial<AlertChannelChoice> {
  @ApiPropertyOptional() @Omittable() @IsBoolean({ message: 'Choose true or false.' }) email?: boolean;
  @ApiPropertyOptional() @Omittable() @IsBoolean({ message: 'Choose true or false.' }) push?: boolean;
}

/** Each kind optional; a kind left out keeps its channels. */
export class AlertChannelsPatchDto implements Partial<Record<AlertKind, Partial<AlertChannelChoice>>> {
  @ApiPropertyOptional({ type: AlertChannelPatchDto })
  @Omittable()
  @IsObject({ message: 'Send an object.' })
  @ValidateNested()
  @Type(() => AlertChannelPatchDto)
  'culture-ready'?: AlertChannelPatchDto;

  @ApiPropertyOptional({ type: AlertChannelPatchDto })
  @Omittable()
  @IsObject({ message: 'Send an object.' })
  @ValidateNested()
  @Type(() => AlertChannelPatchDto)
  'past-peak'?: AlertChannelPatchDto;

  @ApiPropertyOptional({ type: AlertChannelPatchDto })
  @Omittable()
  @IsObject({ message: 'Send an object.' })
  @ValidateNested()
  @Type(() => AlertChannelPatchDto)
  'feeding-due'?: AlertChannelPatchDto;

  @ApiPropertyOptional({ type: AlertChannelPatchDto })
  @Omittable()
  @IsObject({ message: 'Send an object.' })
  @ValidateNested()
  @Type(() => AlertChannelPatchDto)
  'plan-step'?: AlertChannelPatchDto;

  @ApiPropertyOptional({ type: AlertChannelPatchDto })
  @Omittable()
  @IsObject({ message: 'Send an object.' })
  @ValidateNested()
  @Type(() => AlertChannelPatchDto)
  comment?: AlertChannelPatchDto;
}

export class UpdateAlertPreferencesDto implements UpdateAlertPreferencesRequest {
  @ApiPropertyOptional({ minimum: ALERT_LEAD_MINUTES_MIN, maximum: ALERT_LEAD_MINUTES_MAX, description: 'min' })
  @Omittable()
  @Max(ALERT_LEAD_MINUTES_MAX, { message: `Enter a lead time from 0 to ${ALERT_LEAD_MINUTES_MAX} minutes.` })
  @Min(ALERT_LEAD_MINUTES_MIN, { message: `Enter a lead time from 0 to ${ALERT_LEAD_MINUTES_MAX} minutes.` })
  @IsInt({ message: 'Enter whole minutes.' })
  leadMinutes?: number;

  @ApiPropertyOptional({ type: AlertQuietHoursDto, nullable: true, description: 'null = no quiet hours' })
  @Clearable()
  @IsObject({ message: 'Send an object.' })
  @ValidateNested()
  @Type(() => AlertQuietHoursDto)
  quietHours?: AlertQuietHoursDto | null;

  @ApiPropertyOptional({ type: AlertChannelsPatchDto })
  @Omittable()
  @IsObject({ message: 'Send an object.' })
  @ValidateNested()
  @Type(() => AlertChannelsPatchDto)
  channels?: AlertChannelsPatchDto;
}

class AlertChannelsView implements Record<AlertKind, AlertChannelChoice> {
  @ApiProperty({ type: AlertChannelChoiceDto }) 'culture-ready': AlertChannelChoiceDto;
  @ApiProperty({ type: AlertChannelChoiceDto }) 'past-peak': AlertChannelChoiceDto;
  @ApiProperty({ type: AlertChannelChoiceDto }) 'feeding-due': AlertChannelChoiceDto;
  @ApiProperty({ type: AlertChannelChoiceDto }) 'plan-step': AlertChannelChoiceDto;
  @ApiProperty({ type: AlertChannelChoiceDto }) comment: AlertChannelChoiceDto;
}

export class AlertPreferencesView implements AlertPreferences {
  @ApiProperty({ description: 'min before the ready window starts' }) leadMinutes: number;
  @ApiProperty({ type: AlertQuietHoursDto, nullable: true }) quietHours: AlertQuietHoursDto | null;
  @ApiProperty({ type: AlertChannelsView, description: 'Per kind, channels besides the app (always on)' })
  channels: AlertChannelsView;
}
