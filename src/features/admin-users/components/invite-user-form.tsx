import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { userInviteSchema, type UserInviteInput } from '@shared/schemas/admin-users';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/text-input';
import { applyServerErrors } from '@/lib/apply-server-errors';
import { errorMessage } from '@/lib/api-error';
import { useInviteUser } from '@/api/admin-users';
import { RoleSelect } from './role-select';

type Fields = z.input<typeof userInviteSchema>;
const NAMES = ['email', 'name', 'role'] as const;

/** Creates the account closed and e-mails a link; the person opens it by choosing a password. */
export function InviteUserForm() {
  const invite = useInviteUser();
  const { register, handleSubmit, setError, reset, formState: { errors } } = useForm<Fields, unknown, UserInviteInput>({
    resolver: zodResolver(userInviteSchema),
    defaultValues: { email: '', name: '', role: 'technician' },
  });

  const onSubmit = handleSubmit(async (values) => {
    try {
      await invite.mutateAsync(values);
      reset();
    } catch (error) {
      applyServerErrors({ setError }, error, NAMES);
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4 rounded-lg border border-surface-line bg-surface-raised p-4" aria-label="Invite a person">
      <h2 className="text-xl font-semibold text-ink">Invite a person</h2>
      {invite.isError && (
        <Banner tone="error" role="alert" title="No invitation was sent">
          {errorMessage(invite.error)}
        </Banner>
      )}
      {invite.isSuccess && (
        <Banner role="status" title={`Invitation queued for ${invite.data.email}`}>
          The link works once and expires in seven days. The account opens when they choose a password.
        </Banner>
      )}
      <div className="grid gap-4 md:grid-cols-3">
        <Field label="E-mail" error={errors.email?.message}>
          <TextInput type="email" inputMode="email" autoCapitalize="none" spellCheck={false} {...register('email')} />
        </Field>
        <Field label="Name" error={errors.name?.message}>
          <TextInput {...register('name')} />
        </Field>
        <Field label="Role" error={errors.role?.message}>
          <RoleSelect {...register('role')} />
        </Field>
      </div>
      <Button type="submit" disabled={invite.isPending}>
        {invite.isPending ? 'Sending…' : 'Send invitation'}
      </Button>
    </form>
  );
}
