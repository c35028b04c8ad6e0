import { render, screen } from '@testing-library/react';
import { LOCKOUT_DEFERRAL, SafetyNotice } from './safety-notice';

describe('SafetyNotice', () => {
  it.each([
    ['danger', 'DANGER'],
    ['warning', 'WARNING'],
    ['caution', 'CAUTION'],
  ] as const)('shows the %s signal word and defers to the plant lockout procedure', (level, word) => {
    render(<SafetyNotice level={level}>Stator outputs are live while the control is powered.</SafetyNotice>);

    const notice = screen.getByRole('region', { name: `${word} safety notice` });
    expect(notice).toHaveTextContent(word.toLowerCase());
    expect(notice).toHaveTextContent('Stator outputs are live while the control is powered.');
    expect(notice).toHaveTextContent(LOCKOUT_DEFERRAL);
  });
});
