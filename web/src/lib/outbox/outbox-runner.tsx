import Alert from '@mui/material/Alert';
import Snackbar from '@mui/material/Snackbar';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { useCurrentAccount } from '../auth/current-account';
import { onHeld, startOutbox } from './outbox';
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

  // Opened offline: the account is not known yet (its check waits for the network), so the
  // shell with its indicator cannot show. Say what is kept here instead of a lone spinner.
  const startingOffline = !online && account.data === undefined;
  const count = outbox.entries.length;

  return (
    <>
      {startingOffline && (
        <Alert
          severity="info"
          role="status"
          sx={{ position: 'fixed', top: 8, insetInline: 8, zIndex: (t) => t.zIndex.snackbar, boxShadow: 2 }}
        >
          {count > 0
            ? `You are offline. ${notYetSentWords(count)}: kept on this device, sent when you are back online.`
            : 'You are offline. Your logbook opens when you are back online.'}
        </Alert>
      )}
      <Snackbar
        open={held !== null}
        autoHideDuration={6000}
        onClose={() => setHeld(null)}
        anchorOrigin={{ vertical: 'top', horizontal: 'center' }}
        sx={{ top: { xs: 64, sm: 72 } }}
      >
        <Alert severity="info" variant="filled" onClose={() => setHeld(null)} data-testid="outbox-held">
          {held}
        </Alert>
      </Snackbar>
    </>
  );
}
