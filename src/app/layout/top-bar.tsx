import { Link } from 'react-router-dom';
import { ROLE_LABELS } from '@shared/schemas/roles';
import type { SessionUser } from '@shared/schemas/session';
import { Button } from '@/components/ui/button';
import { useSignOut } from '@/api/session';
import { errorMessage } from '@/lib/api-error';
import { PRODUCT_NAME } from '@/lib/use-document-title';
import { ROLE_HOME } from '../access';

export function TopBar({ user }: { user: SessionUser }) {
  const signOut = useSignOut();
  return (
    <div className="mx-auto flex max-w-5xl flex-wrap items-center justify-between gap-3 px-4 py-3 sm:px-6">
      <Link
        to={ROLE_HOME[user.role]}
        className="inline-flex min-h-touch items-center rounded-lg text-2xl font-bold tracking-tight text-ink focus-visible:outline-none focus-visible:ring-[3px] focus-visible:ring-accent"
      >
        {PRODUCT_NAME}
      </Link>
      <div className="flex items-center gap-4">
        <p className="text-right leading-tight">
          <span className="block text-lg font-semibold text-ink">{user.name}</span>
          <span className="block text-base text-ink-muted">{ROLE_LABELS[user.role]}</span>
        </p>
        <Button variant="secondary" disabled={signOut.isPending} onClick={() => signOut.mutate()}>
          {signOut.isPending ? 'Signing out…' : 'Sign out'}
        </Button>
      </div>
      {signOut.isError && (
        <p role="alert" className="w-full text-base font-medium text-verdict-out_of_band">
          Sign-out did not finish: {errorMessage(signOut.error)}
        </p>
      )}
    </div>
  );
}
