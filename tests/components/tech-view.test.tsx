/**
 * A technician's view of a bow an archer shared with them: the screens offer
 * what the server allows (add sight-ins, marks and tapes) and hide what it
 * refuses (editing or deleting the archer's records, adding builds); the
 * archer still sees every action. The rule itself is server/services/bow-access.ts's.
 */
import { fireEvent, screen, waitFor, within } from '@testing-library/react';

import { BowScreen } from '@/components/bows/bow-screen';
import { EditBowScreen } from '@/components/bows/edit-bow-screen';
import { BuildScreen } from '@/components/builds/build-screen';
import { SightInScreen } from '@/components/sight-ins/sight-in-screen';
import { TapeScreen } from '@/components/tapes/tape-screen';
import { fitSight } from '@/math/fit/fit-sight';
import type { User } from '@/shared/auth';
import type { BowDetail } from '@/shared/bow-detail';
import { storedFitSchema, type SightIn } from '@/shared/sight-in';
import { storedFitOf } from '@/shared/sight-in-fit';

import { inventedBow, inventedBuild } from './fixtures';
import { jsonResponse, mockFetch, renderWithClient } from './helpers';

jest.mock('expo-router', () => ({
  Link: ({ children }: { children: unknown }) => children,
  useRouter: () => ({ replace: jest.fn(), push: jest.fn(), back: jest.fn() }),
  useIsFocused: () => false,
  Stack: { Screen: () => null },
}));
jest.mock('expo-router/head', () => ({ __esModule: true, default: () => null }));

const stamp = '2026-11-20T09:00:00.000Z';
// Invented people.
const archer: User = { id: 1, name: 'Ilse Marrow', email: 'ilse@example.test', role: 'archer', distanceUnit: 'yd', lengthUnit: 'mm' };
const tech: User = { id: 2, name: 'Bram Oakes', email: 'bram@example.test', role: 'tech', distanceUnit: 'yd', lengthUnit: 'mm' };

const build = inventedBuild({ sightInCount: 1 });

/** Two saved marks, as the archer entered them (a reading the table shows rounded to 0.01 mm). */
const savedMarks = [
  { id: 31, position: 0, distance: 20, unit: 'yd' as const, scaleMm: 14.904, arrowsShot: 3, note: 'calm' },
  { id: 32, position: 1, distance: 60, unit: 'yd' as const, scaleMm: 32.6, arrowsShot: null, note: '' },
];

/** The fit the server would store with those marks: the math core's own, on a downward scale (readings unchanged). */
const fit = fitSight({
  distanceUnit: 'yd',
  sight: { radiusMm: 820, peepHeightMm: 110 },
  arrow: { massGr: 413.75, diameterMm: 6.5 },
  air: {},
  marks: savedMarks.map((mark) => ({ distance: mark.distance, markMm: mark.scaleMm })),
});
const storedFit = storedFitSchema.parse(JSON.parse(JSON.stringify(storedFitOf(fit, 'down'))));

const sightIn: SightIn = {
  id: 12,
  bowId: 3,
  buildId: 4,
  date: '2026-11-02',
  placeLabel: 'Fenwick range',
  altitudeM: null,
  temperatureC: null,
  notes: 'Light wind',
  marks: savedMarks,
  fit: storedFit,
  createdAt: stamp,
  updatedAt: stamp,
};

const tape = {
  id: 7,
  sightInId: 12,
  bowId: 3,
  fromDistance: 20,
  toDistance: 60,
  step: 5,
  unit: 'yd' as const,
  orientation: 'down' as const,
  widthMm: 8,
  mirror: false,
  paper: 'a4' as const,
  label: 'Ilse’s elk tape',
  createdAt: stamp,
  updatedAt: stamp,
};

/** Ilse's bow, with one build, one sight-in and one saved tape. */
const bow: BowDetail = inventedBow({
  userId: archer.id,
  ownerName: archer.name,
  readiness: { latestSightIn: null, buildCount: 1, sightInCount: 1, hasTape: true, level: null },
  builds: [build],
  sightIns: [
    {
      id: 12,
      bowId: 3,
      buildId: 4,
      date: '2026-11-02',
      placeLabel: 'Fenwick range',
      altitudeM: null,
      temperatureC: null,
      notes: 'Light wind',
      summary: { speedFps: fit.speedFps, rmsMm: 0, markCount: 2, longestDistance: 60, longestUnit: 'yd', warningCount: 0 },
      createdAt: stamp,
      updatedAt: stamp,
    },
  ],
  tapes: [tape],
});

/** The API as the signed-in `user` sees it; writes answer as the server would, and are recorded. */
function serveAs(user: User) {
  const fetchMock = mockFetch();
  fetchMock.mockImplementation(async (path: string, init?: { method?: string; body?: string }) => {
    const method = init?.method ?? 'GET';
    if (path === '/api/me') return jsonResponse(200, { user });
    if (method === 'GET' && path === '/api/bows/3') return jsonResponse(200, { bow });
    if (method === 'GET' && path === '/api/builds/4') return jsonResponse(200, { build });
    if (method === 'GET' && path === '/api/sight-ins/12') return jsonResponse(200, { sightIn });
    if (method === 'PATCH' && path === '/api/sight-ins/12') {
      const body = JSON.parse(init?.body ?? '{}');
      const marks = body.marks.map((mark: object, position: number) => ({ id: 40 + position, position, ...mark }));
      return jsonResponse(200, { sightIn: { ...sightIn, marks } });
    }
    if (method === 'POST' && path === '/api/sight-ins/12/tapes') {
      return jsonResponse(201, { tape: { ...tape, ...JSON.parse(init?.body ?? '{}'), id: 8 } });
    }
    return jsonResponse(404, { error: { code: 'not_found', message: `No answer for ${method} ${path} in this test` } });
  });
  return fetchMock;
}

/** The requests other than GETs, as [method, path, parsed body]. */
function writes(fetchMock: jest.Mock) {
  return fetchMock.mock.calls
    .filter(([, init]) => init?.method && init.method !== 'GET')
    .map(([path, init]) => [init.method, path, JSON.parse(init.body ?? 'null')]);
}

const disabled = (testID: string) =>
  (screen.getByTestId(testID) as HTMLInputElement).readOnly || (screen.getByTestId(testID) as HTMLInputElement).disabled;

describe('a technician on a shared bow', () => {
  it('sees whose bow it is and no Edit or Delete; can add a build and start a sight-in', async () => {
    serveAs(tech);
    renderWithClient(<BowScreen bowId={3} />);
    const banner = await screen.findByTestId('shared-with-you');
    expect(within(banner).getByText('Shared with you by Ilse Marrow.')).toBeTruthy();
    expect(
      within(banner).getByText(
        'You can add sight-ins, marks, level checks and notes; only Ilse Marrow can change or delete their records.',
      ),
    ).toBeTruthy();
    expect(screen.getByTestId('bow-setup')).toBeTruthy();
    expect(screen.queryByTestId('bow-edit')).toBeNull();
    expect(screen.queryByTestId('bow-delete')).toBeNull();
    expect(screen.queryByText('Delete this bow')).toBeNull();
    // Adding a build is a technician's right since issue 15 (a new, attributed entry).
    expect(screen.getByTestId('add-build')).toBeTruthy();
    expect(screen.queryByTestId('open-sharing')).toBeNull();
    expect(screen.getByTestId('start-sight-in')).toBeTruthy();
    expect(screen.getByTestId('open-level')).toBeTruthy();
  });

  it('is told the bow’s set-up is the archer’s to change when opening its edit address', async () => {
    serveAs(tech);
    renderWithClient(<EditBowScreen bowId={3} />);
    const notice = await screen.findByTestId('owner-only');
    expect(within(notice).getByText(/Only Ilse Marrow can change this bow’s set-up/)).toBeTruthy();
    expect(screen.queryByTestId('bow-save')).toBeNull();
    expect(screen.queryByLabelText('Nickname')).toBeNull();
  });

  it('reads an arrow build without Save or Delete', async () => {
    serveAs(tech);
    renderWithClient(<BuildScreen buildId={4} />);
    await screen.findByText('Arrow build of Ilse Marrow: only they can change it.');
    expect((screen.getByLabelText('Build name') as HTMLInputElement).value).toBe('Ash heavy 414');
    expect((screen.getByLabelText('Build name') as HTMLInputElement).readOnly).toBe(true);
    expect(screen.queryByTestId('build-save')).toBeNull();
    expect(screen.queryByTestId('build-delete')).toBeNull();
  });

  it('adds a mark to the archer’s sight-in without touching what is saved, and cannot delete it', async () => {
    const fetchMock = serveAs(tech);
    renderWithClient(<SightInScreen sightInId={12} />);
    await screen.findByTestId('marks-add-only');
    expect(screen.queryByTestId('sight-in-delete')).toBeNull();
    expect(screen.queryByText('Delete this sight-in')).toBeNull();
    // The saved rows and the sight-in's details are shown but cannot change.
    for (const index of [0, 1]) {
      expect(disabled(`mark-distance-${index}`)).toBe(true);
      expect(disabled(`mark-reading-${index}`)).toBe(true);
      expect(screen.queryByTestId(`mark-remove-${index}`)).toBeNull();
    }
    expect(disabled('sight-in-date')).toBe(true);
    expect((screen.getByLabelText('Sight-in notes') as HTMLInputElement).readOnly).toBe(true);

    fireEvent.click(screen.getByTestId('mark-add'));
    expect(disabled('mark-distance-2')).toBe(false);
    expect(screen.getByTestId('mark-remove-2')).toBeTruthy();
    fireEvent.change(screen.getByTestId('mark-distance-2'), { target: { value: '40' } });
    fireEvent.change(screen.getByTestId('mark-reading-2'), { target: { value: '23.1' } });
    fireEvent.click(screen.getByTestId('sight-in-save'));

    await waitFor(() => expect(writes(fetchMock)).toHaveLength(1));
    // Only the marks: the saved ones exactly as stored (not as the table rounds them), then the new one.
    expect(writes(fetchMock)[0]).toEqual([
      'PATCH',
      '/api/sight-ins/12',
      {
        marks: [
          { distance: 20, unit: 'yd', scaleMm: 14.904, arrowsShot: 3, note: 'calm' },
          { distance: 60, unit: 'yd', scaleMm: 32.6, arrowsShot: null, note: '' },
          { distance: 40, unit: 'yd', scaleMm: 23.1, arrowsShot: null, note: '' },
        ],
      },
    ]);
    // Once saved, the added mark is the archer's record too.
    await waitFor(() => expect(disabled('mark-distance-2')).toBe(true));
  });

  it('saves a layout of the archer’s tape as a new one, never over theirs', async () => {
    const fetchMock = serveAs(tech);
    renderWithClient(<TapeScreen sightInId={12} tapeId={7} />);
    await screen.findByTestId('tape-drawn');
    fireEvent.change(screen.getByTestId('tape-to'), { target: { value: '50' } });
    await waitFor(() => expect(screen.getByTestId('tape-save').getAttribute('aria-disabled')).not.toBe('true'));
    expect(within(screen.getByTestId('tape-save')).getByText('Save as a new layout')).toBeTruthy();
    fireEvent.click(screen.getByTestId('tape-save'));
    await waitFor(() => expect(writes(fetchMock)).toHaveLength(1));
    const [method, path, body] = writes(fetchMock)[0];
    expect([method, path]).toEqual(['POST', '/api/sight-ins/12/tapes']);
    expect(body.toDistance).toBe(50);
  });
});

describe('the archer on their own bow', () => {
  it('keeps Edit, Delete, Add a build and sharing, and sees no technician banner', async () => {
    serveAs(archer);
    renderWithClient(<BowScreen bowId={3} />);
    await screen.findByTestId('bow-edit');
    expect(screen.getByTestId('bow-delete')).toBeTruthy();
    expect(screen.getByTestId('add-build')).toBeTruthy();
    expect(screen.getByTestId('open-sharing')).toBeTruthy();
    expect(screen.queryByTestId('shared-with-you')).toBeNull();
  });

  it('can change the saved marks and delete the sight-in', async () => {
    serveAs(archer);
    renderWithClient(<SightInScreen sightInId={12} />);
    await screen.findByTestId('sight-in-delete');
    expect(screen.queryByTestId('marks-add-only')).toBeNull();
    expect(disabled('mark-reading-0')).toBe(false);
    expect(screen.getByTestId('mark-remove-0')).toBeTruthy();
  });
});
