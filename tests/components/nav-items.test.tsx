import { navItems, navItemsFor } from '@/components/shell/nav-items';

describe('navigation items', () => {
  it('gives every role the Bench and Account, in that order', () => {
    for (const role of ['archer', 'tech', 'admin'] as const) {
      expect(navItemsFor(role).map((item) => item.label).slice(0, 2)).toEqual(['Bench', 'Account']);
    }
  });

  it('marks the Bench active on the home page and on bow pages, Account only on its own', () => {
    const bench = navItems.find((item) => item.label === 'Bench')!;
    const account = navItems.find((item) => item.label === 'Account')!;
    expect(bench.matches('/')).toBe(true);
    expect(bench.matches('/bows/12')).toBe(true);
    expect(bench.matches('/account')).toBe(false);
    expect(account.matches('/account')).toBe(true);
    expect(account.matches('/')).toBe(false);
  });
});
