import { ShelfPage } from '@/features/shelf/components/shelf-page';

export function ShelfRoute() {
  return <ShelfPage />;
}
