import { navItems, navItemsFor } from '@/components/shell/nav-items';

describe('navigation items', () => {
  it('gives every role the Bench first and Account last, and each role its own work between', () => {
    const labels = (role: 'archer' | 'tech' | 'admin') => navItemsFor(role).map((item) => item.label);
    expect(labels('archer')).toEqual(['Bench', 'Account']);
    expect(labels('tech')).toEqual(['Bench', 'Clients', 'Account']);
    expect(labels('admin')).toEqual(['Bench', 'Admin', 'Account']);
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
