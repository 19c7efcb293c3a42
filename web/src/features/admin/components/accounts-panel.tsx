import type { Account, AdminAccount, Role } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Card from '@mui/material/Card';
import LinearProgress from '@mui/material/LinearProgress';
import Snackbar from '@mui/material/Snackbar';
import TablePagination from '@mui/material/TablePagination';
import Typography from '@mui/material/Typography';
import { useTheme } from '@mui/material/styles';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { isApiError } from '@/lib/api-client';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { useAccounts } from '../api/get-accounts';
import { useUpdateRole } from '../api/update-role';
import { useUpdateStatus } from '../api/update-status';
import { roleChangedMessage } from '../utils/roles';
import { statusChangedMessage } from '../utils/status';
import { AccountList, AccountTable } from './account-rows';

const PAGE_SIZE = 20;

type Notice = { severity: 'success' | 'error'; text: string } | null;

/** Zero-based page from `?page=` (one-based in the URL, as people count). */
function pageFrom(params: URLSearchParams): number {
  const page = Number.parseInt(params.get('page') ?? '1', 10);
  return Number.isFinite(page) && page > 1 ? page - 1 : 0;
}

export function AccountsPanel() {
  const self = useSignedInAccount();
  const theme = useTheme();
  const wide = useMediaQuery(theme.breakpoints.up('md'), { noSsr: true });
  const [params, setParams] = useSearchParams();
  const page = pageFrom(params);
  const accounts = useAccounts({ limit: PAGE_SIZE, offset: page * PAGE_SIZE });
  const updateRole = useUpdateRole();
  const updateStatus = useUpdateStatus();
  const [notice, setNotice] = useState<Notice>(null);

  if (accounts.isPending) return <PageLoader label="Loading accounts" />;
  if (accounts.isError) {
    return <LoadError error={accounts.error} onRetry={() => void accounts.refetch()} />;
  }

  const { items, total } = accounts.data;
  const onRoleChange = (account: Account, role: Role) => {
    updateRole.mutate(
      { accountId: account.id, role },
      {
        onSuccess: (updated) =>
          setNotice({ severity: 'success', text: roleChangedMessage(updated.displayName, updated.role) }),
        onError: (error) =>
          setNotice({
            severity: 'error',
            text: isApiError(error) ? error.message : 'The role could not be changed.',
          }),
      },
    );
  };
  const onStatusChange = (account: AdminAccount, disabled: boolean) => {
    updateStatus.mutate(
      { account, disabled },
      {
        onSuccess: (updated) =>
          setNotice({
            severity: 'success',
            text: statusChangedMessage(updated.displayName, updated.disabledAt !== null),
          }),
        onError: (error) =>
          setNotice({
            severity: 'error',
            text: isApiError(error) ? error.message : 'The account could not be changed.',
          }),
      },
    );
  };
  const pendingId = updateRole.isPending
    ? updateRole.variables.accountId
    : updateStatus.isPending
      ? updateStatus.variables.account.id
      : undefined;
  const Rows = wide ? AccountTable : AccountList;

  return (
    <>
      <Typography color="text.secondary">{total === 1 ? '1 account' : `${total} accounts`}</Typography>
      <Card>
        {accounts.isPlaceholderData && <LinearProgress aria-label="Loading page" />}
        {items.length === 0 ? (
          <Typography sx={{ p: 2 }}>No accounts on this page.</Typography>
        ) : (
          <Rows
            accounts={items}
            self={self}
            pendingId={pendingId}
            onRoleChange={onRoleChange}
            onStatusChange={onStatusChange}
          />
        )}
        {total > PAGE_SIZE && (
          <TablePagination
            component="div"
            count={total}
            page={page}
            rowsPerPage={PAGE_SIZE}
            rowsPerPageOptions={[]}
            onPageChange={(_event, next) => setParams(next === 0 ? {} : { page: String(next + 1) })}
          />
        )}
      </Card>
      {notice && (
        <Snackbar
          open
          autoHideDuration={5000}
          onClose={() => setNotice(null)}
          anchorOrigin={{ vertical: 'top', horizontal: 'center' }}
        >
          <Alert severity={notice.severity} variant="filled" onClose={() => setNotice(null)}>
            {notice.text}
          </Alert>
        </Snackbar>
      )}
    </>
  );
}
