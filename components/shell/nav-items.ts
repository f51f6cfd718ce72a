import type { ReactElement } from 'react';

import { BenchIcon, PersonIcon, type IconProps } from '@/components/ui/icons';

export interface NavItem {
  label: string;
  href: '/' | '/account';
  icon: (props: IconProps) => ReactElement;
  /** True when the current path belongs to this item. */
  matches: (pathname: string) => boolean;
}

/** The signed-in area's main destinations, in order. */
export const navItems: NavItem[] = [
  {
    label: 'Bench',
    href: '/',
    icon: BenchIcon,
    matches: (pathname) => pathname === '/' || pathname.startsWith('/bows'),
  },
  {
    label: 'Account',
    href: '/account',
    icon: PersonIcon,
    matches: (pathname) => pathname.startsWith('/account'),
  },
];
