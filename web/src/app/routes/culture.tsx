import { useParams } from 'react-router-dom';
import { CulturePage } from '@/features/culture/components/culture-page';
import { PhotoStrip } from '@/features/photos/components/photo-strip';
import { CultureFilesCard } from '@/features/transfer/components/culture-files-card';

export function CultureRoute() {
  const { id = '' } = useParams();
  const extra = (
    <>
      <PhotoStrip cultureId={id} feedingHref={(feedingId) => `/feedings/${feedingId}`} />
      <CultureFilesCard cultureId={id} />
    </>
  );
  return <CulturePage key={id} cultureId={id} extra={extra} />;
}
