import { screen, waitFor, within } from '@testing-library/react';
import { pageOf, press, technician } from '@/testing/fixtures';
import { renderApp } from '@/testing/render-app';
import { mockApi } from '@/testing/mock-api';
import { visitDetail, visitSummary } from '@/features/visits/testing/visit-fixtures';

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('My visits', () => {
  it('lists open visits before closed ones, with each status in words, and lets a returned visit be reopened', async () => {
    const closed = visitSummary({ id: 40, status: 'closed', closedAt: '2026-03-03T10:00:00.000Z', updatedAt: '2026-03-03T10:00:00.000Z' });
    const working = visitSummary({ id: 41, status: 'in_progress', press: press({ id: 2, assetTag: 'PX-204' }) });
    const returned = visitSummary({ id: 42, status: 'returned' });
    const comment = 'Add the serial of the fitted sensor (invented comment).';
    const api = mockApi({
      'GET /api/session': { status: 200, body: { user: technician } },
      'GET /api/visits': { status: 200, body: pageOf([closed, working, returned]) },
      'GET /api/visits/42': { status: 200, body: visitDetail({ status: 'returned', reviewComment: comment }) },
      'POST /api/visits/42/reopen': { status: 200, body: visitDetail({ status: 'in_progress', reviewComment: comment }) },
      'GET /api/visits/42/attachments': { status: 200, body: { items: [] } },
    });
    const { user, router } = renderApp('/visits');

    const open = await screen.findByRole('list', { name: 'Open visits' });
    const openCards = within(open).getAllByRole('article');
    expect(openCards.map((c) => within(c).getByRole('heading').textContent)).toEqual(['PX-101 · V-000042', 'PX-204 · V-000041']);
    expect(within(openCards[0]!).getByText('Returned for correction')).toBeInTheDocument();
    expect(within(openCards[1]!).getByText('In progress')).toBeInTheDocument();
    const recent = screen.getByRole('list', { name: 'Recently closed' });
    expect(within(recent).getByText('Closed — awaiting review')).toBeInTheDocument();
    expect(api.callsTo('GET', '/api/visits')[0]?.query.get('mine')).toBe('true');

    expect(await within(openCards[0]!).findByText(comment)).toBeInTheDocument();
    await user.click(within(openCards[0]!).getByRole('button', { name: 'Reopen' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/visits/42'));
    expect(api.callsTo('POST', '/api/visits/42/reopen')).toHaveLength(1);
  });

  it("is a technician's start page", async () => {
    mockApi({
      'GET /api/session': { status: 200, body: { user: technician } },
      'GET /api/visits': { status: 200, body: pageOf([]) },
    });
    const { router } = renderApp('/');

    expect(await screen.findByRole('heading', { level: 1, name: 'My visits' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/visits');
    expect(await screen.findByText('No open visits. Start one when you reach the press.')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Start a visit' })).toHaveAttribute('href', '/visits/new');
  });
});
