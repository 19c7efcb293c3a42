import { useParams } from 'react-router-dom';
import { RiseCheckPage } from '@/features/rise-check/components/rise-check-page';

export function RiseCheckRoute() {
  const { id = '' } = useParams();
  return <RiseCheckPage cultureId={id} />;
}
