import { screen, waitFor } from '@testing-library/react';
import { renderApp } from '@/testing/render-app';
import { mockApi, type RecordedCall } from '@/testing/mock-api';
import { admin, customer, pageOf } from '@/testing/fixtures';

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('Customers page', () => {
  it('lists customers with their contact, and narrows the list by name', async () => {
    const all = [customer(), customer({ id: 101, name: 'Sample Forming (invented)', contactName: null, contactEmail: null, contactPhone: null })];
    mockApi({
      'GET /api/session': { status: 200, body: { user: admin } },
      'GET /api/customers': (call: RecordedCall) => {
        const q = (call.query.get('q') ?? '').toLowerCase();
        return { status: 200, body: pageOf(all.filter((c) => c.name.toLowerCase().includes(q))) };
      },
    });
    const { user, router } = renderApp('/customers');

    expect(await screen.findByRole('heading', { name: 'Sample Forming (invented)' })).toBeInTheDocument();
    expect(screen.getByText('No contact recorded')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'pat@example.test' })).toHaveAttribute('href', 'mailto:pat@example.test');

    await user.type(screen.getByRole('searchbox', { name: 'Find a customer' }), 'sample');

    await waitFor(() => expect(screen.queryByRole('heading', { name: 'Example Stampings (invented)' })).not.toBeInTheDocument());
    expect(screen.getByRole('heading', { name: 'Sample Forming (invented)' })).toBeInTheDocument();
    expect(router.state.location.search).toBe('?q=sample');
  });

  it('says when no customer matches', async () => {
    mockApi({
      'GET /api/session': { status: 200, body: { user: admin } },
      'GET /api/customers': { status: 200, body: pageOf([]) },
    });
    renderApp('/customers?q=nobody');

    expect(await screen.findByText('No customer matches “nobody”.')).toBeInTheDocument();
  });
});
