import { useParams } from 'react-router-dom';
import { FormulaPrintPage } from '@/features/formula/components/formula-print-page';

export function FormulaPrintRoute() {
  const { id = '' } = useParams();
  return <FormulaPrintPage formulaId={id} />;
}
