import { render, screen } from '@testing-library/react';
import { VERDICT_LABELS } from '@shared/format/labels';
import type { Verdict } from '@shared/schemas/reading';
import { VerdictMark } from './verdict-mark';

describe('VerdictMark', () => {
  it('writes every verdict out in words and draws a different shape for each, so colour is never the only cue', () => {
    const verdicts = Object.keys(VERDICT_LABELS) as Verdict[];
    const { container } = render(
      <>
        {verdicts.map((verdict) => (
          <VerdictMark key={verdict} verdict={verdict} />
        ))}
      </>,
    );

    for (const label of ['In band', 'Near edge', 'Out of band', 'Open circuit', 'Short circuit']) {
      expect(screen.getByText(label)).toBeInTheDocument();
    }
    const shapes = [...container.querySelectorAll('svg')].map((svg) => svg.innerHTML);
    expect(new Set(shapes).size).toBe(verdicts.length);
  });
});
