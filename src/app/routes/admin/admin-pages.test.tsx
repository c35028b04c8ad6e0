import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider, type RouteObject } from 'react-router-dom';
import type { AdminUser } from '@shared/schemas/admin-users';
import { createAppQueryClient } from '@/app/create-app-query-client';
import { AppProvider } from '@/app/provider';
import { RequireRole } from '@/app/guards/require-role';
import { RequireSession } from '@/app/guards/require-session';
import { admin, manager } from '@/testing/fixtures';
import { mockApi } from '@/testing/mock-api';

afterEach(() => {
  vi.unstubAllGlobals();
});

// The same shape as the route objects handed over for src/app/router.tsx.
const routes: RouteObject[] = [
  { path: '/accept-invite/:token', lazy: async () => ({ Component: (await import('../invite/accept-invite-page')).AcceptInvitePage }) },
  {
    element: <RequireSession />,
    children: [
      {
        element: <RequireRole roles={['admin']} />,
        children: [{ path: '/admin/users', lazy: async () => ({ Component: (await import('./users-page')).UsersPage }) }],
      },
    ],
  },
];

function open(url: string) {
  const router = createMemoryRouter(routes, { initialEntries: [url] });
  const user = userEvent.setup();
  render(
    <AppProvider queryClient={createAppQueryClient()}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { user };
}

// Invented people.
const people: AdminUser[] = [
  { id: 3, email: 'admin@example.test', name: 'Alex Fictional', role: 'admin', status: 'active', invite: null, createdAt: '2026-01-01T00:00:00.000Z' },
  { id: 8, email: 'tess@example.test', name: 'Tess Madeup', role: 'technician', status: 'active', invite: null, createdAt: '2026-01-01T00:00:00.000Z' },
];

describe('People and roles page', () => {
  it('deactivates a person and shows the new status; the administrator cannot change their own account', async () => {
    let list = people;
    const api = mockApi({
      'GET /api/session': { status: 200, body: { user: admin } },
      'GET /api/admin/users': () => ({ status: 200, body: list }),
      'PATCH /api/admin/users/8': () => {
        list = [people[0]!, { ...people[1]!, status: 'deactivated' }];
        return { status: 200, body: list[1] };
      },
    });
    const { user } = open('/admin/users');
    const row = (await within(await screen.findByRole('table')).findByText('Tess Madeup')).closest('tr')!;
    await user.click(within(row).getByRole('button', { name: 'Deactivate Tess Madeup' }));
    expect(await within(row).findByText('Deactivated')).toBeInTheDocument();
    expect(api.callsTo('PATCH', '/api/admin/users/8')[0]!.body).toEqual({ active: false });
    const me = within(screen.getByRole('table')).getByText('Alex Fictional').closest('tr')!;
    expect(within(me).getByRole('combobox', { name: 'Role of Alex Fictional' })).toBeDisabled();
    expect(within(me).getByText('This is you')).toBeInTheDocument();
  });

  it('is not shown to a manager', async () => {
    mockApi({ 'GET /api/session': { status: 200, body: { user: manager } } });
    open('/admin/users');
    expect(await screen.findByRole('heading', { name: 'Not allowed' })).toBeInTheDocument();
    expect(screen.queryByRole('heading', { name: 'People and roles' })).not.toBeInTheDocument();
  });
});

describe('Accept-invitation page', () => {
  it('greets the invited person without a session and explains an expired link', async () => {
    mockApi({ [`GET /api/invites/${'E'.repeat(43)}`]: { status: 410, body: { error: { code: 'invite_expired', message: 'This invitation has expired. Ask your administrator to send you a new invitation.' } } } });
    open(`/accept-invite/${'E'.repeat(43)}`);
    expect(await screen.findByText('This link cannot be used')).toBeInTheDocument();
    expect(screen.getByText(/has expired/)).toBeInTheDocument();
  });

  it('shows the password form for a good link', async () => {
    mockApi({ [`GET /api/invites/${'G'.repeat(43)}`]: { status: 200, body: { email: 'ina@example.test', name: 'Ina Invented', expiresAt: '2026-12-09T00:00:00.000Z' } } });
    open(`/accept-invite/${'G'.repeat(43)}`);
    expect(await screen.findByText(/Welcome, Ina Invented/)).toBeInTheDocument();
    expect(screen.getByRole('form', { name: 'Choose your password' })).toBeInTheDocument();
  });
});
