import { FormulaListPage } from '@/features/formula/components/formula-list-page';

export function FormulaListRoute() {
  return <FormulaListPage />;
}
