import { screen, waitFor, within } from '@testing-library/react';
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

  it('asks for the password over the page when the session ends while they work, and loads the page again after', async () => {
    let pressCalls = 0;
    mockApi({
      'GET /api/session': signedInAs(technician),
      'GET /api/presses': () => (++pressCalls === 1 ? signedOut : { status: 200, body: pageOf([press()]) }),
      'POST /api/session': signedInAs(technician),
    });
    const { router, user } = renderApp('/presses');

    const dialog = await screen.findByRole('dialog', { name: 'Sign in again to keep working' });
    expect(router.state.location.pathname).toBe('/presses');
    await user.type(within(dialog).getByLabelText('Password'), 'correct horse');
    await user.click(within(dialog).getByRole('button', { name: 'Sign in and continue' }));

    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(await screen.findByText(press().assetTag, { exact: false })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/presses');
  });

  it('goes to the sign-in page when someone else is to sign in instead', async () => {
    mockApi({ 'GET /api/session': signedInAs(technician), 'GET /api/presses': signedOut });
    const { router, user } = renderApp('/presses');

    const dialog = await screen.findByRole('dialog', { name: 'Sign in again to keep working' });
    await user.click(within(dialog).getByRole('button', { name: 'Sign in as someone else' }));

    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
  });

  it("clears the signed-out person's unsaved drafts from the device, and only theirs", async () => {
    mockApi({
      'GET /api/session': signedInAs(manager),
      'GET /api/presses': { status: 200, body: pageOf([press()]) },
      'DELETE /api/session': { status: 204 },
    });
    localStorage.setItem(`crankwise:draft:${manager.id}:7:close-out`, JSON.stringify({ savedAt: '2026-03-02T10:00:00.000Z', value: {} }));
    localStorage.setItem(`crankwise:draft:${manager.id + 100}:7:close-out`, JSON.stringify({ savedAt: '2026-03-02T10:00:00.000Z', value: {} }));
    const { user } = renderApp('/presses');

    await user.click(await screen.findByRole('button', { name: 'Sign out' }));

    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(localStorage.getItem(`crankwise:draft:${manager.id}:7:close-out`)).toBeNull();
    expect(localStorage.getItem(`crankwise:draft:${manager.id + 100}:7:close-out`)).not.toBeNull();
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
