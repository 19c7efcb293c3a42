import { useParams } from 'react-router-dom';
import { FeedingLoggerImportPage } from '@/features/logger-import/components/feeding-logger-import';

export function LoggerImportRoute() {
  const { id = '' } = useParams();
  return <FeedingLoggerImportPage key={id} feedingId={id} />;
}
