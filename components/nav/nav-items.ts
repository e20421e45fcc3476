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

/** One line per screen. Catalogue, Jobs and Quotes join here once their screens exist. */
export const NAV_ITEMS: readonly NavItem[] = [
  { label: 'Home', href: '/', segment: '' },
  { label: 'Users', href: '/users', segment: 'users', roles: ['admin'] },
];

export function navItemsFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => !item.roles || item.roles.includes(role));
}

export function isActive(item: NavItem, pathname: string): boolean {
  const first = pathname.split('/').filter(Boolean)[0] ?? '';
  return first === item.segment;
}
