import type { Account, AdminAccount, Role } from '@peakwise/shared';
import Box from '@mui/material/Box';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { formatDate } from '../utils/format-date';
import { RoleSelect } from './role-select';
import { StatusControl } from './status-control';

export interface AccountRowsProps {
  accounts: AdminAccount[];
  /** The signed-in admin: their own row can't be changed here. */
  self: Account;
  pendingId: string | undefined;
  onRoleChange: (account: Account, role: Role) => void;
  onStatusChange: (account: AdminAccount, disabled: boolean) => void;
}

/** Wide screens: a table, one account per row. */
export function AccountTable({ accounts, self, pendingId, onRoleChange, onStatusChange }: AccountRowsProps) {
  return (
    <Table aria-label="Accounts">
      <TableHead>
        <TableRow>
          <TableCell>Name</TableCell>
          <TableCell>E-mail</TableCell>
          <TableCell>Joined</TableCell>
          <TableCell sx={{ width: 180 }}>Role</TableCell>
          <TableCell sx={{ width: 200 }}>Sign-in</TableCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {accounts.map((account) => (
          <TableRow key={account.id}>
            <TableCell sx={{ fontWeight: 500 }}>{account.displayName}</TableCell>
            <TableCell sx={{ wordBreak: 'break-all' }}>{account.email}</TableCell>
            <TableCell>{formatDate(account.createdAt, self.timeZone)}</TableCell>
            <TableCell>
              <RoleSelect
                inTable
                account={account}
                isSelf={account.id === self.id}
                pending={pendingId === account.id}
                onChange={(role) => onRoleChange(account, role)}
              />
            </TableCell>
            <TableCell>
              <StatusControl
                account={account}
                isSelf={account.id === self.id}
                pending={pendingId === account.id}
                onChange={(disabled) => onStatusChange(account, disabled)}
              />
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}

/** Phones: a stacked list, name and e-mail above the role picker, nothing to scroll sideways. */
export function AccountList({ accounts, self, pendingId, onRoleChange, onStatusChange }: AccountRowsProps) {
  return (
    <List aria-label="Accounts" disablePadding>
      {accounts.map((account) => (
        <ListItem
          key={account.id}
          divider
          sx={{ display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: 1.5, py: 1.5 }}
        >
          <Box sx={{ flex: '1 1 180px', minWidth: 0 }}>
            <Typography sx={{ fontWeight: 500 }}>{account.displayName}</Typography>
            <Typography variant="body2" color="text.secondary" sx={{ wordBreak: 'break-all' }}>
              {account.email}
            </Typography>
            <Typography variant="caption" color="text.secondary">
              Joined {formatDate(account.createdAt, self.timeZone)}
            </Typography>
          </Box>
          <RoleSelect
            account={account}
            isSelf={account.id === self.id}
            pending={pendingId === account.id}
            onChange={(role) => onRoleChange(account, role)}
          />
          <StatusControl
            account={account}
            isSelf={account.id === self.id}
            pending={pendingId === account.id}
            onChange={(disabled) => onStatusChange(account, disabled)}
          />
        </ListItem>
      ))}
    </List>
  );
}
