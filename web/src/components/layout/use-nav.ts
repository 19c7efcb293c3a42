import { useLocation } from 'react-router-dom';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { NAV_ITEMS, type NavItem } from './nav-items';
import { activeItem, visibleFor } from './nav-match';

/** The entries this person may see, and the one for the current page. */
export function useNav(): { items: NavItem[]; active: NavItem | undefined } {
  const { role } = useSignedInAccount();
  const { pathname } = useLocation();
  const items = visibleFor(NAV_ITEMS, role);
  return { items, active: activeItem(items, pathname) };
}
