import { useSearchParams } from 'react-router-dom';
import { PageShell } from '@/components/ui/page-shell';
import { ProcedureImport } from '@/features/admin-reference/components/procedure-import';
import { ProcedureList } from '@/features/admin-reference/components/procedure-list';
import { ProcedureVersion } from '@/features/admin-reference/components/procedure-version';

export function ProceduresPage() {
  const [params, setParams] = useSearchParams();
  const parsed = Number.parseInt(params.get('version') ?? '', 10);
  const selected = Number.isFinite(parsed) ? parsed : null;
  const select = (id: number | null) => setParams(id === null ? {} : { version: String(id) });
  return (
    <PageShell title="Procedures" description="Import a procedure as JSON, check it with the validator, look at its branching, and publish it as a new version.">
      <div className="space-y-10">
        <ProcedureList selectedId={selected} onSelect={select} />
        {selected !== null && <ProcedureVersion key={selected} id={selected} onDiscarded={() => select(null)} />}
        <section aria-labelledby="import-title" className="space-y-4">
          <h2 id="import-title" className="text-2xl font-semibold text-ink">
            Import a procedure
          </h2>
          <ProcedureImport onImported={select} />
        </section>
      </div>
    </PageShell>
  );
}
