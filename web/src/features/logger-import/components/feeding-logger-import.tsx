import { LOGGER_WINDOW_HOURS } from '@peakwise/shared';
import { useQueryClient } from '@tanstack/react-query';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { useFeeding } from '@/features/feeding-detail/api/get-feeding';
import { logbookKeys } from '@/lib/logbook/query-keys';
import { feedingTarget } from '../api/add-readings';
import { LoggerImport } from './logger-import';

/** A logger file onto one feeding: the readings from the feeding to 48 h after. */
export function FeedingLoggerImportPage({ feedingId }: { feedingId: string }) {
  const feeding = useFeeding(feedingId);
  const queryClient = useQueryClient();
  if (feeding.isPending) return <PageLoader />;
  if (feeding.isError) return <LoadError error={feeding.error} onRetry={() => void feeding.refetch()} />;
  return (
    <LoggerImport
      place="feeding"
      target={feedingTarget(feedingId)}
      window={{ startMs: Date.parse(feeding.data.fedAt), hours: LOGGER_WINDOW_HOURS }}
      intro={`A CSV from a kitchen temperature logger: one column of times, one of temperatures. The readings from this feeding to ${LOGGER_WINDOW_HOURS} h after are added to it, and the forecast integrates them.`}
      back={`/feedings/${feedingId}`}
      backLabel="Back to the feeding"
      doneTail="They are on the feeding’s temperature card, and the model integrates them."
      // The model integrates the readings, so the forecast and the feeding page change with them.
      onSettled={() => void queryClient.invalidateQueries({ queryKey: logbookKeys.all })}
    />
  );
}
