import { configure, render, screen, waitFor, within } from '@testing-library/react';
import userEvent, { type UserEvent } from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider, useParams } from 'react-router-dom';
import { closeOutSchema } from '@shared/schemas/visit';
import { createAppQueryClient } from '@/app/create-app-query-client';
import { AppProvider } from '@/app/provider';
import { visitAtFinding } from '@/testing/close-out-fixtures';
import { customer, technician } from '@/testing/fixtures';
import { apiError, mockApi, type RecordedCall } from '@/testing/mock-api';
import { CloseOutPage } from './close-out-page';

// jsdom has no canvas (getContext and toDataURL are "not implemented"). They are replaced with a
// do-nothing 2D context and a fixed, real 1×1 PNG data URL, so these tests check what the page
// does with a signature, not the pixels a browser would draw.
const PNG = 'data:image/png;base64,iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==';

beforeEach(() => {
  const ctx = { fillRect: vi.fn(), beginPath: vi.fn(), moveTo: vi.fn(), lineTo: vi.fn(), stroke: vi.fn(), drawImage: vi.fn() };
  vi.spyOn(HTMLCanvasElement.prototype, 'getContext').mockReturnValue(ctx as unknown as CanvasRenderingContext2D);
  vi.spyOn(HTMLCanvasElement.prototype, 'toDataURL').mockReturnValue(PNG);
});

// Screens here wait on mocked requests; a busy two-core machine can take over a second.
configure({ asyncUtilTimeout: 5000 });

afterEach(() => {
  vi.restoreAllMocks();
  vi.unstubAllGlobals();
});

function WorkspaceStub() {
  return <h1>Visit workspace {useParams().id}</h1>;
}

function renderCloseOut(url = '/visits/7/close') {
  const router = createMemoryRouter(
    [
      { path: '/visits/:id/close', element: <CloseOutPage /> },
      { path: '/visits/:id', element: <WorkspaceStub /> },
    ],
    { initialEntries: [url] },
  );
  const user = userEvent.setup();
  const { unmount } = render(
    <AppProvider queryClient={createAppQueryClient()}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { user, router, unmount };
}

type Handler = (call: RecordedCall) => { status: number; body?: unknown };

function closeOutApi(close: Handler | { status: number; body?: unknown } = { status: 200, body: visitAtFinding({ status: 'closed' }) }, visit = visitAtFinding()) {
  return mockApi({
    'GET /api/session': { status: 200, body: { user: technician } },
    'GET /api/visits/7': { status: 200, body: visit },
    'GET /api/customers/100': { status: 200, body: customer() },
    'GET /api/visits/7/attachments': { status: 200, body: { items: [] } },
    'POST /api/visits/7/close': close,
  });
}

/** The form shows once the visit and the customer's contact are in. */
const formReady = () => screen.findByRole('button', { name: 'Close the visit' });

async function sign(user: UserEvent) {
  const pad = screen.getByLabelText('Customer signature');
  await user.pointer([
    { keys: '[TouchA>]', target: pad, coords: { clientX: 20, clientY: 40 } },
    { pointerName: 'TouchA', target: pad, coords: { clientX: 120, clientY: 70 } },
    { keys: '[/TouchA]', target: pad },
  ]);
}

/** Fills every required answer the way a technician would, plus one part. */
async function fillCloseOut(user: UserEvent) {
  // Long text is pasted, as a technician's tablet keyboard would dictate it; typing it key by key only slows the test.
  await user.click(screen.getByRole('textbox', { name: 'Actions taken' }));
  await user.paste('Straightened pin 3, re-seated the connector, coupling ring hand-tight.');
  await user.click(screen.getByRole('button', { name: /Add a part/ }));
  await user.type(screen.getByRole('textbox', { name: 'Part number' }), 'INV-CX-0042');
  await user.click(screen.getByRole('textbox', { name: 'Description' }));
  await user.paste('Circular connector insert (invented)');
  await user.type(screen.getByRole('textbox', { name: 'Serial fitted (optional)' }), 'SN-INV-77');
  await user.type(screen.getByRole('textbox', { name: 'Labour minutes' }), '95');
  await user.type(screen.getByRole('textbox', { name: 'Travel minutes' }), '40');
  await tickReturnToService(user);
  await user.type(screen.getByRole('textbox', { name: /Measured stopping time/ }), '180');
  await user.click(screen.getByRole('radio', { name: 'At or beyond its safety distance' }));
  await user.click(screen.getByRole('radio', { name: 'Neither fitted' }));
  await sign(user);
}

const RETURN_TO_SERVICE_BOXES = [/fault has cleared/, /top dead centre/, /guard, cover and enclosure door/, /tool and die safety block/, /Everyone was clear/, /single stroke/, /stopping time, measured at about 90°/];

async function tickReturnToService(user: UserEvent) {
  for (const name of RETURN_TO_SERVICE_BOXES) await user.click(screen.getByRole('checkbox', { name }));
}

// Filling a whole form by key and tap takes a few seconds on a busy two-core machine.
describe('Close-out page', { timeout: 20_000 }, () => {
  it('shows the visit, the finding reached, and preselects the suggested cause with its reasons', async () => {
    closeOutApi();
    renderCloseOut();

    expect(await screen.findByRole('heading', { name: 'Close out V-000007' })).toBeInTheDocument();
    expect(screen.getByText('PX-101 · Invented SP-250')).toBeInTheDocument();
    expect(screen.getByText('Example Stampings (invented) · Plant North (invented)')).toBeInTheDocument();
    expect(screen.getByText('E-417 crank angle invalid (invented)')).toBeInTheDocument();

    const suggested = await screen.findByRole('radio', { name: /Wiring or connector/ });
    expect(screen.getByText('Finding reached:').parentElement).toHaveTextContent('Finding reached: Circular connector loose or damaged');
    expect(suggested).toBeChecked();
    expect(suggested).toHaveAccessibleName('Wiring or connector Suggested');
    expect(suggested).toHaveAccessibleDescription(/Finding reached: Circular connector loose or damaged\./);
    expect(screen.getByRole('radio', { name: 'Sensor' })).not.toBeChecked();
    // The technician decides.
    expect(screen.getByRole('radio', { name: 'Sensor' })).toBeEnabled();
  });

  it("pre-fills the customer's contact and the firmware as found", async () => {
    closeOutApi();
    renderCloseOut();

    expect(await screen.findByRole('textbox', { name: 'Contact name' })).toHaveValue('Pat Placeholder');
    expect(screen.getByRole('textbox', { name: 'Contact e-mail' })).toHaveValue('pat@example.test');
    expect(screen.getByRole('textbox', { name: 'Press-control firmware as left' })).toHaveValue('2.10');
    expect(screen.getByRole('textbox', { name: 'Monitor-module firmware as left' })).toHaveValue('3.1.4');
  });

  it('shows what is missing beside each field and sends nothing', async () => {
    const api = closeOutApi();
    const { user } = renderCloseOut();
    await formReady();

    await user.click(screen.getByRole('button', { name: 'Close the visit' }));

    const faultCleared = screen.getByRole('checkbox', { name: /fault has cleared/ });
    await waitFor(() => expect(faultCleared).toHaveAttribute('aria-invalid', 'true'));
    expect(faultCleared).toHaveAccessibleDescription('Confirm the fault has cleared on the control');
    expect(screen.getByRole('checkbox', { name: /top dead centre/ })).toHaveAccessibleDescription(
      'Confirm the crank-angle display reads top dead centre with the slide at top',
    );
    expect(screen.getByRole('textbox', { name: 'Actions taken' })).toHaveAccessibleDescription(/Describe what you did/);
    expect(screen.getByRole('textbox', { name: 'Labour minutes' })).toHaveAccessibleDescription(/Enter the labour time in whole minutes/);
    expect(screen.getByLabelText('Customer signature')).toHaveAccessibleDescription(/Ask the customer to sign in the box/);
    expect(screen.getByRole('group', { name: 'Presence-sensing device distance' })).toHaveAccessibleDescription(
      /Say whether the presence-sensing device still sits at a safe distance/,
    );
    expect(screen.getByText('Some answers need attention')).toBeInTheDocument();
    expect(api.callsTo('POST', '/api/visits/7/close')).toHaveLength(0);
  });

  it('shows the minimum safety distance for a typed stopping time, naming the standard', async () => {
    closeOutApi();
    const { user } = renderCloseOut();
    await formReady();

    await user.type(screen.getByRole('textbox', { name: /Measured stopping time/ }), '500');

    // OSHA 29 CFR 1910.217(c)(3)(iii)(e): Ds = 63 in/s × Ts; for Ts = 0.5 s, 63 × 0.5 = 31.5 in,
    // and 31.5 in × 25.4 mm/in = 800.1 mm (worked by hand).
    expect(screen.getByText(/Presence-sensing device: minimum safety distance/)).toHaveTextContent('31.5 in (800.1 mm)');
    expect(screen.getByText(/OSHA 29 CFR 1910\.217\(c\)\(3\)\(iii\)\(e\): Ds = 63 in\/s × 0\.5 s/)).toBeInTheDocument();
    // The time asked for is the 90° downstroke stop, not the brake monitor's top stop.
    expect(screen.getByRole('textbox', { name: /Measured stopping time/ })).toHaveAccessibleDescription(/stop-time measuring device at about 90° on the downstroke.*Not the brake monitor’s top-stop reading/);
    expect(screen.getByRole('region', { name: 'WARNING safety notice' })).toHaveTextContent(/lockout\/tagout procedure, local electrical codes and licensed practice/);
  });

  it('posts a close-out the shared schema accepts, with the part and the signature, then opens the closed visit', async () => {
    const api = closeOutApi();
    const { user, router } = renderCloseOut();
    await formReady();

    await fillCloseOut(user);
    expect(screen.getByText('= 1:35 (hours:minutes)')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Close the visit' }));

    expect(await screen.findByRole('heading', { name: 'Visit workspace 7' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/visits/7');
    const [post] = api.callsTo('POST', '/api/visits/7/close');
    const parsed = closeOutSchema.safeParse(post!.body);
    expect(parsed.success).toBe(true);
    expect(post!.body).toMatchObject({
      causeCategory: 'wiring',
      labourMinutes: 95,
      travelMinutes: 40,
      controlFirmwareLeft: '2.10',
      contactName: 'Pat Placeholder',
      contactEmail: 'pat@example.test',
      signaturePng: PNG,
      asLeft: 'returned_to_production',
      returnToService: {
        faultCleared: true,
        tdcAgrees: true,
        guardsRefitted: true,
        toolsRemoved: true,
        everyoneClear: true,
        singleStroke: true,
        stoppingTimeChecked: true,
        stoppingTimeMs: 180,
        presenceSensingDistanceOk: 'yes',
        twoHandDevice: 'not_fitted',
      },
      parts: [{ partNumber: 'INV-CX-0042', description: 'Circular connector insert (invented)', quantity: 1, serialFitted: 'SN-INV-77' }],
    });
    const body = post!.body as { parts: Array<{ id: string; serialRemoved?: string }> };
    expect(body.parts[0]!.id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    expect(body.parts[0]).not.toHaveProperty('serialRemoved');
  });

  it('closes with the press left locked out: no return-to-service checks, the reason and what it waits for instead', async () => {
    const api = closeOutApi();
    const { user } = renderCloseOut();
    await formReady();
    expect(screen.getByRole('radio', { name: /Returned to production/ })).toBeChecked();

    await user.click(screen.getByRole('radio', { name: /Left locked out, tagged not fit for production/ }));
    expect(screen.queryByRole('checkbox', { name: /fault has cleared/ })).not.toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Left locked out' })).toBeInTheDocument();
    expect(screen.getAllByRole('region', { name: 'WARNING safety notice' })[0]).toHaveTextContent(/re-apply your lock and tag/);

    await user.click(screen.getByRole('button', { name: 'Close the visit' }));
    const reason = screen.getByRole('textbox', { name: 'Why the press cannot go back to production' });
    await waitFor(() => expect(reason).toHaveAttribute('aria-invalid', 'true'));
    expect(screen.getByRole('group', { name: 'It waits for' })).toHaveAccessibleDescription(/Say what the press waits for/);
    expect(api.callsTo('POST', '/api/visits/7/close')).toHaveLength(0);

    await user.click(reason);
    await user.paste('Connector insert cracked; no spare on site.');
    await user.click(screen.getByRole('radio', { name: 'Something else' }));
    await user.type(screen.getByRole('textbox', { name: 'What it waits for' }), 'a new connector insert is fitted');
    await user.click(screen.getByRole('textbox', { name: 'Actions taken' }));
    await user.paste('Found the insert cracked; left the press locked out and tagged.');
    await user.type(screen.getByRole('textbox', { name: 'Labour minutes' }), '45');
    await user.type(screen.getByRole('textbox', { name: 'Travel minutes' }), '0');
    await sign(user);
    await user.click(screen.getByRole('button', { name: 'Close the visit' }));

    expect(await screen.findByRole('heading', { name: 'Visit workspace 7' })).toBeInTheDocument();
    const [post] = api.callsTo('POST', '/api/visits/7/close');
    expect(closeOutSchema.safeParse(post!.body).success).toBe(true);
    expect(post!.body).toMatchObject({
      asLeft: 'locked_out',
      lockedOut: { reason: 'Connector insert cracked; no spare on site.', waitsFor: 'other', waitsForDetail: 'a new connector insert is fitted' },
    });
    // What the schema keeps: the locked-out branch only.
    const parsed = closeOutSchema.parse(post!.body);
    expect(parsed).not.toHaveProperty('returnToService');
  });

  it('starts an escalated board finding as left locked out, waiting for the board', async () => {
    const base = visitAtFinding();
    closeOutApi(undefined, visitAtFinding({
      traversal: { ...base.traversal, findingIds: ['finding-board'] },
      likelyCauses: { ranked: [{ cause: 'board', score: 3, reasons: ['Excitation out of range (invented).'] }], ruledOut: [] },
    }));
    renderCloseOut();
    await formReady();
    expect(screen.getByRole('radio', { name: /Left locked out/ })).toBeChecked();
    expect(screen.getByRole('radio', { name: 'A processor board' })).toBeChecked();
  });

  it('asks for the crank-angle settings after a sensor finding only', async () => {
    const base = visitAtFinding();
    closeOutApi(undefined, visitAtFinding({ traversal: { ...base.traversal, findingIds: ['finding-sensor'] } }));
    renderCloseOut();
    await formReady();
    expect(screen.getByRole('checkbox', { name: /every setting taken from the crank angle is verified: top stop, light-curtain muting only on the upstroke, and any cam outputs/ })).toBeInTheDocument();
  });

  it('leaves the crank-angle settings check out after a connector finding', async () => {
    closeOutApi();
    renderCloseOut();
    await formReady();
    expect(screen.queryByRole('checkbox', { name: /every setting taken from the crank angle/ })).not.toBeInTheDocument();
  });

  it('shows the two-hand trip distance from strokes per minute and engaging points, and asks to confirm it', async () => {
    const api = closeOutApi();
    const { user } = renderCloseOut();
    await formReady();
    await user.click(screen.getByRole('radio', { name: 'Two-hand trip fitted' }));
    await user.type(screen.getByRole('textbox', { name: 'Strokes per minute' }), '40');
    await user.type(screen.getByRole('textbox', { name: 'Engaging points of the clutch' }), '4');
    // OSHA 29 CFR 1910.217(c)(3)(viii)(c): 40 strokes/min → 1.5 s per revolution; Tm = (1/2 + 1/4) × 1.5 = 1.125 s;
    // Ds = 63 × 1.125 = 70.875 in → 70.9 in; × 25.4 = 1800.225 mm → 1800.3 mm (worked by hand).
    expect(screen.getByText(/Two-hand trip: minimum safety distance/)).toHaveTextContent('70.9 in (1800.3 mm)');
    await user.click(screen.getByRole('button', { name: 'Close the visit' }));
    const confirm = screen.getByRole('checkbox', { name: /two-hand station sits at or beyond the safety distance shown/ });
    await waitFor(() => expect(confirm).toHaveAttribute('aria-invalid', 'true'));
    expect(api.callsTo('POST', '/api/visits/7/close')).toHaveLength(0);
  });

  it("shows the server's 409 with the way back to the visit", async () => {
    const message = 'Work the procedure through to a finding before closing. It is waiting at "Measure the windings at the control end".';
    closeOutApi(apiError(409, 'no_finding', message));
    const { user } = renderCloseOut();
    await formReady();

    await fillCloseOut(user);
    await user.click(screen.getByRole('button', { name: 'Close the visit' }));

    const banner = (await screen.findByText('The visit cannot be closed yet')).closest('[role="alert"]') as HTMLElement;
    expect(banner).toHaveTextContent(message);
    expect(within(banner).getByRole('link', { name: 'Back to the visit' })).toHaveAttribute('href', '/visits/7');
  });

  it('shows what another device changed beside the close-out, and closes against the visit as it is now when asked', async () => {
    const changed = visitAtFinding({
      version: 4,
      stepResults: [
        { id: 'answer-from-other-tab', stepId: 'connector-coupling', outcome: 'loose_or_damaged', answer: {}, note: null, confirmedAt: null, createdBy: 1, createdAt: '2026-03-02T09:40:00.000Z', supersededAt: null, supersededReason: null },
      ],
    });
    let posts = 0;
    const api = closeOutApi(() =>
      ++posts === 1
        ? { status: 409, body: { error: { code: 'stale_version', message: 'Changed on another device.', requestId: 't', current: { visit: changed } } } }
        : { status: 200, body: visitAtFinding({ status: 'closed', version: 5 }) },
    );
    const { user, router } = renderCloseOut();
    await formReady();
    await fillCloseOut(user);
    await user.click(screen.getByRole('button', { name: 'Close the visit' }));

    const dialog = await screen.findByRole('dialog', { name: 'The visit changed while you filled this close-out' });
    expect(within(dialog).getByRole('region', { name: 'Yours' })).toHaveTextContent('Straightened pin 3');
    expect(within(dialog).getByRole('region', { name: 'Yours' })).toHaveTextContent('1 part, signed by');
    expect(within(dialog).getByRole('region', { name: 'Saved on the server' })).toHaveTextContent('“Circular connector of the sensor cable” answered again');
    // Nothing typed is lost while the person decides.
    expect(screen.getByRole('textbox', { name: 'Part number' })).toHaveValue('INV-CX-0042');

    await user.click(within(dialog).getByRole('button', { name: 'Close with what I typed' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/visits/7'));
    const [first, second] = api.callsTo('POST', '/api/visits/7/close');
    expect(first?.body).toMatchObject({ version: 3, findingId: 'finding-connector' });
    expect(second?.body).toMatchObject({ version: 4, findingId: 'finding-connector' });
  });

  it('keeps what is typed on this device, restores it with a notice after leaving the page, and forgets it once the visit closes', async () => {
    const api = closeOutApi();
    const first = renderCloseOut();
    await formReady();
    await fillCloseOut(first.user);
    const key = 'crankwise:draft:1:7:close-out';
    expect(localStorage.getItem(key)).toContain('INV-CX-0042');

    // Reload, Back or a closed tab: the page goes away and comes back.
    first.unmount();
    const { user, router } = renderCloseOut();
    await formReady();
    expect(screen.getByText(/^Restored what you typed on /)).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'Actions taken' })).toHaveValue('Straightened pin 3, re-seated the connector, coupling ring hand-tight.');
    expect(screen.getByRole('textbox', { name: 'Part number' })).toHaveValue('INV-CX-0042');
    expect(screen.getByRole('textbox', { name: 'Labour minutes' })).toHaveValue('95');

    await user.click(screen.getByRole('button', { name: 'Close the visit' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/visits/7'));
    expect(api.callsTo('POST', '/api/visits/7/close')[0]?.body).toMatchObject({ actionsTaken: expect.stringContaining('Straightened pin 3'), labourMinutes: 95 });
    expect(localStorage.getItem(key)).toBeNull();
  });

  it('throws a restored draft away on Discard and starts again from what is saved', async () => {
    closeOutApi();
    localStorage.setItem('crankwise:draft:1:7:close-out', JSON.stringify({ savedAt: '2026-03-02T10:15:00.000Z', value: { actionsTaken: 'Typed before the tablet slept (invented).', parts: [], returnToService: {} } }));
    const { user } = renderCloseOut();
    await formReady();
    expect(screen.getByRole('textbox', { name: 'Actions taken' })).toHaveValue('Typed before the tablet slept (invented).');

    await user.click(screen.getByRole('button', { name: 'Discard' }));
    expect(screen.queryByText(/^Restored what you typed on /)).not.toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'Actions taken' })).toHaveValue('');
    expect(localStorage.getItem('crankwise:draft:1:7:close-out')).toBeNull();
  });

  it('reopens a returned visit with its close-out filled in and the manager’s comment pinned, and sends the stored part ids back', async () => {
    const stored = visitAtFinding({
      reviewComment: 'Add the serial of the fitted insert (invented comment).',
      controlFirmwareLeft: '2.10',
      monitorFirmwareLeft: '3.1.4',
      closeOut: {
        causeCategory: 'wiring',
        actionsTaken: 'Straightened pin 3 (stored close-out).',
        recommendations: null,
        labourMinutes: 95,
        travelMinutes: 40,
        asLeftState: 'returned_to_production',
        lockedOut: null,
        returnToService: { faultCleared: true, tdcAgrees: true, guardsRefitted: true, toolsRemoved: true, everyoneClear: true, singleStroke: true, stoppingTimeChecked: true, stoppingTimeMs: 180, presenceSensingDistanceOk: 'yes', twoHandDevice: 'not_fitted' },
        contactName: 'Ines Invented',
        contactEmail: 'ines@plant.example',
        signedAt: '2026-03-02T10:00:00.000Z',
        parts: [{ id: '6b1f0c3e-2a44-4e0b-9d1c-0f5a8e7b3c21', partNumber: 'INV-CX-0042', description: 'Insert (invented)', quantity: 1, serialRemoved: null, serialFitted: null }],
      },
    });
    const api = closeOutApi(undefined, stored);
    const { user } = renderCloseOut();
    await formReady();

    expect(screen.getByRole('region', { name: 'Returned for correction' })).toHaveTextContent('Add the serial of the fitted insert (invented comment).');
    expect(screen.getByRole('textbox', { name: 'Actions taken' })).toHaveValue('Straightened pin 3 (stored close-out).');
    expect(screen.getByRole('textbox', { name: 'Part number' })).toHaveValue('INV-CX-0042');
    expect(screen.getByRole('button', { name: 'Remove part 1' })).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'Labour minutes' })).toHaveValue('95');
    expect(screen.getByRole('checkbox', { name: /fault has cleared/ })).toBeChecked();
    expect(screen.getByRole('textbox', { name: /Measured stopping time/ })).toHaveValue('180');

    await user.type(screen.getByRole('textbox', { name: 'Serial fitted (optional)' }), 'SN-INV-78');
    await sign(user);
    await user.click(screen.getByRole('button', { name: 'Close the visit' }));
    await waitFor(() => expect(api.callsTo('POST', '/api/visits/7/close')).toHaveLength(1));
    const body = api.callsTo('POST', '/api/visits/7/close')[0]!.body as { parts: Array<{ id: string; serialFitted?: string }> };
    expect(body.parts).toEqual([expect.objectContaining({ id: '6b1f0c3e-2a44-4e0b-9d1c-0f5a8e7b3c21', serialFitted: 'SN-INV-78' })]);
  });

  it('keeps everything typed after a network failure and retries with the same part id', async () => {
    let tries = 0;
    const api = closeOutApi(() => {
      tries += 1;
      if (tries === 1) throw new TypeError('Failed to fetch');
      return { status: 200, body: visitAtFinding({ status: 'closed' }) };
    });
    const { user } = renderCloseOut();
    await formReady();
    await fillCloseOut(user);

    await user.click(screen.getByRole('button', { name: 'Close the visit' }));
    const banner = await screen.findByText('The close-out was not sent');
    expect(screen.getByRole('textbox', { name: 'Part number' })).toHaveValue('INV-CX-0042');

    await user.click(within(banner.closest('[role="alert"]') as HTMLElement).getByRole('button', { name: 'Retry' }));

    expect(await screen.findByRole('heading', { name: 'Visit workspace 7' })).toBeInTheDocument();
    const posts = api.callsTo('POST', '/api/visits/7/close');
    expect(posts).toHaveLength(2);
    const partId = (call: RecordedCall) => (call.body as { parts: Array<{ id: string }> }).parts[0]!.id;
    expect(partId(posts[1]!)).toBe(partId(posts[0]!));
  });

  it('refuses a visit without a finding and links back to it', async () => {
    closeOutApi(undefined, visitAtFinding({ traversal: { ...visitAtFinding().traversal, findingIds: [], currentStepId: 'resistance-control-end' } }));
    renderCloseOut();

    expect(await screen.findByText('No finding reached yet')).toBeInTheDocument();
    expect(screen.getByText(/Work the procedure through to a finding before closing\. It is waiting at “/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Back to the visit' })).toHaveAttribute('href', '/visits/7');
    expect(screen.queryByRole('form', { name: 'Close-out' })).not.toBeInTheDocument();
  });

  it('refuses a visit that is already closed', async () => {
    closeOutApi(undefined, visitAtFinding({ status: 'closed' }));
    renderCloseOut();

    expect(await screen.findByText('This visit is already closed')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Back to the visit' })).toHaveAttribute('href', '/visits/7');
    expect(screen.queryByRole('button', { name: 'Close the visit' })).not.toBeInTheDocument();
  });
});
