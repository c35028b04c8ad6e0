import { QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createQueryClient } from '@/lib/query-client';
import { apiError, mockApi } from '@/testing/mock-api';
import { AcceptInviteForm } from './accept-invite-form';

afterEach(() => {
  vi.unstubAllGlobals();
});

const TOKEN = 'T'.repeat(43);

function renderForm(onAccepted = vi.fn()) {
  const user = userEvent.setup();
  render(
    <QueryClientProvider client={createQueryClient()}>
      <AcceptInviteForm token={TOKEN} email="new.person@example.test" onAccepted={onAccepted} />
    </QueryClientProvider>,
  );
  return { user, onAccepted };
}

describe('Accept-invitation form', () => {
  it('asks for 12 characters and the same password twice before sending anything', async () => {
    const api = mockApi({});
    const { user } = renderForm();
    await user.type(screen.getByLabelText('New password', { selector: 'input' }), 'too short');
    await user.type(screen.getByLabelText('Type it again'), 'different');
    await user.click(screen.getByRole('button', { name: 'Set password and open my account' }));
    expect(await screen.findByText(/Use at least 12 characters/)).toHaveAttribute('role', 'alert');
    expect(screen.getByText(/The two passwords differ/)).toBeInTheDocument();
    expect(api.calls).toHaveLength(0);
  });

  it('sends the password and reports success', async () => {
    const api = mockApi({ [`POST /api/invites/${TOKEN}/accept`]: { status: 200, body: { email: 'new.person@example.test' } } });
    const { user, onAccepted } = renderForm();
    await user.type(screen.getByLabelText('New password', { selector: 'input' }), 'plant floor at six sharp');
    await user.type(screen.getByLabelText('Type it again'), 'plant floor at six sharp');
    await user.click(screen.getByRole('button', { name: 'Set password and open my account' }));
    await vi.waitFor(() => expect(onAccepted).toHaveBeenCalled());
    expect(api.calls[0]!.body).toEqual({ password: 'plant floor at six sharp' });
  });

  it('shows the server’s reason when the link was already used', async () => {
    mockApi({ [`POST /api/invites/${TOKEN}/accept`]: apiError(410, 'invite_used', 'This invitation has already been used to set a password. Sign in with that password instead.') });
    const { user, onAccepted } = renderForm();
    await user.type(screen.getByLabelText('New password', { selector: 'input' }), 'plant floor at six sharp');
    await user.type(screen.getByLabelText('Type it again'), 'plant floor at six sharp');
    await user.click(screen.getByRole('button', { name: 'Set password and open my account' }));
    expect(await screen.findByText(/already been used/)).toBeInTheDocument();
    expect(onAccepted).not.toHaveBeenCalled();
  });
});
