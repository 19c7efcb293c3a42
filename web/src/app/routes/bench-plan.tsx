import Box from '@mui/material/Box';
import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { planQueryOptions } from '@/features/bench/api/get-plan';
import { LivePlanPage } from '@/features/bench/components/live-plan-page';
import { OwnerComments } from '@/features/comments/components/owner-comments';
import { PhotosCard } from '@/features/photos/components/photos-card';

export function BenchPlanRoute() {
  const { id = '' } = useParams();
  // The class's thread goes under the bake once the plan itself has loaded (same query).
  const loaded = useQuery(planQueryOptions(id)).isSuccess;
  return (
    <>
      <LivePlanPage key={id} planId={id} />
      {loaded && (
        <Box sx={{ mt: 3 }}>
          <PhotosCard key={id} subject={{ type: 'bake-plan', id }} />
        </Box>
      )}
      {loaded && (
        <Box sx={{ mt: 3 }}>
          <OwnerComments key={id} subject={{ type: 'bake-plan', id }} />
        </Box>
      )}
    </>
  );
}
