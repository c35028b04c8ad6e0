import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createAppQueryClient } from '@/app/create-app-query-client';
import { AppProvider } from '@/app/provider';
import { apiError, mockApi } from '@/testing/mock-api';
import { technician } from '@/testing/fixtures';
import { sessionKeys } from '@/api/session';
import { SignInForm } from './sign-in-form';

function renderForm() {
  const queryClient = createAppQueryClient();
  const user = userEvent.setup();
  render(
    <AppProvider queryClient={queryClient}>
      <SignInForm />
    </AppProvider>,
  );
  return { user, queryClient };
}

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('SignInForm', () => {
  it('labels both fields and sets the autocomplete hints a password manager needs', () => {
    mockApi({});
    renderForm();
    expect(screen.getByLabelText('E-mail')).toHaveAttribute('autocomplete', 'username');
    expect(screen.getByLabelText('Password')).toHaveAttribute('autocomplete', 'current-password');
    expect(screen.getByLabelText('Password')).toHaveAttribute('type', 'password');
  });

  it('shows a message beside each empty field and does not call the server', async () => {
    const api = mockApi({});
    const { user } = renderForm();

    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    const email = screen.getByLabelText('E-mail');
    const password = screen.getByLabelText('Password');
    expect(email).toHaveAttribute('aria-invalid', 'true');
    expect(email).toHaveAccessibleDescription('Enter your e-mail address');
    expect(password).toHaveAccessibleDescription('Enter your password');
    const alerts = screen.getAllByRole('alert');
    expect(alerts).toHaveLength(2);
    expect(alerts[0]).toHaveTextContent('Enter your e-mail address');
    expect(alerts[1]).toHaveTextContent('Enter your password');
    expect(email).toHaveFocus();
    expect(api.fetchMock).not.toHaveBeenCalled();
  });

  it('explains what a valid e-mail address looks like', async () => {
    mockApi({});
    const { user } = renderForm();

    await user.type(screen.getByLabelText('E-mail'), 'not-an-address');
    await user.type(screen.getByLabelText('Password'), 'secret');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(screen.getByLabelText('E-mail')).toHaveAccessibleDescription(
      'Enter a valid e-mail address, like name@company.com',
    );
    expect(screen.getByLabelText('Password')).not.toHaveAttribute('aria-invalid');
  });

  it('sends the typed e-mail (trimmed, lower-case) and password, and stores the signed-in person', async () => {
    const api = mockApi({ 'POST /api/session': { status: 200, body: { user: technician } } });
    const { user, queryClient } = renderForm();

    await user.type(screen.getByLabelText('E-mail'), '  Tech@Example.test ');
    await user.type(screen.getByLabelText('Password'), 'correct horse');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(queryClient.getQueryData(sessionKeys.all)).toEqual(technician));
    expect(api.callsTo('POST', '/api/session')).toHaveLength(1);
    expect(api.callsTo('POST', '/api/session')[0]?.body).toEqual({ email: 'tech@example.test', password: 'correct horse' });
    expect(api.fetchMock.mock.calls[0]?.[1]).toMatchObject({ credentials: 'same-origin', method: 'POST' });
  });

  it("shows the server's message in an alert when the e-mail and password do not match", async () => {
    const message = 'That e-mail and password do not match an active account. Check both and try again.';
    mockApi({ 'POST /api/session': apiError(401, 'bad_credentials', message) });
    const { user, queryClient } = renderForm();

    await user.type(screen.getByLabelText('E-mail'), 'tech@example.test');
    await user.type(screen.getByLabelText('Password'), 'wrong');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText(message)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Sign in' })).toBeEnabled();
    // A wrong password is not an ended session: nothing about the session changes.
    expect(queryClient.getQueryData(sessionKeys.all)).toBeUndefined();
  });

  it('puts field messages from the server next to their fields', async () => {
    mockApi({
      'POST /api/session': apiError(400, 'invalid_input', 'Some fields need attention.', { password: 'Password is too long' }),
    });
    const { user } = renderForm();

    await user.type(screen.getByLabelText('E-mail'), 'tech@example.test');
    await user.type(screen.getByLabelText('Password'), 'x');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(screen.getByLabelText('Password')).toHaveAccessibleDescription('Password is too long'));
    expect(screen.getByText('Some fields need attention.')).toBeInTheDocument();
  });

  it('tells the person how long to wait after too many attempts', async () => {
    mockApi({
      'POST /api/session': apiError(429, 'too_many_attempts', 'Too many failed sign-ins from this device. Wait 15 minutes.'),
    });
    const { user } = renderForm();

    await user.type(screen.getByLabelText('E-mail'), 'tech@example.test');
    await user.type(screen.getByLabelText('Password'), 'again');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('Wait 15 minutes.');
  });

  it('says to check the network when the server cannot be reached', async () => {
    vi.stubGlobal('fetch', vi.fn().mockRejectedValue(new TypeError('Failed to fetch')));
    const { user } = renderForm();

    await user.type(screen.getByLabelText('E-mail'), 'tech@example.test');
    await user.type(screen.getByLabelText('Password'), 'pw');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('Check this device’s network connection');
  });

  it('can show the password as typed, for gloved hands', async () => {
    mockApi({});
    const { user } = renderForm();
    const toggle = screen.getByRole('button', { name: 'Show password' });

    await user.click(toggle);

    expect(toggle).toHaveAttribute('aria-pressed', 'true');
    expect(screen.getByLabelText('Password')).toHaveAttribute('type', 'text');
  });
});
