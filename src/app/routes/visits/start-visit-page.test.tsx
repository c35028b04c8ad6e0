import { screen, waitFor, within } from '@testing-library/react';
import { pageOf, press, technician } from '@/testing/fixtures';
import { renderApp } from '@/testing/render-app';
import { apiError, mockApi, type RecordedCall } from '@/testing/mock-api';
import { visitDetail } from '@/features/visits/testing/visit-fixtures';

afterEach(() => {
  vi.unstubAllGlobals();
});

const px101 = press();
const px204 = press({ id: 2, assetTag: 'PX-204', controlFirmware: '2.9', monitorFirmware: null });

function startApi(createReply: { status: number; body?: unknown } = { status: 201, body: visitDetail() }) {
  return mockApi({
    'GET /api/session': { status: 200, body: { user: technician } },
    'GET /api/presses': (call: RecordedCall) => {
      const q = (call.query.get('q') ?? '').toLowerCase();
      return { status: 200, body: pageOf([px101, px204].filter((p) => p.assetTag.toLowerCase().includes(q))) };
    },
    'GET /api/presses/1': { status: 200, body: px101 },
    'POST /api/visits': createReply,
    'GET /api/visits/42': { status: 200, body: visitDetail() },
    'GET /api/visits/42/attachments': { status: 200, body: { items: [] } },
  });
}

describe('Start a visit', () => {
  it('finds the press by asset tag, pre-fills its firmware, and posts the press, the fault and the versions', async () => {
    const api = startApi();
    const { user, router } = renderApp('/visits/new');

    await user.type(await screen.findByRole('searchbox', { name: 'Asset tag' }), 'px-2');
    const found = await screen.findByRole('list', { name: 'Presses found by asset tag' });
    await user.click(within(found).getByRole('button', { name: /PX-204/ }));

    expect(screen.getByRole('textbox', { name: 'Press control firmware' })).toHaveValue('2.9');
    expect(screen.getByRole('textbox', { name: 'Monitor module firmware' })).toHaveValue('');
    await user.type(screen.getByRole('textbox', { name: 'Monitor module firmware' }), '3.0');
    await user.type(screen.getByRole('textbox', { name: /Fault as displayed/ }), 'E-217 crank angle signal lost');
    expect(screen.getByRole('radio', { name: /Crank-angle sensor circuit fault/ })).toBeChecked();
    expect(screen.getByText('Suggested because the fault mentions “crank”.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Start the visit' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/visits/42'));
    expect(api.callsTo('POST', '/api/visits')[0]?.body).toEqual({
      pressId: 2,
      faultDisplayed: 'E-217 crank angle signal lost',
      controlFirmwareFound: '2.9',
      monitorFirmwareFound: '3.0',
      procedureKey: 'crank-angle-sensor-circuit',
    });
    expect(await screen.findByRole('heading', { level: 2, name: 'Bring the press to rest' })).toBeInTheDocument();
  });

  it('puts what needs fixing beside each field, and sends nothing until it is fixed', async () => {
    const api = startApi();
    const { user } = renderApp('/visits/new');

    await user.click(await screen.findByRole('button', { name: 'Start the visit' }));

    expect(await screen.findByText('Pick the press you are working on')).toBeInTheDocument();
    const fault = screen.getByRole('textbox', { name: /Fault as displayed/ });
    expect(fault).toHaveAttribute('aria-invalid', 'true');
    expect(fault).toHaveAccessibleDescription(expect.stringContaining('Type the fault exactly as the control displays it'));
    expect(api.callsTo('POST', '/api/visits')).toHaveLength(0);
  });

  it("shows the server's field message beside the field it names", async () => {
    const message = 'Keep the fault text to what the display shows (invented server message).';
    startApi(apiError(400, 'invalid_input', 'Some fields need attention.', { faultDisplayed: message }));
    const { user } = renderApp('/visits/new?pressId=1');

    expect(await screen.findByText('PX-101')).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'Press control firmware' })).toHaveValue('2.10');
    const fault = screen.getByRole('textbox', { name: /Fault as displayed/ });
    await user.type(fault, 'E-217');
    await user.click(screen.getByRole('button', { name: 'Start the visit' }));

    expect(await screen.findByText(message)).toBeInTheDocument();
    expect(fault).toHaveAccessibleDescription(expect.stringContaining(message));
    expect(screen.getByText('The visit has not started').closest('[role="alert"]')).toHaveTextContent('Some fields need attention.');
  });
});
