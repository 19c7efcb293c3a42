import type { RiseCheck } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import { useState } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { toLocalInput } from '@/lib/format/local-input';
import { formatAgo } from '@/lib/format/duration';
import { useCulture } from '@/lib/logbook/get-culture';
import { useFeedings } from '@/lib/logbook/get-feedings';
import { RiseCheckForm } from './rise-check-form';
import { RiseCheckSaved } from './rise-check-saved';

/** Rise check of the latest feeding; saving goes to the culture page with the refitted curve. */
export function RiseCheckPage({ cultureId }: { cultureId: string }) {
  const account = useSignedInAccount();
  const navigate = useNavigate();
  const culture = useCulture(cultureId);
  const latest = useFeedings(cultureId, { limit: 1, order: 'desc' });
  const [now] = useState(() => new Date());
  const [saved, setSaved] = useState<RiseCheck | null>(null);

  if (culture.isPending || latest.isPending) return <PageLoader />;
  if (culture.isError) return <LoadError error={culture.error} />;
  if (latest.isError) return <LoadError error={latest.error} />;
  const feeding = latest.data.items[0];

  return (
    <Page
      title={`Rise check · ${culture.data.name}`}
      documentTitle="Rise check"
      intro={feeding ? `For the feeding ${formatAgo(feeding.fedAt, now)}.` : undefined}
    >
      {saved ? (
        <RiseCheckSaved check={saved} cultureHref={`/cultures/${cultureId}`} />
      ) : feeding ? (
        <Card>
          <CardContent>
            <RiseCheckForm
              feeding={feeding}
              account={account}
              defaultTakenAt={toLocalInput(now)}
              // Stored: offer a photo of the jar. Waiting in the outbox (no signal): straight to the culture.
              onSaved={(check) => (check ? setSaved(check) : void navigate(`/cultures/${cultureId}`))}
            />
          </CardContent>
        </Card>
      ) : (
        <Alert
          severity="info"
          action={
            <Button component={RouterLink} to={`/cultures/${cultureId}/feed`} color="inherit">
              Log feeding
            </Button>
          }
        >
          A rise check belongs to a feeding. Log one first.
        </Alert>
      )}
    </Page>
  );
}
