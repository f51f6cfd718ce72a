import { act, fireEvent, screen, waitFor } from '@testing-library/react';

import { authKeys } from '@/components/auth/api';
import { SignInForm } from '@/components/auth/sign-in-form';

import { jsonResponse, mockFetch, renderWithClient } from './helpers';

const user = { id: 4, name: 'Orla Penhallow', email: 'orla@example.org', role: 'archer', distanceUnit: 'yd', lengthUnit: 'mm' };

function fill(label: string, value: string) {
  fireEvent.change(screen.getByLabelText(label), { target: { value } });
}

function submit() {
  fireEvent.click(screen.getByRole('button', { name: /sign in/i }));
}

describe('SignInForm', () => {
  it('shows the schema messages under the fields and sends nothing when both are empty', async () => {
    const fetchMock = mockFetch();
    renderWithClient(<SignInForm />);
    submit();
    expect(await screen.findByText('Enter your e-mail address')).toBeTruthy();
    expect(screen.getByText('Enter your password')).toBeTruthy();
    expect(screen.getByLabelText('E-mail').getAttribute('aria-invalid')).toBe('true');
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('rejects a malformed e-mail address', async () => {
    const fetchMock = mockFetch();
    renderWithClient(<SignInForm />);
    fill('E-mail', 'not-an-address');
    fill('Password', 'whatever it is');
    submit();
    expect(await screen.findByText('Enter a valid e-mail address')).toBeTruthy();
    expect(screen.queryByText('Enter your password')).toBeNull();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('posts trimmed, lower-cased credentials with the CSRF header, shows the pending label, and stores the user', async () => {
    const fetchMock = mockFetch();
    let answer: (value: unknown) => void = () => {};
    fetchMock.mockReturnValue(new Promise((resolve) => (answer = resolve)));
    const onSignedIn = jest.fn();
    const { queryClient } = renderWithClient(<SignInForm onSignedIn={onSignedIn} />);

    fill('E-mail', '  Orla@Example.ORG ');
    fill('Password', 'a long enough password');
    submit();

    await waitFor(() => expect(fetchMock).toHaveBeenCalledTimes(1));
    const [path, init] = fetchMock.mock.calls[0];
    expect(path).toBe('/api/auth/sign-in');
    expect(init.method).toBe('POST');
    expect(init.credentials).toBe('same-origin');
    expect(init.headers['X-Pinwright-Csrf']).toBe('1');
    expect(init.headers['Content-Type']).toBe('application/json');
    expect(JSON.parse(init.body)).toEqual({ email: 'orla@example.org', password: 'a long enough password' });

    const pendingButton = await screen.findByRole('button', { name: /signing in…/i });
    expect(pendingButton.getAttribute('aria-disabled')).toBe('true');

    await act(async () => answer(jsonResponse(200, { user })));
    await waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(user));
    expect(queryClient.getQueryData(authKeys.me)).toEqual(user);
    expect(screen.getByRole('button', { name: 'Sign in' })).toBeTruthy();
  });

  it('shows a wrong-password answer in the error banner', async () => {
    const fetchMock = mockFetch();
    fetchMock.mockResolvedValue(jsonResponse(401, { error: { code: 'unauthorized', message: 'E-mail or password is wrong.' } }));
    renderWithClient(<SignInForm />);
    fill('E-mail', 'orla@example.org');
    fill('Password', 'not the password');
    submit();
    const banner = await screen.findByTestId('sign-in-error');
    expect(banner.textContent).toContain('E-mail or password is wrong.');
    expect(banner.getAttribute('role')).toBe('alert');
  });

  it('puts server field messages under their field instead of the banner', async () => {
    const fetchMock = mockFetch();
    fetchMock.mockResolvedValue(
      jsonResponse(400, {
        error: { code: 'validation_failed', message: 'Check the form', fields: { email: 'That address cannot receive mail' } },
      }),
    );
    renderWithClient(<SignInForm />);
    fill('E-mail', 'orla@example.org');
    fill('Password', 'a long enough password');
    submit();
    expect(await screen.findByText('That address cannot receive mail')).toBeTruthy();
    expect(screen.queryByTestId('sign-in-error')).toBeNull();
  });
});
