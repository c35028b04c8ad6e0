import { screen, within } from '@testing-library/react';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { technician } from '@/testing/fixtures';
import { renderApp } from '@/testing/render-app';
import { mockApi, type RecordedCall } from '@/testing/mock-api';
import { readingRecord, UP_TO_RESISTANCE, visitDetail } from '@/features/visits/testing/visit-fixtures';

afterEach(() => {
  vi.unstubAllGlobals();
});

type Reply = { status: number; body?: unknown };

function api(visit: VisitDetail, more: Record<string, Reply | ((call: RecordedCall) => Reply)>) {
  return mockApi({
    'GET /api/session': { status: 200, body: { user: technician } },
    'GET /api/visits/42': { status: 200, body: visit },
    'GET /api/visits/42/attachments': { status: 200, body: { items: [] } },
    ...more,
  });
}

const stale = (current: Record<string, unknown>): Reply => ({
  status: 409,
  body: { error: { code: 'stale_version', message: 'Saved meanwhile on another device.', requestId: 'test', current } },
});

// Another tab answered "Conductors and terminations" with "Screw clamped on insulation" after this one loaded "All sound".
const withWiring = (outcome: string) =>
  visitDetail({
    answers: UP_TO_RESISTANCE.map((a) => (a.stepId === 'wiring-conductors' ? { ...a, outcome } : a)),
    superseded: outcome === 'sound' ? [] : [{ stepId: 'wiring-conductors', outcome: 'sound' }],
    version: outcome === 'sound' ? 8 : 9,
  });
const serverAnswer = (visit: VisitDetail) => visit.stepResults.find((r) => r.stepId === 'wiring-conductors' && r.supersededAt === null)!;

async function answerWiringOnStaleScreen() {
  const theirs = withWiring('clamped_on_insulation');
  const mine = withWiring('broken_or_frayed');
  let puts = 0;
  const calls = api(withWiring('sound'), {
    'PUT /api/visits/42/steps/wiring-conductors': () => (++puts === 1 ? stale({ visit: theirs, stepResult: serverAnswer(theirs) }) : { status: 200, body: mine }),
  });
  const view = renderApp('/visits/42?step=wiring-conductors');
  expect(await screen.findByRole('heading', { level: 2, name: 'Conductors and terminations' })).toBeInTheDocument();
  await view.user.click(screen.getByRole('button', { name: 'Broken or frayed conductor' }));
  const dialog = await screen.findByRole('dialog', { name: 'This step was answered on another device' });
  return { ...view, calls, dialog, theirs };
}

describe('Two tabs answer the same step', () => {
  it('shows both answers and, on "Keep mine", sends mine again against the answer now on the server', async () => {
    const { user, calls, dialog, theirs } = await answerWiringOnStaleScreen();
    expect(within(dialog).getByRole('region', { name: 'Yours' })).toHaveTextContent('Broken or frayed conductor');
    expect(within(dialog).getByRole('region', { name: 'Saved on the server' })).toHaveTextContent('Screw clamped on insulation');
    expect(within(dialog).getByRole('region', { name: 'Saved on the server' })).toHaveTextContent('Saved by Ada Invented (you) on Mar 2, 2026');
    // Focus is in the dialog, on its first choice.
    expect(within(dialog).getByRole('button', { name: 'Use the server’s' })).toHaveFocus();

    await user.click(within(dialog).getByRole('button', { name: 'Keep mine' }));

    expect(await screen.findByRole('heading', { level: 2, name: 'Broken or frayed conductor' })).toBeInTheDocument();
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    const [first, second] = calls.callsTo('PUT', '/api/visits/42/steps/wiring-conductors');
    expect(first?.body).toEqual({ id: expect.any(String), outcome: 'broken_or_frayed', replaces: 'result-wiring-conductors-sound' });
    expect(second?.body).toEqual({ id: expect.any(String), outcome: 'broken_or_frayed', replaces: serverAnswer(theirs).id });
    expect((second?.body as { id: string }).id).not.toBe((first?.body as { id: string }).id);
  });

  it('on "Use the server’s" sends nothing more and shows the server’s answer as chosen', async () => {
    const { user, calls, dialog } = await answerWiringOnStaleScreen();
    await user.click(within(dialog).getByRole('button', { name: 'Use the server’s' }));

    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Screw clamped on insulation' })).toHaveAttribute('aria-pressed', 'true');
    expect(calls.callsTo('PUT', '/api/visits/42/steps/wiring-conductors')).toHaveLength(1);
    expect(screen.queryByText(/Not saved/)).not.toBeInTheDocument();
  });
});

describe('Two tabs save the same reading', () => {
  async function typeOverStaleReading() {
    const serverReading = readingRecord({ id: 'reading-from-other-tab', entered: '95', verdict: 'in_band', reason: 'Judged in band by the server (invented).' });
    const theirs = visitDetail({ answers: UP_TO_RESISTANCE, readings: [serverReading], version: 9 });
    let posts = 0;
    const calls = api(visitDetail({ answers: UP_TO_RESISTANCE, version: 8 }), {
      'POST /api/visits/42/readings': (call) => {
        if (++posts === 1) return stale({ visit: theirs, reading: serverReading });
        const body = call.body as { id: string; entered: string };
        const reading = readingRecord({ id: body.id, entered: body.entered });
        return { status: 200, body: { reading, visit: visitDetail({ answers: UP_TO_RESISTANCE, readings: [reading], version: 10 }) } };
      },
    });
    const view = renderApp('/visits/42');
    const field = await screen.findByRole('textbox', { name: /Rotor R1–R2/ });
    await view.user.type(field, '89.3{Enter}');
    const dialog = await screen.findByRole('dialog', { name: 'This reading was saved on another device' });
    return { ...view, calls, dialog, field };
  }

  it('shows the value typed here beside the saved one; "Use the server’s" puts the saved value in the field', async () => {
    const { user, calls, dialog, field } = await typeOverStaleReading();
    expect(within(dialog).getByRole('region', { name: 'Yours' })).toHaveTextContent('89.3');
    expect(within(dialog).getByRole('region', { name: 'Saved on the server' })).toHaveTextContent('95');
    expect(calls.callsTo('POST', '/api/visits/42/readings')[0]?.body).toMatchObject({ entered: '89.3', replaces: null });

    await user.click(within(dialog).getByRole('button', { name: 'Use the server’s' }));
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(field).toHaveValue('95');
    expect(calls.callsTo('POST', '/api/visits/42/readings')).toHaveLength(1);
  });

  it('"Keep mine" sends the typed value again, replacing the reading saved on the other device', async () => {
    const { user, calls, dialog } = await typeOverStaleReading();
    await user.click(within(dialog).getByRole('button', { name: 'Keep mine' }));
    expect(await screen.findByText('Saved.')).toBeInTheDocument();
    const posts = calls.callsTo('POST', '/api/visits/42/readings');
    expect(posts).toHaveLength(2);
    expect(posts[1]?.body).toMatchObject({ entered: '89.3', replaces: 'reading-from-other-tab' });
  });
});
