import { useParams } from 'react-router-dom';
import { CulturePage } from '@/features/culture/components/culture-page';

export function CultureRoute() {
  const { id = '' } = useParams();
  return <CulturePage key={id} cultureId={id} />;
}
