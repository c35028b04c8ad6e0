import { Navigate, useLocation } from 'react-router-dom';
import type { Role } from '@shared/schemas/roles';
import { Spinner } from '@/components/ui/spinner';
import { SignInForm } from '@/features/session/components/sign-in-form';
import { useSessionQuery } from '@/features/session/hooks/use-session-user';
import { PRODUCT_NAME, useDocumentTitle } from '@/lib/use-document-title';
import { ROLE_HOME } from '../../access';

/** Only a path inside this app is a safe place to return to after signing in. */
function returnPath(state: unknown, role: Role): string {
  const from = (state as { from?: unknown } | null)?.from;
  if (typeof from === 'string' && from.startsWith('/') && !from.startsWith('//') && !from.startsWith('/sign-in')) return from;
  return ROLE_HOME[role];
}

export function SignInPage() {
  useDocumentTitle('Sign in');
  const location = useLocation();
  const { data: user, isPending } = useSessionQuery();

  if (user) return <Navigate to={returnPath(location.state, user.role)} replace />;

  return (
    <main id="main" className="flex min-h-screen items-start justify-center bg-surface px-4 py-10 sm:items-center">
      <div className="w-full max-w-md space-y-8 rounded-2xl border border-surface-line bg-surface-raised p-6 shadow-sm sm:p-8">
        <div className="space-y-2">
          <p className="text-3xl font-bold tracking-tight text-ink">{PRODUCT_NAME}</p>
          <p className="text-lg text-ink-muted">Fault diagnosis and service records for mechanical power press controls.</p>
        </div>
        <h1 className="text-2xl font-semibold text-ink">Sign in</h1>
        {isPending ? <Spinner label="Checking your sign-in…" /> : <SignInForm />}
      </div>
    </main>
  );
}
