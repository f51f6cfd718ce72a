import type { Href } from 'expo-router';
import type { ReactElement } from 'react';

import { AdminIcon } from '@/components/admin/admin-icon';
import { ClientsIcon } from '@/components/clients/clients-icon';
import { BenchIcon, PersonIcon, type IconProps } from '@/components/ui/icons';
import type { Role } from '@/shared/auth';

export interface NavItem {
  label: string;
  href: Href;
  icon: (props: IconProps) => ReactElement;
  /** True when the current path belongs to this item. */
  matches: (pathname: string) => boolean;
  /** Roles that see this item; all roles when omitted. */
  roles?: Role[];
}

/**
 * The signed-in area's main destinations, in order (the rail and the bottom bar
 * both read this list). Add a destination here, e.g. a technician's clients with
 * `roles: ['tech']`; keep it to a handful so the phone bar stays readable.
 */
export const navItems: NavItem[] = [
  {
    label: 'Bench',
    href: '/',
    icon: BenchIcon,
    matches: (pathname) => pathname === '/' || pathname.startsWith('/bows'),
  },
  {
    label: 'Clients',
    href: '/clients',
    icon: ClientsIcon,
    matches: (pathname) => pathname.startsWith('/clients'),
    roles: ['tech'],
  },
  {
    label: 'Admin',
    href: '/admin',
    icon: AdminIcon,
    matches: (pathname) => pathname.startsWith('/admin'),
    roles: ['admin'],
  },
  {
    label: 'Account',
    href: '/account',
    icon: PersonIcon,
    matches: (pathname) => pathname.startsWith('/account'),
  },
];

/** The items a user with `role` sees. */
export function navItemsFor(role: Role): NavItem[] {
  return navItems.filter((item) => !item.roles || item.roles.includes(role));
}
