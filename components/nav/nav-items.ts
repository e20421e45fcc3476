import type { Href } from 'expo-router';
import type { Role } from '../../shared/schemas/auth';

export interface NavItem {
  label: string;
  href: Href;
  /** The first path segment the item owns; `''` is home. */
  segment: string;
  /** Roles that see the item; omitted means every role. The server enforces access regardless. */
  roles?: readonly Role[];
}

/** One line per screen. */
export const NAV_ITEMS: readonly NavItem[] = [
  { label: 'Home', href: '/', segment: '' },
  { label: 'Jobs', href: '/jobs', segment: 'jobs' },
  { label: 'Catalogue', href: '/alloys', segment: 'alloys' },
  { label: 'Flex parts', href: '/flex-parts', segment: 'flex-parts' },
  { label: 'Quotes', href: '/quotes', segment: 'quotes' },
  { label: 'Weld rules', href: '/weld-rules', segment: 'weld-rules', roles: ['engineer', 'admin'] },
  { label: 'Outbox', href: '/outbox', segment: 'outbox', roles: ['admin', 'sales'] },
  { label: 'Shop settings', href: '/shop-settings', segment: 'shop-settings', roles: ['admin'] },
  { label: 'Currency rates', href: '/currency-rates', segment: 'currency-rates', roles: ['admin'] },
  { label: 'Users', href: '/users', segment: 'users', roles: ['admin'] },
  { label: 'Units', href: '/account', segment: 'account' },
];

export function navItemsFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => !item.roles || item.roles.includes(role));
}

/** How many destinations fit on a phone's tab bar, "More" included. */
export const TAB_BAR_SLOTS = 4;

/** The first items go on the phone's tab bar; when there are too many, the rest go behind "More". */
export function splitForTabBar(items: NavItem[]): { tabs: NavItem[]; more: NavItem[] } {
  if (items.length <= TAB_BAR_SLOTS) return { tabs: items, more: [] };
  return { tabs: items.slice(0, TAB_BAR_SLOTS - 1), more: items.slice(TAB_BAR_SLOTS - 1) };
}

export function isActive(item: NavItem, pathname: string): boolean {
  const first = pathname.split('/').filter(Boolean)[0] ?? '';
  return first === item.segment;
}
