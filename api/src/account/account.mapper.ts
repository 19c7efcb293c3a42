import type { Account, AdminAccount } from '@peakwise/shared';
import type { AccountRecord } from './account.repository.js';

/** The public face of an account: never the password hash. */
export function toAccount(record: AccountRecord): Account {
  return {
    id: record.id,
    email: record.email,
    displayName: record.displayName,
    role: record.role,
    unitSystem: record.unitSystem,
    temperatureUnit: record.temperatureUnit,
    timeZone: record.timeZone,
    createdAt: record.createdAt.toISOString(),
  };
}

/** What an admin sees of an account: the public face and whether it is disabled. */
export function toAdminAccount(record: AccountRecord): AdminAccount {
  return { ...toAccount(record), disabledAt: record.disabledAt ? record.disabledAt.toISOString() : null };
}
