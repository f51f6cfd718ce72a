import { fireEvent, screen, waitFor } from '@testing-library/react';

import { authKeys } from '@/components/auth/api';
import { SignUpForm } from '@/components/auth/sign-up-form';

import { jsonResponse, mockFetch, renderWithClient } from './helpers';

function fill(label: string, value: string) {
  fireEvent.change(screen.getByLabelText(label), { target: { value } });
}
const submit = () => fireEvent.click(screen.getByRole('button', { name: /create account/i }));

describe('SignUpForm', () => {
  it('names every problem in plain words and sends nothing', async () => {
    const fetchMock = mockFetch();
    renderWithClient(<SignUpForm />);
    fill('E-mail', 'ada.example.org');
    fill('Password', 'short');
    submit();
    expect(await screen.findByText('Enter your name')).toBeTruthy();
    expect(screen.getByText('Enter a valid e-mail address')).toBeTruthy();
    expect(screen.getByText('Password must be at least 10 characters')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('creates the account and stores the signed-in user', async () => {
    const fetchMock = mockFetch();
    const user = { id: 9, name: 'Ada Corrie', email: 'ada@example.org', role: 'archer', distanceUnit: 'yd', lengthUnit: 'mm' };
    fetchMock.mockResolvedValue(jsonResponse(201, { user }));
    const { queryClient } = renderWithClient(<SignUpForm />);
    fill('Name', ' Ada Corrie ');
    fill('E-mail', 'Ada@Example.org');
    fill('Password', 'ten or more letters');
    submit();
    await waitFor(() => expect(queryClient.getQueryData(authKeys.me)).toEqual(user));
    const [path, init] = fetchMock.mock.calls[0];
    expect(path).toBe('/api/auth/sign-up');
    // The first unit choice goes with it (yards unless changed); the server sets the rest from it.
    expect(JSON.parse(init.body)).toEqual({
      name: 'Ada Corrie',
      email: 'ada@example.org',
      password: 'ten or more letters',
      distanceUnit: 'yd',
    });
  });

  it('sends metres when the archer picks them', async () => {
    const fetchMock = mockFetch();
    fetchMock.mockResolvedValue(
      jsonResponse(201, {
        user: { id: 9, name: 'Ada Corrie', email: 'ada@example.org', role: 'archer', distanceUnit: 'm', lengthUnit: 'mm' },
      }),
    );
    renderWithClient(<SignUpForm />);
    fill('Name', 'Ada Corrie');
    fill('E-mail', 'ada@example.org');
    fill('Password', 'ten or more letters');
    fireEvent.click(screen.getByRole('radio', { name: 'Metres' }));
    submit();
    await waitFor(() => expect(fetchMock).toHaveBeenCalled());
    expect(JSON.parse(fetchMock.mock.calls[0][1].body).distanceUnit).toBe('m');
  });

  it('shows a taken e-mail (409) under the e-mail field', async () => {
    const fetchMock = mockFetch();
    fetchMock.mockResolvedValue(jsonResponse(409, { error: { code: 'conflict', message: 'That e-mail already has an account' } }));
    renderWithClient(<SignUpForm />);
    fill('Name', 'Ada Corrie');
    fill('E-mail', 'ada@example.org');
    fill('Password', 'ten or more letters');
    submit();
    const message = await screen.findByText('That e-mail already has an account');
    const input = screen.getByLabelText('E-mail');
    expect(input.getAttribute('aria-describedby')).toContain(message.getAttribute('id'));
    expect(screen.queryByTestId('sign-up-error')).toBeNull();
  });
});
