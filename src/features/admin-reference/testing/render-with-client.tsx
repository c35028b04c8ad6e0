import { QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactElement } from 'react';
import { createQueryClient } from '@/lib/query-client';

/** Renders one admin component inside a query client like the app's; fetch must be mocked first. */
export function renderWithClient(ui: ReactElement) {
  const queryClient = createQueryClient();
  const user = userEvent.setup();
  return { ...render(<QueryClientProvider client={queryClient}>{ui}</QueryClientProvider>), user, queryClient };
}
