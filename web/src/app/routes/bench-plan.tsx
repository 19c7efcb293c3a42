import { useParams } from 'react-router-dom';
import { LivePlanPage } from '@/features/bench/components/live-plan-page';

export function BenchPlanRoute() {
  const { id = '' } = useParams();
  return <LivePlanPage key={id} planId={id} />;
}
