import { NewPlanPage } from '@/features/bench/components/new-plan-page';

export function BenchNewRoute() {
  return <NewPlanPage />;
}
