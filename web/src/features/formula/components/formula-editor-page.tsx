import { useState } from 'react';
import { useLocation, useNavigate } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { useFormula } from '../api/get-formula';
import { newFormulaValues, valuesFromFormula } from '../utils/formula-form';
import { FormulaEditor } from './formula-editor';

/** A new formula (no id) or a saved one, in the editor. */
export function FormulaEditorPage({ formulaId }: { formulaId: string | undefined }) {
  const navigate = useNavigate();
  const formula = useFormula(formulaId);
  const location = useLocation();
  const [justSaved, setJustSaved] = useState(
    () => (location.state as { justSaved?: boolean } | null)?.justSaved === true,
  );

  if (formulaId !== undefined && formula.isPending) return <PageLoader />;
  if (formula.isError) return <LoadError error={formula.error} onRetry={() => void formula.refetch()} />;
  const saved = formula.data;

  return (
    <Page
      title={saved ? saved.name : 'New formula'}
      documentTitle={saved ? `${saved.name} · Formula` : 'New formula'}
      intro={justSaved ? 'Saved. Only you can see your formulas.' : 'Private to you. Percentages update as you type.'}
    >
      <FormulaEditor
        // A fresh form once the saved formula arrives, so its values are the defaults.
        key={saved?.id ?? 'new'}
        formula={saved}
        defaultValues={saved ? valuesFromFormula(saved) : newFormulaValues()}
        onSaved={(f) => {
          setJustSaved(true);
          if (!saved) void navigate(`/formulas/${f.id}`, { replace: true, state: { justSaved: true } });
        }}
      />
    </Page>
  );
}
