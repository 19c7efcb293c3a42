import { useParams } from 'react-router-dom';
import { CulturePage } from '@/features/culture/components/culture-page';
import { CultureFilesCard } from '@/features/transfer/components/culture-files-card';

export function CultureRoute() {
  const { id = '' } = useParams();
  return <CulturePage key={id} cultureId={id} extra={<CultureFilesCard cultureId={id} />} />;
}
