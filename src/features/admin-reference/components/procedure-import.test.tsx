import { screen, within } from '@testing-library/react';
import { mockApi } from '@/testing/mock-api';
import { BROKEN_DIAGRAM } from '../testing/reference-fixtures';
import { renderWithClient } from '../testing/render-with-client';
import { ProcedureImport } from './procedure-import';

afterEach(() => {
  vi.unstubAllGlobals();
});

const PROBLEMS = [
  { stepId: 'connector-check', message: 'Step "connector-check" has outcome "no" going to unknown step "no-such-step"' },
  { stepId: 'rotor-resistance', message: 'Step "rotor-resistance" is a de-energized measurement not preceded, on every path, by a lockout safety gate' },
];

describe('Procedure import', () => {
  it('lists the validator’s messages under their steps, draws the diagram and keeps Save disabled', async () => {
    const api = mockApi({ 'POST /api/admin/procedures/check': { status: 200, body: { ok: false, problems: PROBLEMS, diagram: BROKEN_DIAGRAM } } });
    const { user } = renderWithClient(<ProcedureImport onImported={vi.fn()} />);
    const json = JSON.stringify({ key: 'test-procedure', title: 'Test procedure (invented)', definition: { formatVersion: 1, start: 'at-rest', steps: [] } });
    await user.click(screen.getByRole('textbox', { name: 'Or paste the JSON' }));
    await user.paste(json);
    await user.click(screen.getByRole('button', { name: 'Check' }));

    const problems = await screen.findByRole('list', { name: 'Problems by step' });
    expect(within(problems).getByText('Step connector-check')).toBeInTheDocument();
    expect(within(problems).getByText(/going to unknown step "no-such-step"/)).toBeInTheDocument();
    expect(within(problems).getByText('Step rotor-resistance')).toBeInTheDocument();
    expect(screen.getByRole('img', { name: /Branching diagram/ })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Save as draft' })).toBeDisabled();
    expect(screen.getByRole('textbox', { name: /Procedure key/ })).toHaveValue('test-procedure');
    expect(api.calls[0]!.body).toEqual({ definition: { formatVersion: 1, start: 'at-rest', steps: [] } });
  });

  it('says plainly when the text is not JSON', async () => {
    const api = mockApi({});
    const { user } = renderWithClient(<ProcedureImport onImported={vi.fn()} />);
    await user.type(screen.getByRole('textbox', { name: 'Or paste the JSON' }), 'not json');
    await user.click(screen.getByRole('button', { name: 'Check' }));
    expect(await screen.findByText(/This is not valid JSON/)).toHaveAttribute('role', 'alert');
    expect(api.calls).toHaveLength(0);
  });
});
