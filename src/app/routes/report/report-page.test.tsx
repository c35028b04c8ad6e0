import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { render } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { createAppQueryClient } from '@/app/create-app-query-client';
import { AppProvider } from '@/app/provider';
import type { ReportView } from '@shared/schemas/report-view';
import { apiError, mockApi } from '@/testing/mock-api';
import { ReportPage } from './report-page';

const TOKEN = 'Ny4xLjE4OTM0NTYwMDA' + 'abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQ';

// Invented report data: company, plant, person, press and band values are all made up.
const REPORT: ReportView = {
  companyName: 'Ridgeline Press Service (invented demo company)',
  reference: 'V-000007',
  status: 'closed',
  issue: { number: 1, corrected: false, issuedAt: '2026-12-02T10:00:00Z', expiresAt: '2027-01-01T10:00:00Z' },
  acknowledgement: null,
  customer: { name: 'Harlow Stamping Works (invented)' },
  site: { name: 'Main plant (invented)', address: '400 Foundry Road (invented)', city: null },
  press: { assetTag: 'HS-P07', model: 'SR-250 straight-side (invented model)', tonnage: 250, controlModel: null, sensorGeneration: 'demo-gen-1' },
  technician: 'Dana Field (invented)',
  startedAt: '2026-12-02T08:00:00Z',
  closedAt: '2026-12-02T10:00:00Z',
  faultDisplayed: 'Crank angle sensor fault 31',
  procedure: { title: 'Crank-angle sensor circuit fault', version: 1 },
  bandSet: { label: 'Demo generation 1 (invented)', version: 1, referenceTemperatureC: 20, invented: true },
  path: [{ stepId: 'press-at-rest', title: 'Bring the press to rest', kind: 'safety_gate', answer: 'Press at rest', confirmations: ['The flywheel has stopped turning.'], confirmedAt: '2026-12-02T08:05:00Z', details: [], note: null }],
  finding: { title: 'Crank-angle sensor faulty', conclusion: 'A winding reads open at the sensor.', recommendedAction: 'Replace the sensor.', escalate: false },
  readings: [
    { id: 'r1', stepTitle: 'Winding resistance at the sensor end', circuit: 'Rotor R1–R2', quantity: 'resistance', position: 'Sensor end', entered: 'OL', band: '88 Ω ± 8 % at 20 °C (near edge ± 15 %)', verdict: 'open', verdictLabel: 'Open circuit', reason: 'The meter shows OL: the circuit is open.', temperature: null, cable: null },
  ],
  replacedReadings: 0,
  firmware: { controlFound: '3.4', controlLeft: '3.4', monitorFound: '1.9', monitorLeft: '1.9' },
  photos: [],
  cause: { category: 'sensor', label: 'Sensor' },
  actionsTaken: 'Replaced the sensor.',
  recommendations: null,
  parts: [],
  labourMinutes: 95,
  travelMinutes: 40,
  returnToService: { checks: ['The fault has cleared on the control.'], stoppingTimeMs: 180 },
  safety: [{ signalWord: 'DANGER', text: 'Hazardous voltage and stored energy.', appliedAt: ['Lock out the press'] }],
  signature: { contactName: 'Pat Plant (invented)', signedAt: '2026-12-02T10:00:00Z', attachmentId: null },
};

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
      [`POST /api/report/${TOKEN}/acknowledge`]: { status: 200, body: { acknowledgement: { at: '2026-12-03T09:30:00Z', by: 'Pat Plant (invented)' } } },
    });
    const { user } = renderReport();

    expect(await screen.findByRole('heading', { level: 1, name: 'Service report V-000007' })).toBeInTheDocument();
    expect(screen.getByText('Harlow Stamping Works (invented)')).toBeInTheDocument();
    const rotor = screen.getByRole('row', { name: /Rotor R1–R2/ });
    expect(within(rotor).getByText('Open circuit')).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'DANGER safety notice' })).toHaveTextContent('Hazardous voltage and stored energy.');
    expect(screen.getByRole('link', { name: 'Download PDF' })).toHaveAttribute('href', `/api/report/${TOKEN}/pdf`);
    expect(screen.queryByRole('button', { name: /edit|delete/i })).not.toBeInTheDocument();

    const name = screen.getByLabelText('Your name (optional)');
    expect(name).toHaveValue('Pat Plant (invented)');
    await user.click(screen.getByRole('button', { name: 'Acknowledge receipt' }));

    expect(await screen.findByText(/Acknowledged on .+ by Pat Plant \(invented\)\./)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Acknowledge receipt' })).not.toBeInTheDocument();
    expect(api.callsTo('POST', `/api/report/${TOKEN}/acknowledge`)[0]!.body).toEqual({ name: 'Pat Plant (invented)' });
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
