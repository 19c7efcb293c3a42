import type { ReactNode } from 'react';
import Typography from '@mui/material/Typography';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { useCulture } from '@/lib/logbook/get-culture';
import { useCultureSummary } from '@/lib/logbook/get-culture-summary';
import { useNow } from '@/lib/use-now';
import { FeedingsTable } from './feedings-table';
import { ForecastHeader } from './forecast-header';
import { KineticsCard } from './kinetics-card';
import { LineageCard } from './lineage-card';
import { RiseOverlayCard } from './rise-overlay-card';
import { RunningRiseCard } from './running-rise-card';

/**
 * One culture: where it stands, this feeding's rise, how it answers to temperature, its history.
 * Cards of other features come from the route (features never import each other): `besideCurves`
 * right after the rise curves (the photo strip, so the jar's pictures sit by its curves), `extra`
 * at the end of the page.
 */
export function CulturePage({
  cultureId,
  besideCurves,
  extra,
}: {
  cultureId: string;
  besideCurves?: ReactNode;
  extra?: ReactNode;
}) {
  const account = useSignedInAccount();
  const culture = useCulture(cultureId);
  const summary = useCultureSummary(cultureId);
  const now = useNow();

  if (culture.isPending) return <PageLoader />;
  if (culture.isError) return <LoadError error={culture.error} onRetry={() => void culture.refetch()} />;
  const c = culture.data;
  const intro = [
    c.defaultFlour,
    c.defaultHydrationPct !== null ? `${c.defaultHydrationPct} % hydration` : null,
    c.location === 'fridge' ? 'in the fridge' : 'on the counter',
  ]
    .filter(Boolean)
    .join(' · ');
  // The baker's own notes, and for the demo cultures the line saying their history is generated.
  const notes = c.notes ? (
    <Typography variant="body2" color="text.secondary" sx={{ whiteSpace: 'pre-line' }}>
      {c.notes}
    </Typography>
  ) : null;

  return (
    <Page title={c.name} intro={intro}>
      {notes}
      <ForecastHeader
        cultureId={cultureId}
        summary={summary.data}
        summaryFailed={summary.isError}
        lastFedAt={summary.data?.lastFedAt ?? c.lastFedAt}
        account={account}
        now={now}
      />
      {summary.data?.running && <RunningRiseCard running={summary.data.running} account={account} now={now} />}
      <RiseOverlayCard cultureId={cultureId} account={account} />
      {besideCurves}
      {summary.data && <KineticsCard kinetics={summary.data.kinetics} unit={account.temperatureUnit} />}
      <FeedingsTable cultureId={cultureId} account={account} />
      <LineageCard culture={c} />
      {extra}
    </Page>
  );
}
