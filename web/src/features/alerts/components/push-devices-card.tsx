import type { PushDevice } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useEffect, useState } from 'react';
import { LoadError } from '@/components/feedback/load-error';
import { formatAgo } from '@/lib/format/duration';
import {
  getPushKey,
  useAddPushDevice,
  usePushDevices,
  useRemovePushDevice,
  useTestPushDevice,
} from '../api/push-devices';
import { currentEndpoint, pushSupport, subscribeThisBrowser, unsubscribeThisBrowser } from '../utils/browser-push';

const SUPPORT_NOTES = {
  unsupported: 'This browser cannot show notifications from websites. Alerts still reach you in the app and by e-mail.',
  insecure: 'Notifications need a secure (https) address. Alerts still reach you in the app and by e-mail.',
} as const;

function deviceLine(device: PushDevice, now: Date): string {
  if (device.lastError) return `Last attempt failed: ${device.lastError}`;
  if (device.lastSentAt) return `Last notification ${formatAgo(device.lastSentAt, now)}`;
  return `Turned on ${formatAgo(device.createdAt, now)}`;
}

/**
 * Push notifications per device: turn them on for this browser (asks permission, subscribes with
 * the server's key), see every device that gets them, send a test, remove one.
 */
export function PushDevicesCard() {
  const support = pushSupport();
  const devices = usePushDevices();
  const add = useAddPushDevice();
  const remove = useRemovePushDevice();
  const test = useTestPushDevice();
  const [problem, setProblem] = useState<string | null>(null);
  const [testResult, setTestResult] = useState<{ id: string; text: string; ok: boolean } | null>(null);
  const [thisEndpoint, setThisEndpoint] = useState<string | null>(null);
  const [thisDeviceId, setThisDeviceId] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  useEffect(() => {
    void currentEndpoint().then(setThisEndpoint, () => setThisEndpoint(null));
  }, []);

  const turnOn = async () => {
    setProblem(null);
    setBusy(true);
    try {
      const { publicKey } = await getPushKey();
      const subscription = await subscribeThisBrowser(publicKey);
      const device = await add.mutateAsync(subscription);
      setThisEndpoint(subscription.endpoint);
      setThisDeviceId(device.id);
    } catch (error) {
      setProblem(error instanceof Error ? error.message : String(error));
    } finally {
      setBusy(false);
    }
  };

  const removeDevice = async (device: PushDevice) => {
    setProblem(null);
    try {
      await remove.mutateAsync(device.id);
      if (device.id === thisDeviceId) {
        await unsubscribeThisBrowser();
        setThisDeviceId(null);
        setThisEndpoint(null);
      }
    } catch (error) {
      setProblem(error instanceof Error ? error.message : String(error));
    }
  };

  const sendTest = async (device: PushDevice) => {
    const result = await test.mutateAsync(device.id).catch((error: unknown) => ({
      delivered: false,
      problem: error instanceof Error ? error.message : String(error),
    }));
    setTestResult({
      id: device.id,
      ok: result.delivered,
      text: result.delivered
        ? 'Sent. It should appear on that device within a few seconds.'
        : (result.problem ?? 'Not delivered.'),
    });
  };

  const now = new Date();
  const items = devices.data?.items ?? [];

  return (
    <Card component="section" aria-labelledby="push-devices-heading">
      <CardContent>
        <Stack spacing={2}>
          <Box>
            <Typography id="push-devices-heading" variant="h2" gutterBottom>
              Push notifications
            </Typography>
            <Typography variant="body2" color="text.secondary">
              A notification on your phone or computer when an alert is due, even with Peakwise closed. Choose which
              alerts push below; quiet hours apply.
            </Typography>
          </Box>
          {support === 'supported' ? (
            <Box>
              <Button variant="contained" onClick={() => void turnOn()} disabled={busy}>
                {thisEndpoint ? 'Renew for this browser' : 'Turn on for this browser'}
              </Button>
            </Box>
          ) : (
            <Alert severity="info">{SUPPORT_NOTES[support]}</Alert>
          )}
          {problem && <Alert severity="warning">{problem}</Alert>}
          {devices.isError && <LoadError error={devices.error} onRetry={() => void devices.refetch()} />}
          {devices.isSuccess && items.length === 0 && (
            <Typography variant="body2" color="text.secondary">
              No device gets push notifications yet.
            </Typography>
          )}
          {items.length > 0 && (
            <List aria-label="Devices with push notifications" disablePadding>
              {items.map((device) => (
                <ListItem key={device.id} divider disableGutters sx={{ display: 'block' }}>
                  <ListItemText
                    primary={
                      <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
                        <span>{device.label}</span>
                        {device.id === thisDeviceId && <Chip size="small" label="This browser" />}
                      </Stack>
                    }
                    secondary={deviceLine(device, now)}
                  />
                  <Stack direction="row" spacing={1}>
                    <Button size="small" onClick={() => void sendTest(device)} disabled={test.isPending}>
                      Send a test
                    </Button>
                    <Button size="small" color="error" onClick={() => void removeDevice(device)}>
                      Remove
                    </Button>
                  </Stack>
                  {testResult?.id === device.id && (
                    <Alert severity={testResult.ok ? 'success' : 'warning'} sx={{ mt: 1 }}>
                      {testResult.text}
                    </Alert>
                  )}
                </ListItem>
              ))}
            </List>
          )}
        </Stack>
      </CardContent>
    </Card>
  );
}
