import { formatDrawLength } from '@/components/forms/form-numbers';

// 1 in = 25.4 mm exactly (international yard and pound, 1959).
describe('formatDrawLength', () => {
  it('states the draw length in inches, with mm beside it for a mm user', () => {
    expect(formatDrawLength(723.9, 'mm')).toBe('28.50 in (724 mm)');
    expect(formatDrawLength(723.9, 'in')).toBe('28.50 in');
    expect(formatDrawLength(null, 'mm')).toBe('—');
  });
});
