import { screen, within } from '@testing-library/react';
import type { ReportDelivery } from '@shared/schemas/email';
import { technician } from '@/testing/fixtures';
import { renderApp } from '@/testing/render-app';
import { mockApi } from '@/testing/mock-api';
import { UP_TO_RESISTANCE, visitDetail } from '@/features/visits/testing/visit-fixtures';

afterEach(() => {
  vi.unstubAllGlobals();
});

// Invented recipient and times; UTC so the expected clock time does not depend on the machine.
const delivery = (overrides: Partial<ReportDelivery>): ReportDelivery => ({
  issueNumber: 1,
  to: 'maintenance@plant.example',
  status: 'sent',
  queuedAt: '2026-12-02T08:15:30.000Z',
  sentAt: '2026-12-02T08:16:04.000Z',
  nextAttemptAt: null,
  attempts: 1,
  lastError: null,
  reportPath: '/report/made-up-token',
  pdfPath: '/api/report/made-up-token/pdf',
  timeZone: 'UTC',
  ...overrides,
});

function closedVisitApi(reply: () => { status: number; body: unknown }) {
  return mockApi({
    'GET /api/session': { status: 200, body: { user: technician } },
    'GET /api/visits/42': { status: 200, body: visitDetail({ status: 'closed', answers: UP_TO_RESISTANCE }) },
    'GET /api/visits/42/attachments': { status: 200, body: { items: [] } },
    'GET /api/visits/42/report-delivery': reply,
  });
}

describe('After closing: what became of the report e-mail', () => {
  it('names the address and the time with its zone, and links to the customer page and the PDF', async () => {
    closedVisitApi(() => ({ status: 200, body: { delivery: delivery({}) } }));
    renderApp('/visits/42');

    const notice = (await screen.findByText('Report e-mailed to maintenance@plant.example at 2 Dec 2026, 08:16 UTC')).closest('[role="status"]') as HTMLElement;
    expect(within(notice).getByRole('link', { name: 'Open the customer’s report page' })).toHaveAttribute('href', '/report/made-up-token');
    expect(within(notice).getByRole('link', { name: 'Download the PDF' })).toHaveAttribute('href', '/api/report/made-up-token/pdf');
  });

  it('says when the report is still queued and when it will be sent, then follows it until it has gone', async () => {
    let asks = 0;
    const api = closedVisitApi(() => ({
      status: 200,
      body: { delivery: ++asks === 1 ? delivery({ status: 'queued', sentAt: null, attempts: 0, nextAttemptAt: '2026-12-02T08:15:31.000Z' }) : delivery({}) },
    }));
    renderApp('/visits/42');

    expect(await screen.findByText('Report queued for maintenance@plant.example')).toBeInTheDocument();
    expect(screen.getByText(/it will be sent at 2 Dec 2026, 08:15 UTC at the latest/)).toBeInTheDocument();
    expect(await screen.findByText(/^Report e-mailed to maintenance@plant.example at /, {}, { timeout: 8000 })).toBeInTheDocument();
    expect(api.callsTo('GET', '/api/visits/42/report-delivery').length).toBeGreaterThanOrEqual(2);
  });

  it('says a failed e-mail failed, why, and what to do next', async () => {
    closedVisitApi(() => ({
      status: 200,
      body: { delivery: delivery({ status: 'failed', sentAt: null, lastError: '550 5.1.1 No such mailbox', reportPath: '/report/made-up-token' }) },
    }));
    renderApp('/visits/42');

    const title = await screen.findByText('Report e-mail to maintenance@plant.example failed');
    const notice = title.closest('[role="status"]') as HTMLElement;
    expect(notice).toHaveTextContent('550 5.1.1 No such mailbox');
    expect(notice).toHaveTextContent('Check the address with the customer and ask the office to send it again');
    expect(within(notice).getByRole('link', { name: 'Download the PDF' })).toBeInTheDocument();
  });
});
