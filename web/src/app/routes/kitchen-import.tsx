import { useParams } from 'react-router-dom';
import { KitchenLoggerImportPage } from '@/features/logger-import/components/kitchen-logger-import';

export function KitchenImportRoute() {
  const { id = '' } = useParams();
  return <KitchenLoggerImportPage key={id} planId={id} />;
}
