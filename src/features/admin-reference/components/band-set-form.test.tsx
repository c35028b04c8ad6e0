import { screen, within } from '@testing-library/react';
import { apiError, mockApi } from '@/testing/mock-api';
import { bandSetRecord } from '../testing/reference-fixtures';
import { renderWithClient } from '../testing/render-with-client';
import { BandSetForm } from './band-set-form';

afterEach(() => {
  vi.unstubAllGlobals();
});

const rotor = () => screen.getByRole('group', { name: /Rotor winding/ });
const stator1 = () => screen.getByRole('group', { name: /Stator 1 winding/ });

describe('Band-set form', () => {
  it('shows field errors beside the fields and saves nothing while they stand', async () => {
    const api = mockApi({});
    const { user } = renderWithClient(<BandSetForm record={bandSetRecord()} editable />);

    const nominal = within(stator1()).getByRole('spinbutton', { name: 'Nominal (Ω)' });
    await user.clear(nominal);
    const nearEdge = within(rotor()).getByRole('spinbutton', { name: /Near edge within/ });
    await user.clear(nearEdge);
    await user.type(nearEdge, '5');
    await user.click(screen.getByRole('button', { name: 'Save draft' }));

    expect(nominal).toHaveAttribute('aria-invalid', 'true');
    expect(await within(stator1()).findByText('Enter a number')).toHaveAttribute('role', 'alert');
    expect(within(rotor()).getByText('near-edge tolerance must be wider than the in-band tolerance')).toBeInTheDocument();
    expect(nearEdge).toHaveAccessibleDescription(expect.stringContaining('near-edge tolerance must be wider'));
    expect(api.calls).toHaveLength(0);
  });

  it('sends the edited values and shows the server’s own field messages', async () => {
    const api = mockApi({
      'PUT /api/admin/band-sets/7': apiError(400, 'invalid_input', 'Some fields in the request body need attention.', { 'bands.excitation.max': 'max must be above min' }),
    });
    const { user } = renderWithClient(<BandSetForm record={bandSetRecord()} editable />);
    const nominal = within(rotor()).getByRole('spinbutton', { name: 'Nominal (Ω)' });
    await user.clear(nominal);
    await user.type(nominal, '120');
    await user.click(screen.getByRole('button', { name: 'Save draft' }));

    const excitation = screen.getByRole('group', { name: /Excitation voltage/ });
    expect(await within(excitation).findByText('max must be above min')).toBeInTheDocument();
    expect(api.callsTo('PUT', '/api/admin/band-sets/7')[0]!.body).toMatchObject({ bands: { windings: { rotor: { nominal: 120 } } } });
    expect(screen.getByText('The draft was not saved')).toBeInTheDocument();
  });

  it('shows a published version read-only, with the preview still working', async () => {
    mockApi({});
    const { user } = renderWithClient(<BandSetForm record={bandSetRecord({ publishedAt: '2026-01-02T00:00:00.000Z' })} editable={false} />);
    expect(within(rotor()).getByRole('spinbutton', { name: 'Nominal (Ω)' })).toBeDisabled();
    expect(screen.queryByRole('button', { name: 'Save draft' })).not.toBeInTheDocument();
    await user.type(screen.getByRole('textbox', { name: /Value as the meter shows it/ }), '100');
    expect(screen.getByText('In band')).toBeInTheDocument();
  });
});
