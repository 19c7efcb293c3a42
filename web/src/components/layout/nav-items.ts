import AdminPanelSettingsOutlined from '@mui/icons-material/AdminPanelSettingsOutlined';
import BakeryDiningOutlined from '@mui/icons-material/BakeryDiningOutlined';
import HomeOutlined from '@mui/icons-material/HomeOutlined';
import KitchenOutlined from '@mui/icons-material/KitchenOutlined';
import PersonOutlined from '@mui/icons-material/PersonOutlined';
import ScaleOutlined from '@mui/icons-material/ScaleOutlined';
import SchoolOutlined from '@mui/icons-material/SchoolOutlined';
import type SvgIcon from '@mui/material/SvgIcon';
import type { NavTarget } from './nav-match';

export interface NavItem extends NavTarget {
  label: string;
  icon: typeof SvgIcon;
}

/**
 * The one list both the phone bottom bar and the wide-screen side rail are drawn from, in order.
 * A new area (Shelf, Bench, Formula, Classroom, Alerts) gets an entry here when its page exists.
 * A phone bar holds five entries comfortably; past that, move the least-used ones (Account, Admin)
 * into the top bar's menu rather than shrinking the labels.
 */
export const NAV_ITEMS: readonly NavItem[] = [
  { label: 'Shelf', to: '/shelf', alsoSections: ['/cultures', '/feedings'], icon: KitchenOutlined },
  { label: 'Bench', to: '/bench', icon: BakeryDiningOutlined },
  { label: 'Formula', to: '/formulas', icon: ScaleOutlined },
  { label: 'Home', to: '/', icon: HomeOutlined },
  // Admins and instructors reach their account from the top bar's menu, which keeps their bar at
  // five entries; an instructor's fifth is the Classroom they teach in (students find it in the menu).
  { label: 'Account', to: '/account', icon: PersonOutlined, roles: ['baker'] },
  { label: 'Classroom', to: '/classes', icon: SchoolOutlined, roles: ['instructor'] },
  {
    label: 'Admin',
    to: '/admin/accounts',
    section: '/admin',
    icon: AdminPanelSettingsOutlined,
    roles: ['admin'],
  },
];
