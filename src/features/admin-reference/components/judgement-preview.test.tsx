import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { INVENTED_BANDS } from '../testing/reference-fixtures';
import { JudgementPreview } from './judgement-preview';

// Expected verdicts are worked out by hand from the invented bands (rotor 100 Ω, in band ±8 %, near edge ±15 %).
describe('Judgement preview', () => {
  it('shows the verdict of a typed rotor resistance against the bands being edited', async () => {
    const user = userEvent.setup();
    render(<JudgementPreview bands={INVENTED_BANDS} />);
    const value = screen.getByRole('textbox', { name: /Value as the meter shows it/ });

    await user.type(value, '104');
    expect(screen.getByText('In band')).toBeInTheDocument();

    await user.clear(value);
    await user.type(value, '112'); // +12 %: outside ±8 %, inside ±15 %
    expect(screen.getByText('Near edge')).toBeInTheDocument();

    await user.clear(value);
    await user.type(value, 'OL');
    expect(screen.getByText('Open circuit')).toBeInTheDocument();

    await user.clear(value);
    await user.type(value, '5..1');
    expect(screen.queryByText(/In band|Near edge|Out of band/)).not.toBeInTheDocument();
  });

  it('judges a stator pair by its vector magnitude', async () => {
    const user = userEvent.setup();
    render(<JudgementPreview bands={INVENTED_BANDS} />);
    await user.selectOptions(screen.getByRole('combobox', { name: 'Reading' }), 'stator_pair');
    await user.type(screen.getByRole('textbox', { name: 'S1–S3 as the meter shows it' }), '1.2');
    await user.type(screen.getByRole('textbox', { name: 'S2–S4 as the meter shows it' }), '1.6');
    // √(1.2² + 1.6²) = 2.0 V (a 3-4-5 right triangle), inside the invented 1.9–2.1 V range.
    expect(screen.getByText('In band')).toBeInTheDocument();
    expect(screen.getByText(/√\(V\(S1–S3\)² \+ V\(S2–S4\)²\) = 2(\.0+)? V/)).toBeInTheDocument();
  });

  it('asks for complete bands before judging', async () => {
    const user = userEvent.setup();
    render(<JudgementPreview bands={{ ...INVENTED_BANDS, referenceTemperatureC: Number.NaN }} />);
    await user.type(screen.getByRole('textbox', { name: /Value as the meter shows it/ }), '100');
    expect(screen.getByText(/Fix the highlighted band fields first/)).toBeInTheDocument();
  });
});
