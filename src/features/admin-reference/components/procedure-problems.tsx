import type { ProcedureProblemRecord } from '@shared/schemas/admin-reference';
import { Banner } from '@/components/ui/banner';

/** The validator's messages, grouped under the step each one is about. */
export function ProcedureProblems({ problems }: { problems: ProcedureProblemRecord[] }) {
  if (problems.length === 0) {
    return (
      <Banner role="status" title="The validator found no problems">
        Every branch leads to a finding, every target exists and every measurement has its safety gate.
      </Banner>
    );
  }
  const groups = new Map<string | null, string[]>();
  for (const p of problems) groups.set(p.stepId, [...(groups.get(p.stepId) ?? []), p.message]);
  return (
    <Banner tone="error" role="alert" title={`The validator found ${problems.length} problem${problems.length === 1 ? '' : 's'}`}>
      <p>Fix them in the JSON and check again; nothing is saved until it passes.</p>
      <ul className="mt-3 space-y-3" aria-label="Problems by step">
        {[...groups].map(([stepId, messages]) => (
          <li key={stepId ?? '(procedure)'}>
            <p className="font-semibold">{stepId ? `Step ${stepId}` : 'The procedure as a whole'}</p>
            <ul className="list-disc pl-6 text-base">
              {messages.map((m) => (
                <li key={m}>{m}</li>
              ))}
            </ul>
          </li>
        ))}
      </ul>
    </Banner>
  );
}
