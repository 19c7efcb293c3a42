import { Page } from '@/components/layout/page';
import { AccountsPanel } from '@/features/admin/components/accounts-panel';

export function AdminAccountsRoute() {
  return (
    <Page
      title="Accounts"
      documentTitle="Admin · Accounts"
      intro="Everyone with a Peakwise account. Change a role here; bakers’ logs stay private."
    >
      <AccountsPanel />
    </Page>
  );
}
