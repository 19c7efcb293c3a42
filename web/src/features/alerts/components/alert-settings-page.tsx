import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { useAlertPreferences } from '../api/alert-preferences';
import { AlertSettingsForm } from './alert-settings-form';
import { PushDevicesCard } from './push-devices-card';

export function AlertSettingsPage() {
  const account = useSignedInAccount();
  const prefs = useAlertPreferences();
  return (
    <Page title="Alert settings" intro="When reminders come and where they reach you.">
      <PushDevicesCard />
      <Card component="section" aria-label="Alert settings">
        <CardContent>
          {prefs.isPending ? (
            <PageLoader label="Loading alert settings…" />
          ) : prefs.isError ? (
            <LoadError error={prefs.error} onRetry={() => void prefs.refetch()} />
          ) : (
            <AlertSettingsForm key={account.id} prefs={prefs.data} timeZone={account.timeZone} />
          )}
        </CardContent>
      </Card>
    </Page>
  );
}
