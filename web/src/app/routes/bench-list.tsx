import { BenchListPage } from '@/features/bench/components/bench-list-page';

export function BenchListRoute() {
  return <BenchListPage />;
}
