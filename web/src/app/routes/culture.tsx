import { useParams } from 'react-router-dom';
import { CulturePage } from '@/features/culture/components/culture-page';
import { PhotoStrip } from '@/features/photos/components/photo-strip';
import { CultureFilesCard } from '@/features/transfer/components/culture-files-card';

export function CultureRoute() {
  const { id = '' } = useParams();
  return (
    <CulturePage
      key={id}
      cultureId={id}
      besideCurves={<PhotoStrip cultureId={id} feedingHref={(feedingId) => `/feedings/${feedingId}`} />}
      extra={<CultureFilesCard cultureId={id} />}
    />
  );
}
