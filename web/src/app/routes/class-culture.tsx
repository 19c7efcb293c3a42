import Typography from '@mui/material/Typography';
import { useMemo } from 'react';
import { useParams } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { classLogSource } from '@/features/classroom/api/class-log-source';
import { useClass } from '@/features/classroom/api/get-class';
import { useClassCulture } from '@/features/classroom/api/get-class-culture';
import { useClassCultureSummary } from '@/features/classroom/api/get-class-culture-summary';
import { useRoster } from '@/features/classroom/api/get-roster';
import { ClassFeedingsCard } from '@/features/classroom/components/class-feedings-card';
import { ReadOnlyBanner } from '@/features/classroom/components/read-only-banner';
import { StudentBakesCard } from '@/features/classroom/components/student-bakes-card';
import { ForecastHeader } from '@/features/culture/components/forecast-header';
import { KineticsCard } from '@/features/culture/components/kinetics-card';
import { RiseOverlayCard } from '@/features/culture/components/rise-overlay-card';
import { RunningRiseCard } from '@/features/culture/components/running-rise-card';
import { PhotoStrip } from '@/features/photos/components/photo-strip';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { useNow } from '@/lib/use-now';

/**
 * A student's culture, read-only, for the class's instructor: the charts the student sees (from the
 * culture feature), fed by the class's drill-down routes (from the classroom feature).
 */
function ClassCulture({ classId, cultureId }: { classId: string; cultureId: string }) {
  const account = useSignedInAccount();
  const now = useNow();
  const bakingClass = useClass(classId);
  const culture = useClassCulture(classId, cultureId);
  const summary = useClassCultureSummary(classId, cultureId);
  // The roster knows whose culture this is (for the bakes and the banner); a class fits in one page.
  const roster = useRoster(classId, { limit: 200 });
  const row = roster.data?.items.find((r) => r.cultureId === cultureId);
  const source = useMemo(() => classLogSource(classId, cultureId), [classId, cultureId]);

  if (culture.isPending) return <PageLoader />;
  if (culture.isError) return <LoadError error={culture.error} onRetry={() => void culture.refetch()} />;
  const c = culture.data;
  const intro = [
    row ? `${row.studentName}’s culture` : null,
    c.defaultFlour,
    c.defaultHydrationPct !== null ? `${c.defaultHydrationPct} % hydration` : null,
    c.location === 'fridge' ? 'in the fridge' : 'on the counter',
  ]
    .filter(Boolean)
    .join(' · ');

  return (
    <Page title={c.name} intro={intro}>
      <ReadOnlyBanner
        classId={classId}
        className={bakingClass.data?.name ?? null}
        studentName={row?.studentName ?? null}
      />
      {c.notes && (
        <Typography variant="body2" color="text.secondary" sx={{ whiteSpace: 'pre-line' }}>
          {c.notes}
        </Typography>
      )}
      <ForecastHeader
        cultureId={cultureId}
        summary={summary.data}
        summaryFailed={summary.isError}
        lastFedAt={summary.data?.lastFedAt ?? c.lastFedAt}
        account={account}
        now={now}
        readOnly
      />
      {summary.data?.running && <RunningRiseCard running={summary.data.running} account={account} now={now} />}
      <RiseOverlayCard cultureId={cultureId} account={account} source={source} />
      <PhotoStrip
        cultureId={cultureId}
        source={source}
        feedingHref={(feedingId) => `/classes/${classId}/feedings/${feedingId}`}
        readOnly
      />
      {summary.data && (
        <KineticsCard
          kinetics={summary.data.kinetics}
          unit={account.temperatureUnit}
          whose={row ? `${row.studentName}’s` : 'the student’s'}
        />
      )}
      <ClassFeedingsCard classId={classId} cultureId={cultureId} account={account} />
      {row && (
        <StudentBakesCard classId={classId} studentId={row.studentId} studentName={row.studentName} account={account} />
      )}
    </Page>
  );
}

export function ClassCultureRoute() {
  const { classId = '', cultureId = '' } = useParams();
  return <ClassCulture key={`${classId}/${cultureId}`} classId={classId} cultureId={cultureId} />;
}
