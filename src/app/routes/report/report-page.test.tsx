import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { render } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { buildVisitRecord } from '@shared/record/build-visit-record';
import { recordSource } from '@shared/record/testing/visit-record-source';
import { createAppQueryClient } from '@/app/create-app-query-client';
import { AppProvider } from '@/app/provider';
import { apiError, mockApi } from '@/testing/mock-api';
import { ReportPage } from './report-page';

const TOKEN = 'Ny4xLjE4OTM0NTYwMDA' + 'abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQ';

// Invented report data (company, plant, people, press, band values), built by the shared record builder.
const REPORT = buildVisitRecord(recordSource({ timeZone: 'UTC' }));

function renderReport() {
  const router = createMemoryRouter([{ path: '/report/:token', Component: ReportPage }], { initialEntries: [`/report/${TOKEN}`] });
  const user = userEvent.setup();
  render(
    <AppProvider queryClient={createAppQueryClient()}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { user };
}

describe('the customer report page', () => {
  it('shows the report read-only, offers the PDF, and records the acknowledgement with the name given', async () => {
    const api = mockApi({
      [`GET /api/report/${TOKEN}`]: { status: 200, body: REPORT },
      [`POST /api/report/${TOKEN}/acknowledge`]: { status: 200, body: { acknowledgement: { at: '2026-12-03T09:30:00Z', by: 'Ines Varga (invented)' } } },
    });
    const { user } = renderReport();

    // The record model's key facts, as the page shows them (dates in the record's zone, minutes as h:mm).
    expect(await screen.findByRole('heading', { level: 1, name: 'Service report V-000042' })).toBeInTheDocument();
    expect(screen.getByText('Harlow Stamping Works (invented)')).toBeInTheDocument();
    expect(screen.getByText('V-000042 · started 2 Dec 2026, 08:00 UTC · closed 2 Dec 2026, 09:35 UTC')).toBeInTheDocument();
    const rotor = screen.getAllByRole('row', { name: /Rotor R1–R2/ })[0]!;
    expect(within(rotor).getByText('Open circuit')).toBeInTheDocument();
    expect(within(rotor).getByText('120 Ω ± 8 % at 20 °C (near edge ± 15 %)')).toBeInTheDocument();
    expect(screen.getByText('1:35')).toBeInTheDocument();
    // The as-left state is the line right under the title, and the record below does not repeat it as a banner.
    const title = screen.getByRole('heading', { level: 1 });
    expect(title.nextElementSibling).toHaveTextContent(/^Press returned to production$/);
    expect(screen.getAllByText('Press returned to production')).toHaveLength(1);
    expect(screen.getByText('Press returned to production.')).toBeInTheDocument();
    expect(screen.getByRole('table', { name: 'Parts used' })).toHaveTextContent('DEMO-RS-100');
    expect(screen.getAllByRole('region', { name: 'DANGER safety notice' })[0]).toHaveTextContent('lock out and tag out');
    expect(screen.getByRole('link', { name: 'Download PDF' })).toHaveAttribute('href', `/api/report/${TOKEN}/pdf`);
    expect(screen.queryByRole('button', { name: /edit|delete/i })).not.toBeInTheDocument();

    const name = screen.getByLabelText('Your name (optional)');
    expect(name).toHaveValue('Ines Varga (invented)');
    await user.click(screen.getByRole('button', { name: 'Acknowledge receipt' }));

    expect(await screen.findByText(/Acknowledged on .+ by Ines Varga \(invented\)\./)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Acknowledge receipt' })).not.toBeInTheDocument();
    expect(api.callsTo('POST', `/api/report/${TOKEN}/acknowledge`)[0]!.body).toEqual({ name: 'Ines Varga (invented)' });
  });

  it('says first that the press was left locked out, with what it waits for and why', async () => {
    const src = recordSource({ timeZone: 'UTC' });
    const locked = buildVisitRecord({
      ...src,
      visit: { ...src.visit, asLeftState: 'locked_out', returnToService: null, lockedOut: { reason: 'Excitation missing at the board (invented).', waitsFor: 'board' } },
    });
    mockApi({ [`GET /api/report/${TOKEN}`]: { status: 200, body: locked } });
    renderReport();
    const title = await screen.findByRole('heading', { level: 1, name: 'Service report V-000042' });
    expect(title.nextElementSibling).toHaveTextContent(
      'Press left locked out: not fit for production until the processor board is repaired or replacedReason: Excitation missing at the board (invented).',
    );
    expect(screen.queryByText(/The fault has cleared on the control/)).not.toBeInTheDocument();
  });

  it('acknowledges without a name when the field is cleared', async () => {
    const api = mockApi({
      [`GET /api/report/${TOKEN}`]: { status: 200, body: REPORT },
      [`POST /api/report/${TOKEN}/acknowledge`]: { status: 200, body: { acknowledgement: { at: '2026-12-03T09:30:00Z', by: null } } },
    });
    const { user } = renderReport();
    await user.clear(await screen.findByLabelText('Your name (optional)'));
    await user.click(screen.getByRole('button', { name: 'Acknowledge receipt' }));
    expect(await screen.findByText(/^Acknowledged on [^]+\.$/)).toBeInTheDocument();
    expect(api.callsTo('POST', `/api/report/${TOKEN}/acknowledge`)[0]!.body).toEqual({});
  });

  it('keeps the button and says what to do when the acknowledgement cannot be recorded', async () => {
    mockApi({
      [`GET /api/report/${TOKEN}`]: { status: 200, body: REPORT },
      [`POST /api/report/${TOKEN}/acknowledge`]: apiError(503, 'unavailable', 'The service is busy. Try again in a minute.'),
    });
    const { user } = renderReport();
    await user.click(await screen.findByRole('button', { name: 'Acknowledge receipt' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('The service is busy. Try again in a minute. Press the button again to retry.');
    expect(screen.getByRole('button', { name: 'Acknowledge receipt' })).toBeEnabled();
  });

  it('shows the clear refusal for an expired or altered link, and nothing of any report', async () => {
    const message = 'This report link has expired or is not valid. Ask Ridgeline Press Service (invented demo company) to send it again.';
    mockApi({ [`GET /api/report/${TOKEN}`]: apiError(404, 'report_link_invalid', message) });
    renderReport();
    expect(await screen.findByRole('heading', { name: 'Report not available' })).toBeInTheDocument();
    expect(screen.getByRole('alert')).toHaveTextContent(message);
    expect(screen.queryByRole('button', { name: 'Acknowledge receipt' })).not.toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Download PDF' })).not.toBeInTheDocument();
  });
});
