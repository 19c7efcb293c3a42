import { ApiProperty } from '@nestjs/swagger';
import {
  ROLES,
  TEMPERATURE_UNITS,
  UNIT_SYSTEMS,
  type Account,
  type AccountListResponse,
  type AdminAccount,
  type Role,
  type TemperatureUnit,
  type UnitSystem,
} from '@peakwise/shared';

/** Documents the Account shape in the OpenAPI reference; the type itself lives in shared/. */
export class AccountView implements Account {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() email: string;
  @ApiProperty() displayName: string;
  @ApiProperty({ enum: ROLES }) role: Role;
  @ApiProperty({ enum: UNIT_SYSTEMS }) unitSystem: UnitSystem;
  @ApiProperty({ enum: TEMPERATURE_UNITS }) temperatureUnit: TemperatureUnit;
  @ApiProperty({ example: 'Europe/London' }) timeZone: string;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
}

export class AdminAccountView extends AccountView implements AdminAccount {
  @ApiProperty({ format: 'date-time', nullable: true, type: String }) disabledAt: string | null;
}

export class AccountListView implements AccountListResponse {
  @ApiProperty({ type: [AdminAccountView] }) items: AdminAccountView[];
  @ApiProperty() total: number;
}
