import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createAppQueryClient } from '@/app/create-app-query-client';
import { AppProvider } from '@/app/provider';
import { visitAtFinding } from '@/testing/close-out-fixtures';
import { apiError, mockApi } from '@/testing/mock-api';
import { ReviewDecisionDialog, type ReviewMode } from './review-decision-dialog';

afterEach(() => {
  vi.unstubAllGlobals();
});

function renderDialog(mode: ReviewMode) {
  const onDone = vi.fn();
  const onClose = vi.fn();
  const user = userEvent.setup();
  render(
    <AppProvider queryClient={createAppQueryClient()}>
      <button type="button">Opener</button>
      <ReviewDecisionDialog visitId={7} reference="V-000007" mode={mode} onClose={onClose} onDone={onDone} />
    </AppProvider>,
  );
  return { onDone, onClose, user };
}

describe('review decision dialog', () => {
  it('will not return a visit without a comment, and says what to write', async () => {
    const api = mockApi({ 'POST /api/visits/7/review': { status: 200, body: visitAtFinding({ status: 'returned' }) } });
    const { user, onDone } = renderDialog('return');
    const comment = screen.getByRole('textbox', { name: 'What should the technician correct?' });
    expect(comment).toHaveFocus();

    await user.click(screen.getByRole('button', { name: 'Return to technician' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Say what the technician should correct');
    expect(comment).toHaveAttribute('aria-invalid', 'true');
    expect(api.callsTo('POST', '/api/visits/7/review')).toHaveLength(0);

    await user.type(comment, '  Add the serial of the fitted sensor.  ');
    await user.click(screen.getByRole('button', { name: 'Return to technician' }));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(api.callsTo('POST', '/api/visits/7/review')[0]!.body).toEqual({ decision: 'return', comment: 'Add the serial of the fitted sensor.' });
  });

  it('approves without a note, sending no empty comment', async () => {
    const api = mockApi({ 'POST /api/visits/7/review': { status: 200, body: visitAtFinding({ status: 'approved' }) } });
    const { user, onDone } = renderDialog('approve');
    await user.click(screen.getByRole('button', { name: 'Approve visit' }));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(api.callsTo('POST', '/api/visits/7/review')[0]!.body).toEqual({ decision: 'approve' });
  });

  it("shows the server's reason when the decision is refused, and keeps the dialog open", async () => {
    mockApi({ 'POST /api/visits/7/review': apiError(409, 'not_closed', 'Visit V-000007 is approved; only a closed visit waits for review.') });
    const { user, onDone } = renderDialog('approve');
    await user.click(screen.getByRole('button', { name: 'Approve visit' }));
    expect(await screen.findByText('Visit V-000007 is approved; only a closed visit waits for review.')).toBeInTheDocument();
    expect(screen.getByRole('dialog', { name: 'Approve visit V-000007' })).toBeInTheDocument();
    expect(onDone).not.toHaveBeenCalled();
  });

  it('closes on Escape', async () => {
    mockApi({});
    const { user, onClose } = renderDialog('return');
    await user.keyboard('{Escape}');
    expect(onClose).toHaveBeenCalled();
  });
});
