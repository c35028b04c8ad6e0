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

  it('gives a service manager the review queue, all visits, figures, their own visits, presses and administration', async () => {
    expect(await openPressesAs(manager)).toEqual(['Review queue', 'All visits', 'Dashboard', 'My visits', 'Presses', 'Administration']);
  });

  it('gives an administrator the same office links', async () => {
    expect(await openPressesAs(admin)).toEqual(['Review queue', 'All visits', 'Dashboard', 'My visits', 'Presses', 'Administration']);
  });

  it('marks only the most specific link as current: All visits, not also My visits', async () => {
    mockApi({
      'GET /api/session': { status: 200, body: { user: manager } },
    });
    renderApp('/visits/all');
    const nav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(nav).getByRole('link', { name: 'All visits' })).toHaveAttribute('aria-current', 'page');
    expect(within(nav).getByRole('link', { name: 'My visits' })).not.toHaveAttribute('aria-current');
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
