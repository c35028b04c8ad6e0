import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { ShowPasswordButton } from '@/components/ui/show-password-button';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { signInSchema, type SignInInput } from '@shared/schemas/session';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/text-input';
import { applyServerErrors } from '@/lib/apply-server-errors';
import { errorMessage } from '@/lib/api-error';
import { useSignIn } from '@/api/session';

type SignInFields = z.input<typeof signInSchema>;
const FIELD_NAMES = ['email', 'password'] as const;

/** E-mail and password form; on success the session query holds the person and the page moves on. */
export function SignInForm() {
  const signIn = useSignIn();
  const [showPassword, setShowPassword] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<SignInFields, unknown, SignInInput>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: '', password: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    try {
      await signIn.mutateAsync(values);
    } catch (error) {
      applyServerErrors({ setError }, error, FIELD_NAMES);
    }
  });

  const busy = isSubmitting || signIn.isPending;

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-6" aria-label="Sign in">
      {signIn.isError && (
        <Banner tone="error" role="alert" title="You are not signed in yet">
          {errorMessage(signIn.error)}
        </Banner>
      )}
      <Field label="E-mail" error={errors.email?.message}>
        <TextInput
          type="email"
          autoComplete="username"
          inputMode="email"
          autoCapitalize="none"
          spellCheck={false}
          {...register('email')}
        />
      </Field>
      <Field label="Password" error={errors.password?.message}>
        <TextInput type={showPassword ? 'text' : 'password'} autoComplete="current-password" {...register('password')} />
      </Field>
      <ShowPasswordButton shown={showPassword} onToggle={() => setShowPassword((shown) => !shown)}>
        Show password
      </ShowPasswordButton>
      <Button type="submit" size="lg" block disabled={busy}>
        {busy ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
