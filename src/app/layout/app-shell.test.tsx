import { screen, within } from '@testing-library/react';
import type { SessionUser } from '@shared/schemas/session';
import { renderApp } from '@/testing/render-app';
import { mockApi } from '@/testing/mock-api';
import { admin, manager, pageOf, technician } from '@/testing/fixtures';

afterEach(() => {
  vi.unstubAllGlobals();
});

async function openPressesAs(person: SessionUser) {
  mockApi({
    'GET /api/session': { status: 200, body: { user: person } },
    'GET /api/presses': { status: 200, body: pageOf([]) },
  });
  renderApp('/presses');
  const nav = await screen.findByRole('navigation', { name: 'Main' });
  return within(nav).getAllByRole('link').map((link) => link.textContent);
}

describe('Role-aware shell', () => {
  it('gives a technician their visits and the presses', async () => {
    expect(await openPressesAs(technician)).toEqual(['My visits', 'Presses']);
  });

  it('gives a service manager their own visits, presses and customers', async () => {
    expect(await openPressesAs(manager)).toEqual(['My visits', 'Presses', 'Customers']);
  });

  it('gives an administrator their own visits, presses and customers', async () => {
    expect(await openPressesAs(admin)).toEqual(['My visits', 'Presses', 'Customers']);
  });

  it("shows who is signed in, in what role, and marks the current page", async () => {
    await openPressesAs(manager);
    const banner = screen.getByRole('banner');
    expect(within(banner).getByText('Mo Madeup')).toBeInTheDocument();
    expect(within(banner).getByText('Service manager')).toBeInTheDocument();
    expect(within(banner).getByRole('button', { name: 'Sign out' })).toBeInTheDocument();
    expect(within(banner).getByRole('link', { name: 'Presses' })).toHaveAttribute('aria-current', 'page');
  });

  it('offers a skip link to the main content', async () => {
    await openPressesAs(technician);
    expect(screen.getByRole('link', { name: 'Skip to main content' })).toHaveAttribute('href', '#main');
    expect(screen.getByRole('main')).toHaveAttribute('id', 'main');
  });
});
