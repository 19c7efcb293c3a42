export const ROLES = ['baker', 'instructor', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const UNIT_SYSTEMS = ['metric', 'us'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

export const TEMPERATURE_UNITS = ['C', 'F'] as const;
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];

/**
 * Password length limits. OWASP ASVS 5.0 6.2.1 asks for at least 8 characters and 6.2.9 for at
 * least 64 to be accepted; we accept up to 128 so passphrases fit. No composition rules (6.2.5).
 */
export const PASSWORD_MIN_LENGTH = 8;
export const PASSWORD_MAX_LENGTH = 128;
export const DISPLAY_NAME_MAX_LENGTH = 80;
export const EMAIL_MAX_LENGTH = 254;

export interface SignUpRequest {
  email: string;
  displayName: string;
  password: string;
  /** The device's IANA time zone, so forecasts start out in local time; `UTC` when left out. */
  timeZone?: string;
}

export interface SignInRequest {
  email: string;
  password: string;
}

export interface ChangePasswordRequest {
  currentPassword: string;
  newPassword: string;
}

export interface UpdateAccountRequest {
  displayName?: string;
  unitSystem?: UnitSystem;
  temperatureUnit?: TemperatureUnit;
  /** An IANA time zone name, e.g. `Europe/London`. */
  timeZone?: string;
}

export interface Account {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  unitSystem: UnitSystem;
  temperatureUnit: TemperatureUnit;
  timeZone: string;
  /** ISO 8601, UTC. */
  createdAt: string;
}

/** An account as the admin list shows it: whether it may sign in, besides the usual fields. */
export interface AdminAccount extends Account {
  /** ISO 8601, UTC, when an admin disabled the account; null while it is in use. */
  disabledAt: string | null;
}

export interface AccountListResponse {
  items: AdminAccount[];
  total: number;
}

/**
 * PATCH /api/admin/accounts/:id/status (admins). `disabled: true` ends the account's sessions at
 * once and refuses its sign-ins; `false` lets it sign in again. An admin cannot disable themselves.
 */
export interface UpdateAccountStatusRequest {
  disabled: boolean;
}

export interface UpdateRoleRequest {
  role: Role;
}

/** POST /api/account/delete → 204: the account and everything it logged are deleted, and the session ends. */
export interface DeleteAccountRequest {
  password: string;
}
