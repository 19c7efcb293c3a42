import Link from '@mui/material/Link';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { cultureQueryOptions } from '@/lib/logbook/get-culture';
import { riseChecksQueryOptions } from '@/lib/logbook/get-rise-checks';
import { useDeleteFeeding } from '../api/delete-feeding';
import { useFeeding } from '../api/get-feeding';
import { useTemperatures } from '../api/get-temperatures';
import { formatWhen } from '../utils/feeding-words';
import { ConfirmDialog } from './confirm-dialog';
import { FeedingCard } from './feeding-card';
import { RiseChecksCard } from './rise-checks-card';
import { TemperaturesCard } from './temperatures-card';

const count = (n: number | undefined, one: string, many: string) =>
  n === undefined ? `its ${many}` : n === 1 ? `its 1 ${one}` : `its ${n} ${many}`;

/** One feeding: as recorded, corrected, its rise checks and temperature readings; or deleted. */
export function FeedingPage({ feedingId }: { feedingId: string }) {
  const account = useSignedInAccount();
  const navigate = useNavigate();
  const feeding = useFeeding(feedingId);
  const cultureId = feeding.data?.cultureId;
  const culture = useQuery({ ...cultureQueryOptions(cultureId ?? ''), enabled: cultureId !== undefined });
  const checks = useQuery(riseChecksQueryOptions(feedingId));
  const readings = useTemperatures(feedingId);
  const remove = useDeleteFeeding(feedingId);
  const [confirming, setConfirming] = useState(false);

  if (feeding.isPending) return <PageLoader />;
  if (feeding.isError) return <LoadError error={feeding.error} onRetry={() => void feeding.refetch()} />;
  const f = feeding.data;
  const name = culture.data?.name ?? 'its culture';

  return (
    <Page
      title={culture.data ? `Feeding · ${culture.data.name}` : 'Feeding'}
      documentTitle="Feeding"
      intro={
        <>
          Fed {formatWhen(f.fedAt, account.timeZone)}. Back to{' '}
          <Link component={RouterLink} to={`/cultures/${f.cultureId}`}>
            {name}
          </Link>
          .
        </>
      }
    >
      <FeedingCard feeding={f} account={account} onDelete={() => setConfirming(true)} />
      <RiseChecksCard feeding={f} account={account} />
      <TemperaturesCard feeding={f} account={account} />
      <ConfirmDialog
        open={confirming}
        title="Delete this feeding?"
        confirmLabel="Delete feeding"
        onConfirm={async () => {
          await remove.mutateAsync();
          void navigate(`/cultures/${f.cultureId}`, { replace: true });
        }}
        onClose={() => setConfirming(false)}
      >
        The feeding of {formatWhen(f.fedAt, account.timeZone)} goes, and{' '}
        {count(checks.data?.total, 'rise check', 'rise checks')} and{' '}
        {count(readings.data?.total, 'temperature reading', 'temperature readings')} go with it. This can’t be undone.
      </ConfirmDialog>
    </Page>
  );
}
