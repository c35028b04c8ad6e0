import { screen, within } from '@testing-library/react';
import type { ReadingRecord, VisitDetail } from '@shared/schemas/visit-detail';
import { technician } from '@/testing/fixtures';
import { renderApp } from '@/testing/render-app';
import { mockApi, type RecordedCall } from '@/testing/mock-api';
import { readingRecord, UP_TO_RESISTANCE, visitDetail } from '@/features/visits/testing/visit-fixtures';

afterEach(() => {
  vi.unstubAllGlobals();
});

// The invented test band set: rotor nominal 90 Ω, in band ±8 %, near edge ±15 %, at 20 °C.
function measureApi(visit: VisitDetail, onReading?: (call: RecordedCall) => { status: number; body?: unknown }) {
  return mockApi({
    'GET /api/session': { status: 200, body: { user: technician } },
    'GET /api/visits/42': { status: 200, body: visit },
    'GET /api/visits/42/attachments': { status: 200, body: { items: [] } },
    ...(onReading ? { 'POST /api/visits/42/readings': onReading } : {}),
  });
}

async function openRotorField() {
  const view = renderApp('/visits/42');
  const field = await screen.findByRole('textbox', { name: /Rotor R1–R2/ });
  return { ...view, field, row: field.closest('div.rounded-lg') as HTMLElement };
}

describe('Reading input with instant verdict and band gauge', () => {
  it('judges 89.3 as the technician types and places it on the gauge', async () => {
    measureApi(visitDetail({ answers: UP_TO_RESISTANCE }));
    const { user, field, row } = await openRotorField();
    expect(field).toHaveAttribute('inputmode', 'decimal');

    await user.type(field, '89.3');

    expect(within(row).getByText('In band')).toBeInTheDocument();
    expect(within(row).getByText(/0\.78 % below nominal 90 Ω/)).toBeInTheDocument();
    const gauge = within(row).getByRole('img', { name: /^Band gauge: reading 89\.3 Ω at reference temperature/ });
    expect(gauge).toHaveAccessibleName(expect.stringContaining('in band 82.8 Ω to 97.2 Ω'));
    expect(within(gauge).getByTestId('gauge-marker')).toHaveTextContent('89.3 Ω');
    expect(within(row).getByText(/Not saved yet/)).toBeInTheDocument();
  });

  it('understands 0.0893k as 89.3 Ω', async () => {
    measureApi(visitDetail({ answers: UP_TO_RESISTANCE }));
    const { user, field, row } = await openRotorField();

    await user.type(field, '0.0893k');

    expect(within(row).getByText('In band')).toBeInTheDocument();
    expect(within(row).getByRole('img', { name: /reading 89\.3 Ω/ })).toBeInTheDocument();
  });

  it('reads OL as an open circuit', async () => {
    measureApi(visitDetail({ answers: UP_TO_RESISTANCE }));
    const { user, field, row } = await openRotorField();

    await user.type(field, 'OL');

    expect(within(row).getByText('Open circuit')).toBeInTheDocument();
    expect(within(row).getByText('The meter shows OL: the circuit is open.')).toBeInTheDocument();
  });

  it('says what is wrong when a voltage is typed into a resistance field, beside the field', async () => {
    const api = measureApi(visitDetail({ answers: UP_TO_RESISTANCE }));
    const { user, field } = await openRotorField();

    await user.type(field, '4.2 V{Enter}');

    expect(screen.getByRole('alert')).toHaveTextContent('That is a voltage; this field takes a resistance in Ω, kΩ or MΩ.');
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(field).toHaveAccessibleDescription(expect.stringContaining('That is a voltage'));
    expect(api.callsTo('POST', '/api/visits/42/readings')).toHaveLength(0);
  });

  it("shows the server's stored verdict after saving, even where it differs from the tablet's", async () => {
    const api = measureApi(visitDetail({ answers: UP_TO_RESISTANCE }), (call) => {
      const body = call.body as { id: string; entered: string };
      const reading: ReadingRecord = readingRecord({ id: body.id, entered: body.entered, verdict: 'near_edge', reason: 'Judged near the edge by the server (invented).' });
      return { status: 200, body: { reading, visit: visitDetail({ answers: UP_TO_RESISTANCE, readings: [reading] }) } };
    });
    const { user, field, row } = await openRotorField();

    await user.type(field, '89.3');
    expect(within(row).getByText('In band')).toBeInTheDocument();
    await user.tab();

    expect(await within(row).findByText('Judged near the edge by the server (invented).')).toBeInTheDocument();
    expect(within(row).getByText('Saved.')).toBeInTheDocument();
    expect(within(row).getByText('Near edge')).toBeInTheDocument();
    expect(within(row).queryByText('In band')).not.toBeInTheDocument();
    expect(within(row).getByText(/the saved verdict above is the one that counts/)).toBeInTheDocument();
    expect(api.callsTo('POST', '/api/visits/42/readings')[0]?.body).toEqual({
      id: expect.stringMatching(/^[0-9a-f-]{36}$/),
      replaces: null,
      stepId: 'resistance-control-end',
      quantity: 'resistance',
      circuit: 'rotor',
      position: 'control_end',
      entered: '89.3',
    });
  });

  it('subtracts the cable when its gauge and length are given, and says by how much', async () => {
    measureApi(visitDetail({ answers: UP_TO_RESISTANCE }));
    const { user, field, row } = await openRotorField();

    await user.click(screen.getByText('Temperature / cable'));
    await user.type(screen.getByRole('textbox', { name: 'Cable conductor size (AWG)' }), '22');
    await user.type(screen.getByRole('textbox', { name: 'Cable length' }), '50');
    await user.type(field, '91');

    // AWG 22 solid copper is about 16.1 Ω per 1000 ft at 20 °C (standard AWG wire tables, e.g. NIST Copper Wire
    // Tables, Handbook 100); 50 ft one way is a 100 ft loop, so about 1.61 Ω.
    expect(within(row).getByText(/Cable loop of 100 ft adds 1\.6\d* Ω; subtracted\./)).toBeInTheDocument();
    expect(within(row).getByRole('img', { name: /reading 89\.3\d* Ω/ })).toBeInTheDocument();
  });
});
