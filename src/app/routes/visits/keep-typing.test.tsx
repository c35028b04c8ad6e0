import { screen, waitFor, within } from '@testing-library/react';
import type { ReadingRecord } from '@shared/schemas/visit-detail';
import { technician } from '@/testing/fixtures';
import { renderApp } from '@/testing/render-app';
import { apiError, mockApi, type RecordedCall } from '@/testing/mock-api';
import { readingRecord, UP_TO_RESISTANCE, visitDetail } from '@/features/visits/testing/visit-fixtures';

afterEach(() => {
  vi.unstubAllGlobals();
});

const signedOut = apiError(401, 'not_signed_in', 'You are not signed in, or your session has ended. Sign in and try again.');
const DRAFTS = 'crankwise:draft:1:42:readings';

function savedReply(call: RecordedCall) {
  const body = call.body as { id: string; entered: string };
  const reading: ReadingRecord = readingRecord({ id: body.id, entered: body.entered });
  return { status: 200, body: { reading, visit: visitDetail({ answers: UP_TO_RESISTANCE, readings: [reading] }) } };
}

describe('Readings typed and not saved yet', () => {
  it('are kept on the device, restored with a notice after the page is left, and forgotten once saved', async () => {
    const api = mockApi({
      'GET /api/session': { status: 200, body: { user: technician } },
      'GET /api/visits/42': { status: 200, body: visitDetail({ answers: UP_TO_RESISTANCE }) },
      'GET /api/visits/42/attachments': { status: 200, body: { items: [] } },
      'POST /api/visits/42/readings': savedReply,
    });
    const first = renderApp('/visits/42');
    await first.user.type(await screen.findByRole('textbox', { name: /Rotor R1–R2/ }), '91.5');
    expect(JSON.parse(localStorage.getItem(DRAFTS)!).value).toEqual({ 'resistance-control-end:rotor-control_end': '91.5' });
    first.unmount();

    const { user } = renderApp('/visits/42');
    const field = await screen.findByRole('textbox', { name: /Rotor R1–R2/ });
    expect(field).toHaveValue('91.5');
    expect(screen.getByText(/^Restored readings you typed on /)).toBeInTheDocument();
    expect(api.callsTo('POST', '/api/visits/42/readings')).toHaveLength(0);

    await user.click(field);
    await user.keyboard('{Enter}');
    expect(await screen.findByText('Saved.')).toBeInTheDocument();
    await waitFor(() => expect(localStorage.getItem(DRAFTS)).toBeNull());
  });
});

describe('A session that ends while the technician works', () => {
  it('asks for the password over the page, keeps the page, and then sends the waiting reading with the same id', async () => {
    let posts = 0;
    const api = mockApi({
      'GET /api/session': { status: 200, body: { user: technician } },
      'GET /api/visits/42': { status: 200, body: visitDetail({ answers: UP_TO_RESISTANCE }) },
      'GET /api/visits/42/attachments': { status: 200, body: { items: [] } },
      'POST /api/visits/42/readings': (call) => (++posts === 1 ? signedOut : savedReply(call)),
      'POST /api/session': { status: 200, body: { user: technician } },
    });
    const { user, router } = renderApp('/visits/42');
    await user.type(await screen.findByRole('textbox', { name: /Rotor R1–R2/ }), '91.5{Enter}');

    const dialog = await screen.findByRole('dialog', { name: 'Sign in again to keep working' });
    expect(router.state.location.pathname).toBe('/visits/42');
    expect(dialog).toHaveTextContent(technician.email);
    // Nothing typed is lost underneath.
    expect(screen.getByRole('textbox', { name: /Rotor R1–R2/ })).toHaveValue('91.5');

    await user.click(within(dialog).getByRole('button', { name: 'Sign in and continue' }));
    expect(within(dialog).getByText('Type your password.')).toBeInTheDocument();
    await user.type(within(dialog).getByLabelText('Password'), 'correct horse');
    await user.click(within(dialog).getByRole('button', { name: 'Sign in and continue' }));

    expect(await screen.findByText('Saved.')).toBeInTheDocument();
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(api.callsTo('POST', '/api/session')[0]?.body).toEqual({ email: technician.email, password: 'correct horse' });
    const [refused, sent] = api.callsTo('POST', '/api/visits/42/readings');
    expect(sent?.body).toEqual(refused?.body);
    expect(router.state.location.pathname).toBe('/visits/42');
  });

  it('says so when the password is wrong, and stays over the page', async () => {
    mockApi({
      'GET /api/session': { status: 200, body: { user: technician } },
      'GET /api/visits/42': { status: 200, body: visitDetail({ answers: UP_TO_RESISTANCE }) },
      'GET /api/visits/42/attachments': { status: 200, body: { items: [] } },
      'POST /api/visits/42/readings': signedOut,
      'POST /api/session': apiError(401, 'bad_credentials', 'E-mail or password is not right.'),
    });
    const { user } = renderApp('/visits/42');
    await user.type(await screen.findByRole('textbox', { name: /Rotor R1–R2/ }), '91.5{Enter}');
    const dialog = await screen.findByRole('dialog', { name: 'Sign in again to keep working' });
    await user.type(within(dialog).getByLabelText('Password'), 'wrong');
    await user.click(within(dialog).getByRole('button', { name: 'Sign in and continue' }));

    expect(await within(dialog).findByText('That password is not right. Type it again.')).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: /Rotor R1–R2/ })).toHaveValue('91.5');
  });
});
