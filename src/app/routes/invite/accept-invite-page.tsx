import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { Banner } from '@/components/ui/banner';
import { buttonVariants } from '@/components/ui/button';
import { Spinner } from '@/components/ui/spinner';
import { invitePreviewOptions } from '@/api/admin-users';
import { AcceptInviteForm } from '@/features/admin-users/components/accept-invite-form';
import { errorMessage } from '@/lib/api-error';
import { PRODUCT_NAME, useDocumentTitle } from '@/lib/use-document-title';

/** Public page behind the invitation e-mail: the person chooses a password and the account opens. */
export function AcceptInvitePage() {
  useDocumentTitle('Accept your invitation');
  const { token = '' } = useParams();
  const preview = useQuery(invitePreviewOptions(token));
  const [accepted, setAccepted] = useState(false);

  return (
    <main id="main" className="flex min-h-screen items-start justify-center bg-surface px-4 py-10 sm:items-center">
      <div className="w-full max-w-md space-y-6 rounded-2xl border border-surface-line bg-surface-raised p-6 shadow-sm sm:p-8">
        <p className="text-3xl font-bold tracking-tight text-ink">{PRODUCT_NAME}</p>
        <h1 className="text-2xl font-semibold text-ink">Accept your invitation</h1>
        {accepted ? (
          <Banner role="status" title="Your account is open" action={<Link to="/sign-in" className={buttonVariants()}>Sign in</Link>}>
            Sign in with {preview.data?.email} and the password you just chose.
          </Banner>
        ) : preview.isPending ? (
          <Spinner label="Checking your invitation…" />
        ) : preview.isError ? (
          <Banner tone="error" role="alert" title="This link cannot be used">
            {errorMessage(preview.error)}
          </Banner>
        ) : (
          <>
            <p className="text-lg text-ink">
              Welcome, {preview.data.name}. Choose a password for <strong>{preview.data.email}</strong>.
            </p>
            <AcceptInviteForm token={token} email={preview.data.email} onAccepted={() => setAccepted(true)} />
          </>
        )}
      </div>
    </main>
  );
}
