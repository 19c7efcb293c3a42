import { useParams } from 'react-router-dom';
import { ImportFeedingsPage } from '@/features/transfer/components/import-page';

export function ImportFeedingsRoute() {
  const { id = '' } = useParams();
  return <ImportFeedingsPage key={id} cultureId={id} />;
}
