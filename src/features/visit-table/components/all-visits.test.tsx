import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import type { VisitTablePage, VisitTableRow } from '@shared/schemas/visit-table';
import { createAppQueryClient } from '@/app/create-app-query-client';
import { AppProvider } from '@/app/provider';
import { mockApi, type RecordedCall } from '@/testing/mock-api';
import { pageOf } from '@/testing/fixtures';
import { AllVisits } from './all-visits';

afterEach(() => {
  vi.unstubAllGlobals();
});

// Invented rows: no real company, person or press.
const row = (id: number, customer: string): VisitTableRow => ({
  id,
  reference: `V-${String(id).padStart(6, '0')}`,
  status: 'closed',
  startedAt: '2026-03-02T08:00:00.000Z',
  closedAt: '2026-03-02T09:35:00.000Z',
  faultDisplayed: 'E-417 crank angle invalid (invented)',
  causeCategory: 'sensor',
  customer: { id: 100, name: customer },
  site: { id: 10, name: 'Plant North (invented)' },
  press: { id: 1, assetTag: 'PX-101', model: 'Invented SP-250' },
  technician: { id: 1, name: 'Ada Invented' },
  labourMinutes: 60,
  travelMinutes: 20,
  repairMinutes: 95,
  failedReadings: 1,
  nearEdgeReadings: 0,
});

function visitsApi() {
  return mockApi({
    'GET /api/manager/visits': (call: RecordedCall) => {
      const sort = (call.query.get('sort') ?? 'startedAt') as VisitTablePage['sort'];
      const dir = (call.query.get('dir') ?? 'desc') as VisitTablePage['dir'];
      const rows = [row(1, 'Example Stampings (invented)'), row(2, 'Sample Forming (invented)')];
      const body: VisitTablePage = { ...pageOf(dir === 'desc' ? rows.reverse() : rows, { total: 60, pageSize: 25, page: Number(call.query.get('page') ?? 1) }), sort, dir };
      return { status: 200, body };
    },
    'GET /api/customers': { status: 200, body: pageOf([]) },
    'GET /api/manager/technicians': { status: 200, body: { items: [] } },
  });
}

function renderAllVisits(url = '/visits/all') {
  const router = createMemoryRouter(
    [{ path: '/visits/all', element: <AllVisits recordHref={(id) => `/review/${id}`} pressHistoryHref={(id) => `/presses/${id}/history`} /> }],
    { initialEntries: [url] },
  );
  const user = userEvent.setup();
  render(
    <AppProvider queryClient={createAppQueryClient()}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { router, user };
}

describe('all visits table', () => {
  it('asks the server to sort when a column header is clicked, and keeps the sort in the address', async () => {
    const api = visitsApi();
    const { router, user } = renderAllVisits();
    const table = await screen.findByRole('table');
    expect(within(table).getByRole('columnheader', { name: /Started/ })).toHaveAttribute('aria-sort', 'descending');

    await user.click(within(table).getByRole('button', { name: /Customer/ }));
    await waitFor(() => expect(router.state.location.search).toContain('sort=customer&dir=asc'));
    await waitFor(() => expect(within(screen.getByRole('table')).getByRole('columnheader', { name: /Customer/ })).toHaveAttribute('aria-sort', 'ascending'));

    await user.click(within(screen.getByRole('table')).getByRole('button', { name: /Customer/ }));
    await waitFor(() => expect(router.state.location.search).toContain('sort=customer&dir=desc'));

    const requests = api.callsTo('GET', '/api/manager/visits').map((c) => `${c.query.get('sort')}:${c.query.get('dir')}`);
    expect(requests).toEqual(['null:null', 'customer:asc', 'customer:desc']);
  });

  it('filters by status on the server, back to page one, and exports the same filters', async () => {
    const api = visitsApi();
    const { router, user } = renderAllVisits('/visits/all?page=2&sort=closedAt&dir=asc');
    await screen.findByRole('table');
    await user.click(screen.getByRole('checkbox', { name: 'Closed — awaiting review' }));
    await user.click(screen.getByRole('checkbox', { name: 'Returned for correction' }));

    await waitFor(() => expect(api.callsTo('GET', '/api/manager/visits').at(-1)!.query.get('status')).toBe('closed,returned'));
    const last = api.callsTo('GET', '/api/manager/visits').at(-1)!;
    expect(last.query.get('page')).toBeNull();
    expect(last.query.get('sort')).toBe('closedAt');
    expect(router.state.location.search).not.toContain('page=');

    const href = screen.getByRole('link', { name: 'Download CSV of these visits' }).getAttribute('href')!;
    const exportUrl = new URL(href, 'http://localhost');
    expect(exportUrl.pathname).toBe('/api/manager/visits/export.csv');
    expect(exportUrl.searchParams.get('status')).toBe('closed,returned');
    expect(exportUrl.searchParams.get('sort')).toBeNull();
  });

  it('pages through the server’s total', async () => {
    const api = visitsApi();
    const { user } = renderAllVisits();
    expect(await screen.findByText('1–25 of 60 visits · page 1 of 3')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: /Next page/ }));
    await waitFor(() => expect(api.callsTo('GET', '/api/manager/visits').at(-1)!.query.get('page')).toBe('2'));
  });
});
