import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { ShowPasswordButton } from '@/components/ui/show-password-button';
import { useForm } from 'react-hook-form';
import { inviteAcceptFormSchema, PASSWORD_MIN_LENGTH, type InviteAcceptForm as Fields } from '@shared/schemas/admin-users';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/text-input';
import { applyServerErrors } from '@/lib/apply-server-errors';
import { errorMessage } from '@/lib/api-error';
import { useAcceptInvite } from '@/api/admin-users';

/** Choose a password (twice); on success the account is open and the person signs in. */
export function AcceptInviteForm({ token, email, onAccepted }: { token: string; email: string; onAccepted: () => void }) {
  const accept = useAcceptInvite(token);
  const [show, setShow] = useState(false);
  const { register, handleSubmit, setError, formState: { errors } } = useForm<Fields>({
    resolver: zodResolver(inviteAcceptFormSchema),
    defaultValues: { password: '', confirmPassword: '' },
  });

  const onSubmit = handleSubmit(async ({ password }) => {
    try {
      await accept.mutateAsync(password);
      onAccepted();
    } catch (error) {
      applyServerErrors({ setError }, error, ['password']);
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-6" aria-label="Choose your password">
      {accept.isError && (
        <Banner tone="error" role="alert" title="Your password was not set">
          {errorMessage(accept.error)}
        </Banner>
      )}
      {/* Lets a password manager file the new password under the right account. */}
      <input type="email" name="username" autoComplete="username" value={email} readOnly hidden />
      <Field label="New password" hint={`At least ${PASSWORD_MIN_LENGTH} characters; a short sentence works well`} error={errors.password?.message}>
        <TextInput type={show ? 'text' : 'password'} autoComplete="new-password" {...register('password')} />
      </Field>
      <Field label="Type it again" error={errors.confirmPassword?.message}>
        <TextInput type={show ? 'text' : 'password'} autoComplete="new-password" {...register('confirmPassword')} />
      </Field>
      <ShowPasswordButton shown={show} onToggle={() => setShow((s) => !s)}>
        Show passwords
      </ShowPasswordButton>
      <Button type="submit" size="lg" block disabled={accept.isPending}>
        {accept.isPending ? 'Setting your password…' : 'Set password and open my account'}
      </Button>
    </form>
  );
}
