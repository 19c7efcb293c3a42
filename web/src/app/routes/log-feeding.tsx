import { useParams } from 'react-router-dom';
import { LogFeedingPage } from '@/features/feeding/components/log-feeding-page';

export function LogFeedingRoute() {
  const { id = '' } = useParams();
  return <LogFeedingPage cultureId={id} />;
}
