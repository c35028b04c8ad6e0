import { screen, within } from '@testing-library/react';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { technician } from '@/testing/fixtures';
import { renderApp } from '@/testing/render-app';
import { apiError, mockApi, type RecordedCall } from '@/testing/mock-api';
import { UP_TO_RESISTANCE, visitDetail } from '@/features/visits/testing/visit-fixtures';

afterEach(() => {
  vi.unstubAllGlobals();
});

type Reply = { status: number; body?: unknown };

function workspaceApi(visit: VisitDetail, more: Record<string, Reply | ((call: RecordedCall) => Reply)> = {}) {
  return mockApi({
    'GET /api/session': { status: 200, body: { user: technician } },
    'GET /api/visits/42': { status: 200, body: visit },
    'GET /api/visits/42/attachments': { status: 200, body: { items: [] } },
    ...more,
  });
}

const stepList = () => screen.getByRole('navigation', { name: 'Steps' });

describe('Visit workspace: safety gate', () => {
  it('keeps Confirm disabled until every point is ticked, sends confirmed:true, then shows who confirmed and when', async () => {
    const confirmed = visitDetail({ answers: [{ stepId: 'press-at-rest', outcome: 'confirmed' }] });
    const api = workspaceApi(visitDetail(), {
      'PUT /api/visits/42/steps/press-at-rest': () => ({ status: 200, body: confirmed }),
    });
    const { user } = renderApp('/visits/42');

    expect(await screen.findByRole('heading', { level: 2, name: 'Bring the press to rest' })).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'WARNING safety notice' })).toHaveTextContent('Moving parts can crush or amputate.');
    expect(screen.getByText('Your confirmation is recorded with your name and the time.')).toBeInTheDocument();
    const confirm = screen.getByRole('button', { name: 'Confirm' });
    const boxes = screen.getAllByRole('checkbox');
    expect(boxes).toHaveLength(4);

    for (const box of boxes.slice(0, 3)) await user.click(box);
    expect(confirm).toBeDisabled();
    await user.click(boxes[3]!);
    expect(confirm).toBeEnabled();
    await user.click(confirm);

    // The server says what comes next: the firmware step.
    expect(await screen.findByRole('heading', { level: 2, name: 'Compare firmware of the control pair' })).toBeInTheDocument();
    const [put] = api.callsTo('PUT', '/api/visits/42/steps/press-at-rest');
    expect(put?.body).toEqual({ id: expect.stringMatching(/^[0-9a-f-]{36}$/), confirmed: true, replaces: null });

    await user.click(within(stepList()).getByRole('link', { name: /Bring the press to rest/ }));
    expect(await screen.findByText(/Confirmed by Ada Invented \(you\) on Mar 2, 2026/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Confirm' })).not.toBeInTheDocument();
    expect(within(stepList()).getByRole('link', { name: /Bring the press to rest/ })).toHaveTextContent('Confirmed');
  });
});

describe('Visit workspace: going back to an earlier step', () => {
  it('shows later answers as no longer applying after an earlier answer changes, and keeps the old answer in the history', async () => {
    const before = visitDetail({ answers: UP_TO_RESISTANCE });
    const changedTo = UP_TO_RESISTANCE.map((a) => (a.stepId === 'connector-coupling' ? { ...a, outcome: 'loose_or_damaged' } : a));
    const after = visitDetail({ answers: changedTo, superseded: [{ stepId: 'connector-coupling', outcome: 'secure' }] });
    const api = workspaceApi(before, {
      'PUT /api/visits/42/steps/connector-coupling': () => ({ status: 200, body: after }),
    });
    const { user } = renderApp('/visits/42');

    expect(await screen.findByRole('heading', { level: 2, name: 'Winding resistance at the control end' })).toBeInTheDocument();
    expect(within(stepList()).getByRole('link', { current: 'step' })).toHaveTextContent('Now');

    await user.click(within(stepList()).getByRole('link', { name: /Circular connector of the sensor cable/ }));
    expect(await screen.findByRole('heading', { level: 2, name: 'Circular connector of the sensor cable' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: /Fully coupled, pins sound/ })).toHaveAttribute('aria-pressed', 'true');

    await user.click(screen.getByRole('button', { name: 'Ring loose or pins damaged' }));

    expect(await screen.findByRole('heading', { level: 2, name: 'Circular connector loose or damaged' })).toBeInTheDocument();
    expect(api.callsTo('PUT', '/api/visits/42/steps/connector-coupling')[0]?.body).toEqual({ id: expect.any(String), outcome: 'loose_or_damaged', replaces: 'result-connector-coupling-secure' });
    const stale = within(stepList()).getByRole('link', { name: /Conductors and terminations/ });
    expect(stale).toHaveTextContent('No longer applies');
    expect(within(stepList()).queryByRole('link', { name: /Winding resistance at the control end/ })).not.toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Go to close-out' })).toHaveAttribute('href', '/visits/42/close');

    await user.click(stale);
    expect(await screen.findByText('This answer no longer applies')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'All sound' })).toBeDisabled();

    await user.click(within(stepList()).getByRole('link', { name: /Circular connector of the sensor cable/ }));
    const history = await screen.findByText(/History \(1 earlier answer\)/);
    await user.click(history);
    expect(screen.getByText('Fully coupled, pins sound', { selector: 'span' })).toBeInTheDocument();
    expect(screen.getByText(/Answered by Ada Invented \(you\) on Mar 2, 2026/)).toBeInTheDocument();
  });
});

describe('Visit workspace: a save that does not reach the server', () => {
  it('shows the not-saved banner, keeps the typed value, and a retry sends the same id', async () => {
    let attempts = 0;
    const api = workspaceApi(visitDetail({ answers: UP_TO_RESISTANCE }), {
      'POST /api/visits/42/readings': (call) => {
        attempts += 1;
        if (attempts === 1) throw new TypeError('Failed to fetch');
        const body = call.body as { id: string; entered: string };
        const reading = { id: body.id, stepId: 'resistance-control-end', quantity: 'resistance', circuit: 'rotor', position: 'control_end', entered: body.entered, valueSi: 89.3, isOpen: false, windingTemperatureC: null, cable: null, verdict: 'in_band', reason: 'Stored by the server.', judgement: {}, bandSetId: 7, createdAt: '2026-03-02T12:00:00.000Z', supersededAt: null };
        return { status: 200, body: { reading, visit: visitDetail({ answers: UP_TO_RESISTANCE, readings: [reading as never] }) } };
      },
    });
    const { user } = renderApp('/visits/42');
    const rotor = await screen.findByRole('textbox', { name: /Rotor R1–R2/ });

    await user.type(rotor, '89.3{Enter}');

    const banner = await screen.findByRole('alert');
    expect(banner).toHaveTextContent('Not saved — no connection. Retrying…');
    expect(rotor).toHaveValue('89.3');
    await user.click(within(banner).getByRole('button', { name: 'Retry' }));

    expect(await screen.findByText('Stored by the server.')).toBeInTheDocument();
    expect(screen.queryByText(/Not saved/)).not.toBeInTheDocument();
    const ids = api.callsTo('POST', '/api/visits/42/readings').map((c) => (c.body as { id: string }).id);
    expect(ids.length).toBeGreaterThanOrEqual(2);
    expect(new Set(ids).size).toBe(1);
  });

  it("shows the server's message for a refused save and does not send it again", async () => {
    const message = 'Visit V-000042 cannot be changed: it is closed.';
    const api = workspaceApi(visitDetail({ answers: UP_TO_RESISTANCE }), {
      'POST /api/visits/42/readings': apiError(409, 'visit_not_open', message),
    });
    const { user } = renderApp('/visits/42');

    await user.type(await screen.findByRole('textbox', { name: /Rotor R1–R2/ }), '89.3{Enter}');

    expect(await screen.findByRole('alert')).toHaveTextContent(message);
    expect(screen.queryByText(/Retrying/)).not.toBeInTheDocument();
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(api.callsTo('POST', '/api/visits/42/readings')).toHaveLength(1);
  });
});

describe('Visit workspace: cancelling a visit started by mistake', () => {
  it('asks for a reason before cancelling, sends it, then shows the visit as cancelled and kept for the record', async () => {
    const cancelled: VisitDetail = { ...visitDetail({ status: 'cancelled' }), cancellation: { at: '2026-03-02T09:40:00.000Z', reason: 'Started on the wrong press' } };
    let current = visitDetail();
    const api = workspaceApi(current, {
      'GET /api/visits/42': () => ({ status: 200, body: current }),
      'POST /api/visits/42/cancel': () => {
        current = cancelled;
        return { status: 200, body: cancelled };
      },
    });
    const { user } = renderApp('/visits/42');

    await user.click(await screen.findByRole('button', { name: 'Cancel this visit…' }));
    const form = screen.getByRole('form', { name: 'Cancel this visit' });
    await user.click(within(form).getByRole('button', { name: 'Cancel the visit' }));
    const reason = within(form).getByRole('textbox', { name: 'Why is it cancelled?' });
    expect(reason).toHaveAttribute('aria-invalid', 'true');
    expect(reason).toHaveAccessibleDescription(/Say why this visit is cancelled/);
    expect(api.callsTo('POST', '/api/visits/42/cancel')).toHaveLength(0);

    await user.type(reason, 'Started on the wrong press');
    await user.click(within(form).getByRole('button', { name: 'Cancel the visit' }));

    expect(await screen.findByText('This visit was cancelled')).toBeInTheDocument();
    expect(screen.getByText(/Reason: Started on the wrong press\. It is kept for the record and left out of the figures\./)).toBeInTheDocument();
    expect(api.callsTo('POST', '/api/visits/42/cancel')[0]!.body).toEqual({ reason: 'Started on the wrong press' });
    expect(screen.queryByRole('button', { name: 'Cancel this visit…' })).not.toBeInTheDocument();
  });

  it('offers no cancel on a closed visit', async () => {
    workspaceApi(visitDetail({ status: 'closed' }));
    renderApp('/visits/42');
    expect(await screen.findByText('This visit is closed')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Cancel this visit…' })).not.toBeInTheDocument();
  });
});
