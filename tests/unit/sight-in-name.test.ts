import { sightInName } from '@/shared/sight-in-name';

const builds = [
  { id: 1, name: 'Elk 415' },
  { id: 2, name: 'Practice light' },
];
const morning = { id: 10, date: '2026-12-02', placeLabel: 'Larch Hollow range', buildId: 1, createdAt: '2026-12-02T09:15:00.000Z' };
const evening = { id: 11, date: '2026-12-02', placeLabel: 'Larch Hollow range', buildId: 1, createdAt: '2026-12-02T16:40:00.000Z' };
const older = { id: 9, date: '2026-11-20', placeLabel: '', buildId: 2, createdAt: '2026-11-20T10:00:00.000Z' };

describe('sightInName', () => {
  it('names a lone sight-in by day, place and build, without a time', () => {
    expect(sightInName(older, { builds, siblings: [older, morning], timeZone: 'UTC' })).toBe('20 Nov 2026 · Practice light');
    expect(sightInName(morning, { builds, siblings: [morning, older], timeZone: 'UTC' })).toBe('2 Dec 2026 · Larch Hollow range · Elk 415');
  });

  it('tells two of one day apart by the time they were recorded', () => {
    const siblings = [morning, evening, older];
    const first = sightInName(morning, { builds, siblings, timeZone: 'UTC' });
    const second = sightInName(evening, { builds, siblings, timeZone: 'UTC' });
    expect(first).toBe('2 Dec 2026, 09:15 UTC · Larch Hollow range · Elk 415');
    expect(second).toBe('2 Dec 2026, 16:40 UTC · Larch Hollow range · Elk 415');
    expect(first).not.toBe(second);
  });

  it('numbers two of the same day, place, build and minute', () => {
    const twin = { ...morning, id: 12, createdAt: '2026-12-02T09:15:30.000Z' };
    const siblings = [morning, twin];
    const names = siblings.map((sightIn) => sightInName(sightIn, { builds, siblings, timeZone: 'UTC' }));
    expect(names[0]).toMatch(/\(1 of 2\)$/);
    expect(names[1]).toMatch(/\(2 of 2\)$/);
  });

  it('takes the build name given, or leaves it out', () => {
    expect(sightInName(older, { buildName: 'Heavy test' })).toBe('20 Nov 2026 · Heavy test');
    expect(sightInName(morning, { builds, withoutBuild: true })).toBe('2 Dec 2026 · Larch Hollow range');
  });
});
