import { fireEvent, screen, waitFor, within } from '@testing-library/react';

import { SightInEditor } from '@/components/sight-ins/sight-in-editor';

import { inventedBow } from './fixtures';
import { jsonResponse, mockFetch, renderWithClient } from './helpers';

jest.mock('expo-router', () => ({
  Link: ({ children }: { children: unknown }) => children,
  useRouter: () => ({ replace: jest.fn(), push: jest.fn(), back: jest.fn() }),
}));

/** An invented bow: R 820 mm, h 110 mm, one 414 gr build on a 6.5 mm shaft. */
const bow = inventedBow();

const type = (testID: string, value: string) => fireEvent.change(screen.getByTestId(testID), { target: { value } });

describe('the marks table and its live fit', () => {
  it('refits as marks are typed: predicted marks for 10–100 yd, each mark on the fit', async () => {
    renderWithClient(<SightInEditor bow={bow} distanceUnit="yd" />);
    expect(screen.getByText('Enter two marks (a short and a long distance) to see the fit.')).toBeTruthy();
    type('mark-distance-0', '20');
    type('mark-reading-0', '14.9');
    expect(await screen.findByText(/^Enter one more mark, at another distance, to see the fit/)).toBeTruthy();
    type('mark-distance-1', '60');
    type('mark-reading-1', '32.6');
    await screen.findByTestId('predicted-marks');
    for (let distance = 10; distance <= 100; distance += 5) expect(screen.getByTestId(`predicted-${distance}`)).toBeTruthy();
    // Two marks, no chronograph: the fit passes through both exactly (a two-mark solve).
    expect(within(screen.getByTestId('predicted-20')).getByText('14.90')).toBeTruthy();
    expect(within(screen.getByTestId('predicted-60')).getByText('32.60')).toBeTruthy();
    expect(screen.getByTestId('mark-residual-0').textContent).toBe('on the fit');
    // Between the marks the predicted mark lies between their readings, growing with distance.
    const reading = (distance: number) => Number(within(screen.getByTestId(`predicted-${distance}`)).getByText(/^\d+\.\d\d$/).textContent);
    expect(reading(40)).toBeGreaterThan(14.9);
    expect(reading(40)).toBeLessThan(32.6);
    expect(reading(80)).toBeGreaterThan(32.6);
    expect(screen.getByText('exact (2 marks)')).toBeTruthy();

    // A third, nearer mark refits: three marks now, scattered slightly.
    fireEvent.click(screen.getByTestId('mark-add'));
    type('mark-distance-2', '40');
    type('mark-reading-2', '23.1');
    await waitFor(() => expect(screen.getByTestId('mark-residual-2').textContent).toMatch(/mm off the fit$/));
  });

  it('names an impossible gap in plain words', async () => {
    renderWithClient(<SightInEditor bow={bow} distanceUnit="yd" />);
    type('mark-distance-0', '20');
    type('mark-reading-0', '14.9');
    type('mark-distance-1', '60');
    // 0.2 mm between 20 and 60 yd needs an arrow faster than the 500 fps the fit allows: with the
    // small-angle, drag-free aim tan γ ≈ h/S + g·S/(2v²) (projectile motion, any mechanics textbook)
    // the gap at 500 fps is R·(g·(D2 − D1)/(2v²) − h·(1/D1 − 1/D2)) ≈ 820 × (0.00772 − 0.00401) ≈ 3.0 mm.
    type('mark-reading-1', '15.1');
    const warning = await screen.findByTestId('fit-advice-refused');
    expect(within(warning).getByText('These marks cannot be fitted')).toBeTruthy();
    expect(within(warning).getByText(/no arrow speed gives so small a gap/)).toBeTruthy();
    expect(screen.queryByTestId('predicted-marks')).toBeNull();

    // Fixing the reading brings the fit back.
    type('mark-reading-1', '32.6');
    await screen.findByTestId('predicted-marks');
    expect(screen.queryByTestId('fit-advice-refused')).toBeNull();
  });

  it('saves all marks in one request, skips blank rows and puts a server message on its row', async () => {
    const fetchMock = mockFetch();
    fetchMock.mockResolvedValue(
      jsonResponse(400, {
        error: {
          code: 'validation_failed',
          message: 'Scale reading must be at most 200 mm',
          fields: { 'marks.1.scaleMm': 'Scale reading must be at most 200 mm' },
        },
      }),
    );
    renderWithClient(<SightInEditor bow={bow} distanceUnit="yd" />);
    type('mark-distance-0', '20');
    type('mark-reading-0', '14.9');
    fireEvent.click(screen.getByTestId('mark-add'));
    type('mark-distance-2', '60');
    type('mark-reading-2', '32.6');
    fireEvent.click(screen.getByTestId('sight-in-save'));
    await waitFor(() => expect(fetchMock).toHaveBeenCalledTimes(1));
    const [path, init] = fetchMock.mock.calls[0];
    expect(path).toBe('/api/bows/3/sight-ins');
    const body = JSON.parse(init.body);
    expect(body.buildId).toBe(4);
    expect(body.marks).toEqual([
      { distance: 20, unit: 'yd', scaleMm: 14.9, arrowsShot: null, note: '' },
      { distance: 60, unit: 'yd', scaleMm: 32.6, arrowsShot: null, note: '' },
    ]);
    // The server's second mark is the table's third row (the blank row was not sent).
    expect(await within(screen.getByTestId('mark-row-2')).findByText('Scale reading must be at most 200 mm')).toBeTruthy();
    expect(within(screen.getByTestId('mark-row-0')).queryByText('Scale reading must be at most 200 mm')).toBeNull();
  });

  it('refuses a distance entered twice before sending anything', async () => {
    const fetchMock = mockFetch();
    renderWithClient(<SightInEditor bow={bow} distanceUnit="yd" />);
    type('mark-distance-0', '20');
    type('mark-reading-0', '14.9');
    type('mark-distance-1', '20');
    type('mark-reading-1', '15.0');
    fireEvent.click(screen.getByTestId('sight-in-save'));
    expect(
      await within(screen.getByTestId('mark-row-1')).findByText('20 yd is entered twice; each distance once per sight-in'),
    ).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });
});
