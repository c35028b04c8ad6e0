import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { Customer } from '@shared/schemas/customer';
import type { Site } from '@shared/schemas/site';
import { createAppQueryClient } from '@/app/create-app-query-client';
import { AppProvider } from '@/app/provider';
import { apiError, mockApi } from '@/testing/mock-api';
import { SiteDirectory } from './directory-workspace';

afterEach(() => {
  vi.unstubAllGlobals();
});

// Invented customers and site.
const stamps = { createdAt: '2026-01-01T00:00:00.000Z', updatedAt: '2026-01-01T00:00:00.000Z' };
const customers: Customer[] = [
  { id: 4, name: 'Fictional Stampings', contactName: null, contactEmail: null, contactPhone: null, notes: null, capacityUnit: 'us_ton', ...stamps },
  { id: 9, name: 'Madeup Metalforming', contactName: null, contactEmail: null, contactPhone: null, notes: null, capacityUnit: 'us_ton', ...stamps },
];
const site: Site = { id: 12, customerId: 4, customerName: 'Fictional Stampings', name: 'North Works', address: null, city: 'Sampleton', capacityUnit: 'us_ton', ...stamps };
const page = <T,>(items: T[]) => ({ items, total: items.length, page: 1, pageSize: 100 });

function open() {
  const user = userEvent.setup();
  render(
    <AppProvider queryClient={createAppQueryClient()}>
      <SiteDirectory />
    </AppProvider>,
  );
  return { user };
}

describe('the site form', () => {
  it('starts from the stored site’s name and city, and sends the form’s fields on save', async () => {
    const api = mockApi({
      'GET /api/sites': { status: 200, body: page([site]) },
      'GET /api/customers': { status: 200, body: page(customers) },
      'PATCH /api/sites/12': ({ body }) => ({ status: 200, body: { ...site, ...(body as object) } }),
    });
    const { user } = open();
    await user.click(await screen.findByRole('button', { name: 'Edit North Works' }));

    expect(screen.getByLabelText('Site name')).toHaveValue('North Works');
    expect(screen.getByLabelText('City')).toHaveValue('Sampleton');
    expect(screen.getByLabelText('Address')).toHaveValue('');
    await screen.findByRole('option', { name: 'Madeup Metalforming' });

    await user.selectOptions(screen.getByLabelText('Customer'), 'Madeup Metalforming');
    await user.clear(screen.getByLabelText('City'));
    await user.type(screen.getByLabelText('City'), 'Otherville');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    await vi.waitFor(() => expect(api.callsTo('PATCH', '/api/sites/12')).toHaveLength(1));
    expect(api.callsTo('PATCH', '/api/sites/12')[0]!.body).toEqual({ customerId: 9, name: 'North Works', address: '', city: 'Otherville' });
    // Saved: the form closes and the list is read again.
    await vi.waitFor(() => expect(screen.queryByLabelText('Site name')).not.toBeInTheDocument());
  });

  it('puts the server’s message on the field it names', async () => {
    mockApi({
      'GET /api/sites': { status: 200, body: page([]) },
      'GET /api/customers': { status: 200, body: page(customers) },
      'POST /api/sites': apiError(409, 'conflict', 'This customer already has a site with that name.', { name: 'This customer already has a site with that name.' }),
    });
    const { user } = open();
    await user.click(await screen.findByRole('button', { name: 'Add a site' }));
    await screen.findByRole('option', { name: 'Fictional Stampings' });
    await user.selectOptions(screen.getByLabelText('Customer'), 'Fictional Stampings');
    await user.type(screen.getByLabelText('Site name'), 'North Works');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(await screen.findByLabelText('Site name')).toHaveAccessibleDescription(/already has a site with that name/);
  });
});
