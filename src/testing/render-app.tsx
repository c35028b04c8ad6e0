import { configure, render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { createAppQueryClient } from '@/app/create-app-query-client';
import { AppProvider } from '@/app/provider';
import { appRoutes } from '@/app/router';

// Route screens load lazily; the first import in a test file is transformed on demand and can
// take over a second on a busy two-core machine.
configure({ asyncUtilTimeout: 5000 });

/** Renders the whole app at a URL, as a person would open it; fetch must be mocked first. */
export function renderApp(url: string) {
  const queryClient = createAppQueryClient();
  const router = createMemoryRouter(appRoutes, { initialEntries: [url] });
  const user = userEvent.setup();
  const view = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...view, user, router, queryClient };
}
