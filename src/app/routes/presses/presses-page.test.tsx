import { act, screen, waitFor, within } from '@testing-library/react';
import { renderApp } from '@/testing/render-app';
import { apiError, mockApi, type RecordedCall } from '@/testing/mock-api';
import { manager, pageOf, press } from '@/testing/fixtures';

afterEach(() => {
  vi.unstubAllGlobals();
});

const px101 = press();
const px204 = press({
  id: 2,
  assetTag: 'PX-204',
  model: 'Invented SP-600',
  tonnage: 1200,
  siteName: 'Plant South (invented)',
  sensorGeneration: 'Gen B (invented)',
  controlFirmware: '2.9',
  monitorFirmware: null,
});

/** A fake presses endpoint that filters by asset tag, like the real one does (among other fields). */
function pressesApi(all = [px101, px204], total?: number) {
  return mockApi({
    'GET /api/session': { status: 200, body: { user: manager } },
    'GET /api/presses': (call: RecordedCall) => {
      const q = (call.query.get('q') ?? '').toLowerCase();
      const items = all.filter((p) => p.assetTag.toLowerCase().includes(q));
      const page = Number(call.query.get('page'));
      return { status: 200, body: pageOf(items, { page, pageSize: Number(call.query.get('pageSize')), total: total ?? items.length }) };
    },
  });
}

describe('Presses page', () => {
  it('shows each press with its asset tag, model, tonnage, place, sensor generation and firmware', async () => {
    pressesApi();
    renderApp('/presses');

    const list = await screen.findByRole('list', { name: 'Presses' });
    const cards = within(list).getAllByRole('article');
    expect(cards.map((card) => within(card).getByRole('heading').textContent)).toEqual(['PX-101', 'PX-204']);

    const second = cards[1]!;
    expect(within(second).getByText('Invented SP-600 · 1,200 US tons')).toBeInTheDocument();
    expect(within(second).getByText('Example Stampings (invented) · Plant South (invented)')).toBeInTheDocument();
    expect(within(second).getByText('Gen B (invented)')).toBeInTheDocument();
    expect(within(second).getByText('2.9')).toBeInTheDocument();
    expect(within(second).getByText('Monitor firmware').nextElementSibling).toHaveTextContent('not recorded');
    expect(screen.getByText('1–2 of 2 presses · page 1 of 1')).toBeInTheDocument();
    await waitFor(() => expect(document.title).toBe('Presses · Crankwise'));
  });

  it('searches as the person types, keeps the search in the address, and asks the API for it', async () => {
    const api = pressesApi();
    const { user, router } = renderApp('/presses');
    await screen.findByRole('list', { name: 'Presses' });

    await user.type(screen.getByRole('searchbox', { name: 'Find a press' }), 'px-2');

    await waitFor(() => expect(router.state.location.search).toBe('?q=px-2'));
    await waitFor(() => expect(screen.queryByRole('heading', { name: 'PX-101' })).not.toBeInTheDocument());
    expect(screen.getByRole('heading', { name: 'PX-204' })).toBeInTheDocument();
    const searches = api.callsTo('GET', '/api/presses').map((call) => call.query.get('q'));
    // The pause before searching means one request for the whole word, not one per letter.
    expect(searches).toEqual([null, 'px-2']);
  });

  it('says plainly when nothing matches, and what to check', async () => {
    pressesApi();
    renderApp('/presses?q=zz-999');

    expect(await screen.findByText('No press matches “zz-999”.')).toBeInTheDocument();
    expect(screen.getByText(/Check the asset tag on the press/)).toBeInTheDocument();
    expect(screen.getByRole('searchbox', { name: 'Find a press' })).toHaveValue('zz-999');
  });

  it('restores the earlier search when the person goes back', async () => {
    pressesApi();
    const { router } = renderApp('/presses?q=px-1');
    await screen.findByRole('heading', { name: 'PX-101' });

    await act(() => router.navigate('/presses?q=px-2'));
    await screen.findByRole('heading', { name: 'PX-204' });
    await act(() => router.navigate(-1));

    expect(await screen.findByRole('heading', { name: 'PX-101' })).toBeInTheDocument();
    expect(screen.getByRole('searchbox', { name: 'Find a press' })).toHaveValue('px-1');
  });

  it('pages through a long list with the page kept in the address', async () => {
    const api = pressesApi([px101], 45);
    const { user, router } = renderApp('/presses');

    expect(await screen.findByText('1–20 of 45 presses · page 1 of 3')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: /Previous page/ })).toBeDisabled();
    await user.click(screen.getByRole('button', { name: /Next page/ }));

    expect(await screen.findByText('21–40 of 45 presses · page 2 of 3')).toBeInTheDocument();
    expect(router.state.location.search).toBe('?page=2');
    expect(api.callsTo('GET', '/api/presses').at(-1)?.query.get('page')).toBe('2');
  });

  it("shows the server's message and a way to try again when the list cannot load", async () => {
    const message = 'Something went wrong on our side. Try again; if it keeps happening, give this reference to support: r-1.';
    mockApi({
      'GET /api/session': { status: 200, body: { user: manager } },
      'GET /api/presses': apiError(400, 'invalid_input', message),
    });
    renderApp('/presses');

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Could not load presses');
    expect(alert).toHaveTextContent(message);
    expect(within(alert).getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});
