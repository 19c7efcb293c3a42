import { AlertsPage } from '@/features/alerts/components/alerts-page';

export function AlertsRoute() {
  return <AlertsPage />;
}
