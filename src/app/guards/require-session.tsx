import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Spinner } from '@/components/ui/spinner';
import { SignInAgainDialog } from '@/features/session/components/sign-in-again-dialog';
import { useSessionQuery } from '@/features/session/hooks/use-session-user';
import { useSessionExpired } from '@/lib/session-expiry';
import { errorMessage } from '@/lib/api-error';
import { AppShell } from '../layout/app-shell';

/**
 * Shows the shell to a signed-in person; anyone else goes to sign in, remembering where they were
 * going. When the session ends while someone works, the page stays and a sign-in dialog opens over it.
 */
export function RequireSession() {
  const location = useLocation();
  const { data: user, isPending, isError, error, refetch } = useSessionQuery();
  const expired = useSessionExpired();

  if (isPending) {
    return (
      <main className="mx-auto max-w-xl p-6">
        <Spinner label="Checking your sign-in…" />
      </main>
    );
  }
  if (isError) {
    return (
      <main className="mx-auto max-w-xl p-6">
        <Banner tone="error" role="alert" title="Could not check your sign-in" action={<Button onClick={() => void refetch()}>Try again</Button>}>
          {errorMessage(error)}
        </Banner>
      </main>
    );
  }
  if (!user) {
    return <Navigate to="/sign-in" replace state={{ from: `${location.pathname}${location.search}` }} />;
  }
  return (
    <>
      <AppShell user={user}>
        <Outlet />
      </AppShell>
      {expired && <SignInAgainDialog user={user} />}
    </>
  );
}
