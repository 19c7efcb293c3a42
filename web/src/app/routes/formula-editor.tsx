import { useParams } from 'react-router-dom';
import { FormulaEditorPage } from '@/features/formula/components/formula-editor-page';

/** /formulas/new (no id) and /formulas/:id. */
export function FormulaEditorRoute() {
  const { id } = useParams();
  return <FormulaEditorPage key={id ?? 'new'} formulaId={id} />;
}
