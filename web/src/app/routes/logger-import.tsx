import { useParams } from 'react-router-dom';
import { LoggerImportPage } from '@/features/logger-import/components/logger-import-page';

export function LoggerImportRoute() {
  const { id = '' } = useParams();
  return <LoggerImportPage key={id} feedingId={id} />;
}
