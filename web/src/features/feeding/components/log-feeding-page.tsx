import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import { useNavigate } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { useCulture } from '@/lib/logbook/get-culture';
import { useFeedings } from '@/lib/logbook/get-feedings';
import { LogFeedingForm } from './log-feeding-form';

/** Log feeding: opens with the last feeding's amounts; saving goes to the culture's page. */
export function LogFeedingPage({ cultureId }: { cultureId: string }) {
  const account = useSignedInAccount();
  const navigate = useNavigate();
  const culture = useCulture(cultureId);
  const last = useFeedings(cultureId, { limit: 1, order: 'desc' });

  // Offline with no last feeding at hand (its fetch waits for a signal): open with the plain
  // defaults, so a feeding can still be logged into the outbox.
  if (culture.isPending || (last.isPending && last.fetchStatus !== 'paused')) return <PageLoader />;
  if (culture.isError) return <LoadError error={culture.error} />;

  return (
    <Page title={`Log feeding · ${culture.data.name}`} documentTitle="Log feeding">
      <Card>
        <CardContent>
          <LogFeedingForm
            culture={culture.data}
            last={last.data?.items[0]}
            account={account}
            onSaved={() => void navigate(`/cultures/${cultureId}`, { state: { justFed: true } })}
          />
        </CardContent>
      </Card>
    </Page>
  );
}
