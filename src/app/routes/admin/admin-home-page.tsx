import { Link } from 'react-router-dom';
import { PageShell } from '@/components/ui/page-shell';
import { useSessionUser } from '@/features/session/hooks/use-session-user';
import { ADMIN_SECTIONS } from '../../access';

/** One door to the office's record keeping: what each role may manage, with a line on why it matters. */
export function AdminHomePage() {
  const user = useSessionUser();
  const sections = ADMIN_SECTIONS.filter((s) => s.roles.includes(user.role));
  return (
    <PageShell title="Administration" description="The records and reference data Crankwise works from.">
      <ul className="grid gap-4 sm:grid-cols-2">
        {sections.map((s) => (
          <li key={s.to}>
            <Link
              to={s.to}
              className="block min-h-touch rounded-xl border border-surface-line bg-surface-raised p-5 shadow-sm hover:border-accent focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-accent"
            >
              <span className="block text-xl font-semibold text-accent-strong">{s.label}</span>
              <span className="mt-1 block text-lg text-ink-muted">{s.description}</span>
            </Link>
          </li>
        ))}
      </ul>
    </PageShell>
  );
}
