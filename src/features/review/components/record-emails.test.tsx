import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { EmailDto } from '@shared/schemas/email';
import { mockApi } from '@/testing/mock-api';
import { RecordEmails } from './record-emails';

afterEach(() => {
  vi.unstubAllGlobals();
});

const failedMail: EmailDto = {
  id: 7,
  visitId: 42,
  kind: 'visit_report',
  to: 'maintenance@plant.example',
  subject: 'Service report V-000042 (invented)',
  status: 'failed',
  attempts: 10,
  lastError: '550 mailbox unavailable',
  nextAttemptAt: null,
  sentAt: null,
  messageId: null,
  attachments: [],
  createdAt: '2026-12-01T10:00:00.000Z',
  updatedAt: '2026-12-01T12:00:00.000Z',
};

describe('e-mails on the visit record', () => {
  it('lets the manager put a failed report e-mail back in the outbox', async () => {
    const api = mockApi({ 'POST /api/emails/7/resend': { status: 200, body: { ...failedMail, status: 'queued' } } });
    render(
      <QueryClientProvider client={new QueryClient()}>
        <RecordEmails emails={[failedMail]} loading={false} failed={false} timeZone="UTC" />
      </QueryClientProvider>,
    );
    expect(screen.getByText('Last error: 550 mailbox unavailable')).toBeInTheDocument();
    expect(screen.getByText(/queued 1 Dec 2026, 10:00 UTC/)).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Send again' }));
    expect(await screen.findByText(/Queued again/)).toBeInTheDocument();
    expect(api.callsTo('POST', '/api/emails/7/resend')).toHaveLength(1);
  });
});
