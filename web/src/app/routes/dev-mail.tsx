import { DevMailPage } from '@/features/dev-mail/components/dev-mail-page';

/** Development only: the API behind it is absent in production, and the page says so. */
export function DevMailRoute() {
  return <DevMailPage />;
}
