import { AlertSettingsPage } from '@/features/alerts/components/alert-settings-page';

export function AlertSettingsRoute() {
  return <AlertSettingsPage />;
}
