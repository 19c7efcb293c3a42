import Box from '@mui/material/Box';
import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { OwnerComments } from '@/features/comments/components/owner-comments';
import { feedingQueryOptions } from '@/features/feeding-detail/api/get-feeding';
import { FeedingPage } from '@/features/feeding-detail/components/feeding-page';
import { PhotosCard } from '@/features/photos/components/photos-card';

export function FeedingRoute() {
  const { id = '' } = useParams();
  // The class's thread goes under the feeding once the feeding itself has loaded (same query).
  const loaded = useQuery(feedingQueryOptions(id)).isSuccess;
  return (
    <>
      <FeedingPage key={id} feedingId={id} />
      {loaded && (
        <Box sx={{ mt: 3 }}>
          <PhotosCard key={id} subject={{ type: 'feeding', id }} />
        </Box>
      )}
      {loaded && (
        <Box sx={{ mt: 3 }}>
          <OwnerComments key={id} subject={{ type: 'feeding', id }} />
        </Box>
      )}
    </>
  );
}
