import { ROLES, type Account, type Role } from '@peakwise/shared';
import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';
import { VisuallyHidden } from '@/components/visually-hidden';
import { ROLE_LABELS } from '../utils/roles';

interface RoleSelectProps {
  account: Account;
  isSelf: boolean;
  pending: boolean;
  onChange: (role: Role) => void;
  /** Under a "Role" column heading the field needs no visible label of its own. */
  inTable?: boolean;
}

function isRole(value: string): value is Role {
  return (ROLES as readonly string[]).includes(value);
}

/** Changes one account's role as soon as a new one is picked. */
export function RoleSelect({ account, isSelf, pending, onChange, inTable = false }: RoleSelectProps) {
  // Every row has a role picker; screen readers hear whose it is.
  const accessibleName = `Role for ${account.displayName}`;
  return (
    <TextField
      select
      size="small"
      name="role"
      label={
        inTable ? undefined : (
          <>
            Role<VisuallyHidden> for {account.displayName}</VisuallyHidden>
          </>
        )
      }
      value={account.role}
      // An admin demoting themselves would lock themselves out of this page mid-change.
      disabled={isSelf || pending}
      helperText={isSelf ? 'That’s you' : undefined}
      onChange={(e) => {
        if (isRole(e.target.value) && e.target.value !== account.role) onChange(e.target.value);
      }}
      slotProps={inTable ? { htmlInput: { 'aria-label': accessibleName } } : undefined}
      sx={{ minWidth: 148 }}
    >
      {ROLES.map((role) => (
        <MenuItem key={role} value={role}>
          {ROLE_LABELS[role]}
        </MenuItem>
      ))}
    </TextField>
  );
}
