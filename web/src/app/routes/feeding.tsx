import { useParams } from 'react-router-dom';
import { FeedingPage } from '@/features/feeding-detail/components/feeding-page';

export function FeedingRoute() {
  const { id = '' } = useParams();
  return <FeedingPage key={id} feedingId={id} />;
}
