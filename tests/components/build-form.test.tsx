import { fireEvent, screen, waitFor } from '@testing-library/react';

import { BuildForm } from '@/components/builds/build-form';

import { jsonResponse, mockFetch, renderWithClient } from './helpers';

// Links inside the UI kit need the router; the form itself never navigates.
jest.mock('expo-router', () => ({
  Link: ({ children }: { children: unknown }) => children,
  useRouter: () => ({ replace: jest.fn(), push: jest.fn(), back: jest.fn() }),
}));

function fill(label: string, value: string) {
  fireEvent.change(screen.getByLabelText(label), { target: { value } });
}
const figure = (testID: string) => Number((screen.getByTestId(testID).textContent ?? '').replace(/[^\d.-]/g, ''));

describe('BuildForm', () => {
  it('shows total grains, FOC, energy and momentum as the parts are typed', () => {
    renderWithClient(<BuildForm bowId={3} lengthUnit="in" onSaved={jest.fn()} onCancel={jest.fn()} />);
    // Nothing typed yet: no total.
    expect(screen.getByTestId('total-grains').textContent).toBe('—');

    fill('Grains per inch', '9.5');
    fill('Cut length', '28.5');
    // Shaft alone: 9.5 gpi × 28.5 in = 270.75 gr (arithmetic).
    expect(Math.abs(figure('total-grains') - 270.75)).toBeLessThan(0.051);

    fill('Point', '100');
    fill('Insert', '16');
    fill('Nock', '9');
    fill('Each vane', '6');
    // + 100 + 16 + 9 + 3 vanes × 6 gr = 413.75 gr (arithmetic; three vanes is the form's default).
    expect(Math.abs(figure('total-grains') - 413.75)).toBeLessThan(0.051);
    expect(screen.getByTestId('foc').textContent).toBe('—');
    expect(screen.getByTestId('kinetic-energy').textContent).toBe('—');

    fill('Balance point', '16.5');
    // FOC = 100 × (16.5 − 28.5/2) / 28.5 = 7.89 % (common practice formula, no published source).
    expect(Math.abs(figure('foc') - 7.89)).toBeLessThan(0.051);

    fill('Chronographed speed', '285');
    // ½ m v²: 413.75 gr = 0.026811 kg, 285 fps = 86.868 m/s → 101.16 J (1 gr = 64.79891 mg,
    // 1 ft = 0.3048 m exactly, international yard and pound, 1959).
    const joules = 0.5 * 413.75 * 64.79891e-6 * (285 * 0.3048) ** 2;
    expect(Math.abs(figure('kinetic-energy') - joules)).toBeLessThan(0.051);
    // The trade's shortcut gr × fps² / 450,240 (common practice, no published source) gives 74.6 ft·lbf.
    expect(screen.getByText(`${((413.75 * 285 ** 2) / 450240).toFixed(1)} ft·lbf`)).toBeTruthy();
    // p = m v = 0.026811 kg × 86.868 m/s = 2.329 kg·m/s.
    expect(Math.abs(figure('momentum') - 413.75 * 64.79891e-6 * 285 * 0.3048)).toBeLessThan(0.0006);
    expect(screen.getByText(/Energy figures are estimates, not a legal determination/)).toBeTruthy();
  });

  it('names bad input in plain words and sends nothing', async () => {
    const fetchMock = mockFetch();
    renderWithClient(<BuildForm bowId={3} lengthUnit="mm" onSaved={jest.fn()} onCancel={jest.fn()} />);
    fill('Grains per inch', 'nine');
    fill('Cut length', '120');
    fill('Balance point', '500');
    fireEvent.click(screen.getByTestId('build-save'));
    expect(await screen.findByText('Enter the build name')).toBeTruthy();
    expect(screen.getByText('Grains per inch must be a number')).toBeTruthy();
    expect(screen.getByText('Cut length must be at least 300 mm')).toBeTruthy();
    expect(screen.getByText('Some fields need another look; nothing was saved.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('saves lengths typed in inches as millimetres, in one request', async () => {
    const fetchMock = mockFetch();
    const onSaved = jest.fn();
    const saved = {
      id: 7,
      bowId: 3,
      name: 'Cedar light',
      shaftLabel: '',
      spine: null,
      grainsPerInch: 9.5,
      cutLengthMm: 723.9,
      diameterMm: 6.35,
      pointGr: 100,
      insertGr: 0,
      collarGr: 0,
      nockGr: 0,
      vaneCount: 3,
      vaneWeightGr: 0,
      wrapGr: 0,
      balancePointMm: null,
      speedFps: null,
      dragCoefficient: null,
      sightInCount: 0,
      createdAt: '2026-12-01T10:00:00.000Z',
      updatedAt: '2026-12-01T10:00:00.000Z',
      derived: {
        totalGr: 370.75,
        focPct: null,
        kineticEnergyFtLb: null,
        kineticEnergyJ: null,
        momentumSlugFtPerS: null,
        momentumKgMPerS: null,
      },
    };
    fetchMock.mockResolvedValue(jsonResponse(201, { build: saved }));
    renderWithClient(<BuildForm bowId={3} lengthUnit="in" onSaved={onSaved} onCancel={jest.fn()} />);
    fill('Build name', 'Cedar light');
    fill('Grains per inch', '9.5');
    fill('Cut length', '28.5');
    fill('Diameter', '0.25');
    fill('Point', '100');
    fireEvent.click(screen.getByTestId('build-save'));
    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    expect(fetchMock).toHaveBeenCalledTimes(1);
    const [path, init] = fetchMock.mock.calls[0];
    expect(path).toBe('/api/bows/3/builds');
    const body = JSON.parse(init.body);
    // 28.5 in × 25.4 = 723.9 mm; 0.25 in = 6.35 mm (1 in = 25.4 mm exactly, 1959).
    expect(Math.abs(body.cutLengthMm - 723.9)).toBeLessThan(1e-9);
    expect(Math.abs(body.diameterMm - 6.35)).toBeLessThan(1e-9);
    expect(body.balancePointMm).toBeNull();
    expect(body.insertGr).toBe(0);
  });
});
