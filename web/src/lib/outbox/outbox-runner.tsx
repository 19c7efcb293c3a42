import Alert from '@mui/material/Alert';
import Snackbar from '@mui/material/Snackbar';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { isApiError } from '../api-client';
import { useCurrentAccount } from '../auth/current-account';
import { onHeld, startOutbox } from './outbox';
import { retryDelay } from './replay';
import { notYetSentWords, useOnline, useOutbox } from './use-outbox';

/**
 * Runs the outbox for whoever is signed in, says so when a save was kept on this device, and —
 * when the app opened without a signal and so cannot show the logbook yet — says what is
 * waiting. Mounted once, beside the router.
 */
export function OutboxRunner() {
  const queryClient = useQueryClient();
  const account = useCurrentAccount();
  const accountId = account.data?.id;
  const online = useOnline();
  const outbox = useOutbox(accountId);
  const [held, setHeld] = useState<string | null>(null);

  useEffect(() => {
    if (!accountId) return;
    // What was sent changes lists, summaries and predictions: ask for all of them again.
    return startOutbox(accountId, () => void queryClient.invalidateQueries());
  }, [accountId, queryClient]);

  useEffect(
    () =>
      onHeld(() =>
        setHeld(
          navigator.onLine
            ? 'Saved on this device; it will be sent in a moment.'
            : 'Saved on this device; it will be sent when you are online.',
        ),
      ),
    [],
  );

  // Opened without a connection: the account is not known yet (its check failed or waits for the
  // network), so the shell with its indicator cannot show. Say what is kept here instead, and
  // keep asking, with the outbox's backoff, so the writes go out once the server answers. (A
  // reloaded page may claim to be online while nothing gets through: the failed check counts.)
  const unreachable = isApiError(account.error) && account.error.status === 0;
  const startingOffline = account.data === undefined && (!online || unreachable);
  const count = outbox.entries.length;
  const { refetch, errorUpdateCount } = account;
  useEffect(() => {
    if (!unreachable) return;
    const timer = setTimeout(() => void refetch(), retryDelay(Math.max(1, errorUpdateCount)));
    return () => clearTimeout(timer);
  }, [unreachable, refetch, errorUpdateCount]);

  return (
    <>
      {startingOffline && (
        <Alert
          severity="info"
          role="status"
          data-testid="outbox-offline-start"
          sx={{ position: 'fixed', bottom: 8, insetInline: 8, zIndex: (t) => t.zIndex.snackbar, boxShadow: 2 }}
        >
          {online ? 'Peakwise cannot be reached right now. ' : 'You are offline. '}
          {count > 0
            ? `${notYetSentWords(count)}: kept on this device and sent when the connection is back.`
            : 'Your logbook opens when the connection is back.'}
        </Alert>
      )}
      <Snackbar
        open={held !== null}
        autoHideDuration={6000}
        onClose={() => setHeld(null)}
        anchorOrigin={{ vertical: 'bottom', horizontal: 'center' }}
        // Above the phone's bottom navigation.
        sx={{ bottom: { xs: 'calc(56px + env(safe-area-inset-bottom) + 12px)', md: 24 } }}
      >
        <Alert severity="info" variant="filled" onClose={() => setHeld(null)} data-testid="outbox-held">
          {held}
        </Alert>
      </Snackbar>
    </>
  );
}
