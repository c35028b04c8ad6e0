import { render, screen, within } from '@testing-library/react';
import { BROKEN_DIAGRAM } from '../testing/reference-fixtures';
import { ProcedureDiagram } from './procedure-diagram';

describe('Procedure diagram', () => {
  it('draws one box per step, with its kind named, plus a marked box for the missing target', () => {
    const { container } = render(<ProcedureDiagram diagram={BROKEN_DIAGRAM} />);
    const boxes = [...container.querySelectorAll('svg [data-step-id]')];
    expect(boxes.map((b) => b.getAttribute('data-step-id'))).toEqual(['at-rest', 'connector-check', 'rotor-resistance', 'sensor-fault', 'no-such-step']);
    const kindText = (id: string) => container.querySelector(`[data-step-id="${id}"] text`)!.textContent;
    expect(kindText('at-rest')).toBe('Start · Safety gate');
    expect(kindText('connector-check')).toBe('Yes/no check');
    expect(kindText('rotor-resistance')).toBe('Measurement');
    expect(kindText('sensor-fault')).toBe('Finding');
    expect(kindText('no-such-step')).toBe('Missing step');
    // Each kind has its own outline: a hexagon (6 points) for the gate, a pill for the finding.
    expect(container.querySelector('[data-step-id="at-rest"] polygon')!.getAttribute('points')!.split(' ')).toHaveLength(6);
    expect(container.querySelector('[data-step-id="sensor-fault"] rect')!.getAttribute('rx')).toBe('36');
  });

  it('labels each arrow with its outcome, joins outcomes that share a target, and dashes the broken branch', () => {
    const { container } = render(<ProcedureDiagram diagram={BROKEN_DIAGRAM} />);
    const edge = (key: string) => container.querySelector(`[data-edge="${key}"]`)!;
    expect(edge('at-rest->connector-check').textContent).toBe('Confirmed');
    expect(edge('connector-check->rotor-resistance').textContent).toBe('Seated');
    expect(edge('rotor-resistance->sensor-fault').textContent).toBe('Rotor pass / Rotor high');
    expect(edge('connector-check->no-such-step').textContent).toBe('Not seated');
    expect(edge('connector-check->no-such-step').querySelector('path')).toHaveAttribute('stroke-dasharray', '6 4');
    expect(edge('connector-check->rotor-resistance').querySelector('path')).not.toHaveAttribute('stroke-dasharray');
  });

  it('lays the steps out in rows by distance from the start and offers the same content as a list', () => {
    const { container } = render(<ProcedureDiagram diagram={BROKEN_DIAGRAM} />);
    const y = (id: string) => Number(container.querySelector(`[data-step-id="${id}"] text`)!.getAttribute('y'));
    expect(y('at-rest')).toBeLessThan(y('connector-check'));
    expect(y('connector-check')).toBeLessThan(y('rotor-resistance'));
    expect(y('no-such-step')).toBe(y('rotor-resistance'));
    expect(screen.getByRole('img', { name: 'Branching diagram: 4 steps, 5 outcomes' })).toBeInTheDocument();
    const list = screen.getByText('Steps and branches as a list').closest('details')!;
    expect(within(list).getByText('Not seated → missing step “no-such-step”')).toBeInTheDocument();
  });
});
