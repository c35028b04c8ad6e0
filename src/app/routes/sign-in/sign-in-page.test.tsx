import { screen, waitFor } from '@testing-library/react';
import { renderApp } from '@/testing/render-app';
import { apiError, mockApi } from '@/testing/mock-api';
import { manager, pageOf, technician } from '@/testing/fixtures';

afterEach(() => {
  vi.unstubAllGlobals();
});

const signedOut = apiError(401, 'not_signed_in', 'You are not signed in, or your session has ended. Sign in and try again.');

describe('Sign-in page', () => {
  it('names the product and its purpose, and titles the browser tab', async () => {
    mockApi({ 'GET /api/session': signedOut });
    renderApp('/sign-in');

    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(screen.getByText('Crankwise')).toBeInTheDocument();
    expect(screen.getByText(/mechanical power press controls/)).toBeInTheDocument();
    // The title is set in an effect, which may land a tick after the heading under load.
    await waitFor(() => expect(document.title).toBe('Sign in · Crankwise'));
  });

  it("takes a technician to their visits, the role's start page, after signing in", async () => {
    mockApi({
      'GET /api/session': signedOut,
      'POST /api/session': { status: 200, body: { user: technician } },
      'GET /api/visits': { status: 200, body: pageOf([]) },
    });
    const { user, router } = renderApp('/sign-in');

    await user.type(await screen.findByLabelText('E-mail'), technician.email);
    await user.type(screen.getByLabelText('Password'), 'correct horse');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'My visits' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/visits');
    expect(screen.getByText(technician.name)).toBeInTheDocument();
  });

  it('returns a person to the page they were sent away from', async () => {
    mockApi({
      'GET /api/session': signedOut,
      'POST /api/session': { status: 200, body: { user: manager } },
      'GET /api/customers': { status: 200, body: pageOf([]) },
    });
    const { user, router } = renderApp('/customers?q=north');

    await user.type(await screen.findByLabelText('E-mail'), manager.email);
    expect(router.state.location.pathname).toBe('/sign-in');
    await user.type(screen.getByLabelText('Password'), 'pw');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Customers' })).toBeInTheDocument();
    expect(router.state.location.pathname + router.state.location.search).toBe('/customers?q=north');
  });

  it('sends someone already signed in straight on, a manager to the review queue', async () => {
    mockApi({
      'GET /api/session': { status: 200, body: { user: manager } },
      'GET /api/manager/visits': { status: 200, body: { ...pageOf([]), rows: [] } },
    });
    const { router } = renderApp('/sign-in');

    await waitFor(() => expect(router.state.location.pathname).toBe('/review'));
  });
});
