import { useQueryClient } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import type { SessionUser } from '@shared/schemas/session';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Modal } from '@/components/ui/modal';
import { TextInput } from '@/components/ui/text-input';
import { sessionKeys, useSignInAgain } from '@/api/session';
import { errorMessage, isApiError } from '@/lib/api-error';
import { sessionExpiry } from '@/lib/session-expiry';

/**
 * Opens over the page when the session ended under the person (signed out on another tab, timed
 * out). The page and what is typed on it stay; the same person signs in with their password and the
 * saves that were waiting go out. Someone else signs in on the sign-in page instead.
 */
export function SignInAgainDialog({ user }: { user: SessionUser }) {
  const queryClient = useQueryClient();
  const signIn = useSignInAgain();
  const [password, setPassword] = useState('');
  const [missing, setMissing] = useState(false);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!password) {
      setMissing(true);
      return;
    }
    signIn.mutate({ email: user.email, password });
  };

  const someoneElse = () => {
    sessionExpiry.abandon();
    queryClient.setQueryData(sessionKeys.all, null);
    queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionKeys.all[0] });
  };

  const wrongPassword = isApiError(signIn.error) && signIn.error.status === 401;
  return (
    <Modal title="Sign in again to keep working">
      <p className="text-lg text-ink">
        Your session ended: you were signed out on another tab or device, or it timed out. This page and everything you typed on it are kept. Sign in as{' '}
        <span className="font-semibold">{user.name}</span> and anything waiting to be saved is sent.
      </p>
      <form onSubmit={submit} noValidate aria-label="Sign in again" className="space-y-5">
        <p className="text-lg text-ink">
          <span className="font-semibold">E-mail: </span>
          {user.email}
        </p>
        <Field label="Password" error={missing ? 'Type your password.' : wrongPassword ? 'That password is not right. Type it again.' : undefined}>
          <TextInput
            type="password"
            autoComplete="current-password"
            value={password}
            onChange={(event) => {
              setMissing(false);
              setPassword(event.target.value);
            }}
          />
        </Field>
        {signIn.isError && !wrongPassword && (
          <Banner tone="error" role="alert" title="Not signed in yet">
            {errorMessage(signIn.error)}
          </Banner>
        )}
        <div className="flex flex-col gap-3 sm:flex-row sm:justify-between">
          <Button variant="secondary" size="lg" onClick={someoneElse} disabled={signIn.isPending}>
            Sign in as someone else
          </Button>
          <Button type="submit" size="lg" disabled={signIn.isPending}>
            {signIn.isPending ? 'Signing in…' : 'Sign in and continue'}
          </Button>
        </div>
      </form>
    </Modal>
  );
}
