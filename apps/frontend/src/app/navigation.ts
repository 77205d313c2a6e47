import type { SvgIconComponent } from '@mui/icons-material';
import Inventory2Outlined from '@mui/icons-material/Inventory2Outlined';
import LocalShippingOutlined from '@mui/icons-material/LocalShippingOutlined';
import ManageAccountsOutlined from '@mui/icons-material/ManageAccountsOutlined';
import TodayOutlined from '@mui/icons-material/TodayOutlined';
import CableOutlined from '@mui/icons-material/CableOutlined';
import MenuBookOutlined from '@mui/icons-material/MenuBookOutlined';
import SpeedOutlined from '@mui/icons-material/SpeedOutlined';
import StorefrontOutlined from '@mui/icons-material/StorefrontOutlined';
import InsightsOutlined from '@mui/icons-material/InsightsOutlined';
import AssignmentReturnOutlined from '@mui/icons-material/AssignmentReturnOutlined';
import FactCheckOutlined from '@mui/icons-material/FactCheckOutlined';
import OutboxOutlined from '@mui/icons-material/OutboxOutlined';
import HistoryEduOutlined from '@mui/icons-material/HistoryEduOutlined';
import { paths } from '@/config/paths';
import { ROLES, type Role } from '@/lib/roles';

const ALL = ROLES;

export interface NavItem {
  label: string;
  path: string;
  icon: SvgIconComponent;
  /** Roles that may open the screen. The server checks again; this only hides. */
  roles: readonly Role[];
}

/**
 * The side navigation, in order. Add a screen with one line once it exists.
 * Planned (DESIGN.md): Receiving (clerk, qa_lead, admin), Lots (all), Suppliers (all),
 * Products (all), Instruments (qa_lead, admin; read by clerk), Returns (purchasing, admin),
 * Corrective actions (purchasing, qa_lead, admin), Scorecards (purchasing, qa_lead, admin),
 * Reference (all).
 */
export const navItems: readonly NavItem[] = [
  {
    label: 'Today',
    path: paths.today.path,
    icon: TodayOutlined,
    roles: ['clerk', 'qa_lead', 'purchasing', 'admin'],
  },
  {
    label: 'Receiving',
    path: paths.receiving.path,
    icon: LocalShippingOutlined,
    roles: ['clerk', 'qa_lead', 'admin'],
  },
  {
    label: 'Lots',
    path: paths.lots.path,
    icon: Inventory2Outlined,
    roles: ['clerk', 'qa_lead', 'purchasing', 'admin'],
  },
  { label: 'Suppliers', path: paths.suppliers.path, icon: StorefrontOutlined, roles: ALL },
  { label: 'Products', path: paths.products.path, icon: CableOutlined, roles: ALL },
  {
    label: 'Instruments',
    path: paths.instruments.path,
    icon: SpeedOutlined,
    roles: ['clerk', 'qa_lead', 'admin'], // clerk: read only
  },
  { label: 'Reference', path: paths.reference.path, icon: MenuBookOutlined, roles: ALL },
  {
    label: 'Scorecards',
    path: paths.scorecards.path,
    icon: InsightsOutlined,
    roles: ['purchasing', 'qa_lead', 'admin'],
  },
  {
    label: 'Returns',
    path: paths.returns.path,
    icon: AssignmentReturnOutlined,
    roles: ['purchasing', 'admin'],
  },
  {
    label: 'Corrective actions',
    path: paths.correctiveActions.path,
    icon: FactCheckOutlined,
    roles: ['purchasing', 'qa_lead', 'admin'],
  },
  {
    label: 'Messages',
    path: paths.messages.path,
    icon: OutboxOutlined,
    roles: ['purchasing', 'admin'],
  },
  { label: 'Users', path: paths.users.path, icon: ManageAccountsOutlined, roles: ['admin'] },
  { label: 'Audit trail', path: paths.audit.path, icon: HistoryEduOutlined, roles: ['admin'] },
];

export function navItemsFor(role: Role): NavItem[] {
  return navItems.filter((item) => item.roles.includes(role));
}

function itemForPath(pathname: string): NavItem | undefined {
  return navItems.find((item) => pathname === item.path || pathname.startsWith(`${item.path}/`));
}

/** False only for a known screen the role may not use; unknown paths fall to not-found. */
export function canOpen(role: Role, pathname: string): boolean {
  const item = itemForPath(pathname);
  return item === undefined || item.roles.includes(role);
}

/**
 * The screen a role lands on after signing in: Today, each role's queue of work (purchasing's
 * rejected lots without a return and overdue SCARs, issue 14 point 6; the QA lead's lots at
 * the reject number). Scorecards are one click away.
 */
export function homePathFor(role: Role): string {
  switch (role) {
    case 'purchasing':
    case 'clerk':
    case 'qa_lead':
    case 'admin':
      return paths.today.getHref();
  }
}

/** Where to go after signing in: back where the user was, if that is safe and allowed. */
export function afterSignInPath(role: Role, redirectTo: string | null): string {
  if (!redirectTo || !redirectTo.startsWith('/') || redirectTo.startsWith('//')) {
    return homePathFor(role);
  }
  const pathname = new URL(redirectTo, 'http://local').pathname;
  if (pathname === paths.signIn.path || pathname === paths.root.path || !canOpen(role, pathname)) {
    return homePathFor(role);
  }
  return redirectTo;
}
