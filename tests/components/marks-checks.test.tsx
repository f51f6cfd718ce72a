/**
 * Marks checked where they are typed (shared/mark-checks in the sight-in
 * editor): each row names its own problem live, the fit says which marks it
 * left out, the equipment warnings wait while a row has a problem, and a
 * falling reading is saved only once the archer confirms it.
 */
import { fireEvent, screen, waitFor, within } from '@testing-library/react';

import { SightInEditor } from '@/components/sight-ins/sight-in-editor';

import { inventedBow, inventedBuild } from './fixtures';
import { jsonResponse, mockFetch, renderWithClient } from './helpers';

jest.mock('expo-router', () => ({
  Link: ({ children }: { children: unknown }) => children,
  useRouter: () => ({ replace: jest.fn(), push: jest.fn(), back: jest.fn() }),
}));

const type = (testID: string, value: string) => fireEvent.change(screen.getByTestId(testID), { target: { value } });

/** Types rows [distance, reading] into the table, adding rows as needed. */
function typeRows(rows: [string, string][]) {
  rows.forEach(([distance, reading], index) => {
    if (!screen.queryByTestId(`mark-distance-${index}`)) fireEvent.click(screen.getByTestId('mark-add'));
    type(`mark-distance-${index}`, distance);
    type(`mark-reading-${index}`, reading);
  });
}

describe('marks checked as they are typed', () => {
  it('names the falling 40 yd reading on its row, leaves it out of the fit, and asks before saving it', async () => {
    const fetchMock = mockFetch();
    fetchMock.mockResolvedValue(jsonResponse(500, { error: { code: 'server_error', message: 'stop here' } }));
    renderWithClient(<SightInEditor bow={inventedBow()} distanceUnit="yd" />);
    // The typo: 20/30/40 yd at 15.0/19.0/17.0 mm.
    typeRows([
      ['20', '15.0'],
      ['30', '19.0'],
      ['40', '17.0'],
    ]);
    const problem = await within(screen.getByTestId('mark-row-2')).findByTestId('mark-problem-2');
    expect(problem.textContent).toMatch(/^Mark 3 \(40 yd\): 17 mm is less than the 30 yd mark’s 19 mm/);
    expect(within(screen.getByTestId('mark-row-1')).queryByTestId('mark-problem-1')).toBeNull();
    // The fit names what it left out and uses the two others (exact through both).
    expect((await screen.findByTestId('fit-advice-left-out')).textContent).toMatch(
      /The fit leaves out mark 3 \(reading falls with distance\)/,
    );
    await screen.findByTestId('predicted-marks');
    expect(screen.getByText('exact (2 marks)')).toBeTruthy();
    // No equipment warnings meanwhile.
    expect(screen.queryByTestId(/^fit-advice-(chronograph|drag|sight-radius|peep-height)/)).toBeNull();

    // Save asks first; nothing is sent until the archer confirms.
    fireEvent.click(screen.getByTestId('sight-in-save'));
    const confirm = await screen.findByTestId('falling-confirm');
    expect(within(confirm).getByText(/Mark 3 \(40 yd\)/)).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
    fireEvent.click(within(confirm).getByText('Save it as it is'));
    await waitFor(() => expect(fetchMock).toHaveBeenCalledTimes(1));
    const [, init] = fetchMock.mock.calls[0];
    // The falling mark is sent as typed (the archer confirmed it), with an idempotency key.
    expect(JSON.parse(init.body).marks.map((mark: { scaleMm: number }) => mark.scaleMm)).toEqual([15, 19, 17]);
    expect(init.headers['Idempotency-Key']).toMatch(/^[A-Za-z0-9-]{8,}$/);
  });

  it('names a letter in a reading, an empty distance and a negative one live, each on its own row', async () => {
    renderWithClient(<SightInEditor bow={inventedBow()} distanceUnit="yd" />);
    typeRows([
      ['20', '1g.0'],
      ['', '20'],
      ['-20', '21'],
    ]);
    expect((await screen.findByTestId('mark-problem-0')).textContent).toBe('Mark 1: “1g.0” is not a number; enter the reading in mm');
    expect(screen.getByTestId('mark-problem-1').textContent).toBe('Mark 2: enter the distance');
    expect(screen.getByTestId('mark-problem-2').textContent).toBe('Mark 3: enter a distance between 5 and 150 yd (not -20)');
    expect(screen.getByTestId('fit-advice-left-out').textContent).toMatch(
      /mark 1 \(not a number\), mark 2 \(not filled in\) and mark 3 \(out of range\)/,
    );
    // Fixing the row clears its message.
    type('mark-reading-0', '14.9');
    await waitFor(() => expect(screen.queryByTestId('mark-problem-0')).toBeNull());
  });

  it('holds back the chronograph warning while a row has a problem, and shows it once the row is fixed', async () => {
    // A build chronographed at 340 fps, marks that fit about 285 fps: the fit doubts the chronograph.
    const bow = inventedBow({ builds: [inventedBuild({ speedFps: 340 })] });
    renderWithClient(<SightInEditor bow={bow} distanceUnit="yd" />);
    typeRows([
      ['20', '14.9'],
      ['40', '23.1'],
      ['60', '32.6'],
      ['50', '2x'],
    ]);
    await screen.findByTestId('mark-problem-3');
    await screen.findByTestId('predicted-marks');
    expect(screen.queryByTestId(/^fit-advice-chronograph/)).toBeNull();
    expect(screen.getByTestId('fit-advice-left-out').textContent).toMatch(
      /Checks of the chronograph, drag and sight radius wait until the marks are fixed/,
    );
    fireEvent.click(screen.getByTestId('mark-remove-3'));
    expect(await screen.findByTestId(/^fit-advice-chronograph/)).toBeTruthy();
    expect(screen.queryByTestId('fit-advice-left-out')).toBeNull();
  });
});
