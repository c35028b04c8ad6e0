import { screen, waitFor } from '@testing-library/react';
import { renderApp } from '@/testing/render-app';
import { apiError, mockApi } from '@/testing/mock-api';
import { admin, customer, manager, pageOf, press, technician } from '@/testing/fixtures';

afterEach(() => {
  vi.unstubAllGlobals();
});

const signedOut = apiError(401, 'not_signed_in', 'You are not signed in, or your session has ended. Sign in and try again.');
const signedInAs = (user: typeof technician) => ({ status: 200, body: { user } });

describe('Sign-in guard and role access', () => {
  it('sends a signed-out visitor to sign in', async () => {
    mockApi({ 'GET /api/session': signedOut });
    const { router } = renderApp('/presses');

    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
  });

  it('sends the person to sign in when the session ends while they work', async () => {
    mockApi({ 'GET /api/session': signedInAs(technician), 'GET /api/presses': signedOut });
    const { router } = renderApp('/presses');

    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
  });

  it('shows a technician a Not allowed page, naming the roles needed, for the customer list', async () => {
    const api = mockApi({ 'GET /api/session': signedInAs(technician) });
    renderApp('/customers');

    expect(await screen.findByRole('heading', { level: 1, name: 'Not allowed' })).toBeInTheDocument();
    expect(screen.getByText('This page needs the service manager or administrator role.')).toBeInTheDocument();
    expect(screen.getByText(/You are signed in as technician/)).toBeInTheDocument();
    expect(api.callsTo('GET', '/api/customers')).toHaveLength(0);
  });

  it("shows the server's reason when it refuses a list", async () => {
    const reason = 'This needs the service manager or administrator role; you are signed in as technician.';
    mockApi({ 'GET /api/session': signedInAs(manager), 'GET /api/customers': apiError(403, 'forbidden', reason) });
    renderApp('/customers');

    expect(await screen.findByRole('alert')).toHaveTextContent(`Not allowed${reason}`);
  });

  it('shows a page-not-found screen for an unknown address', async () => {
    mockApi({ 'GET /api/session': signedInAs(admin) });
    renderApp('/no-such-page');

    expect(await screen.findByRole('heading', { level: 1, name: 'Page not found' })).toBeInTheDocument();
    expect(screen.getByText(/There is no page at \/no-such-page/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Go to your start page' })).toHaveAttribute('href', '/review');
  });

  it('signs out and returns to the sign-in page', async () => {
    const api = mockApi({
      'GET /api/session': signedInAs(manager),
      'GET /api/presses': { status: 200, body: pageOf([press()]) },
      'DELETE /api/session': { status: 204 },
    });
    const { user, router } = renderApp('/presses');

    await user.click(await screen.findByRole('button', { name: 'Sign out' }));

    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(api.callsTo('DELETE', '/api/session')).toHaveLength(1);
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
  });

  it('lets a manager open the customer list', async () => {
    mockApi({ 'GET /api/session': signedInAs(manager), 'GET /api/customers': { status: 200, body: pageOf([customer()]) } });
    renderApp('/customers');

    expect(await screen.findByRole('heading', { level: 2, name: 'Example Stampings (invented)' })).toBeInTheDocument();
    await waitFor(() => expect(document.title).toBe('Customers · Crankwise'));
  });
});
