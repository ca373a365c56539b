// Sign in with e-mail and password (shared Login schema).
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { isApiError } from '../../../lib/api-client';
import { Login } from '../../../../shared/schemas/auth';
import { useLogin } from '../api/login';

export function SignInForm({ onSuccess }: { onSuccess: () => void }) {
  const login = useLogin();
  const form = useForm<z.input<typeof Login>, unknown, z.output<typeof Login>>({
    resolver: zodResolver(Login),
    defaultValues: { email: '', password: '' },
  });
  const { errors } = form.formState;

  const submitError = login.error
    ? isApiError(login.error, 401)
      ? 'That e-mail and password do not match an account.'
      : login.error.message
    : null;

  return (
    <form
      noValidate
      aria-label="Sign in"
      className="flex flex-col gap-4"
      onSubmit={form.handleSubmit((values) => login.mutate(values, { onSuccess }))}
    >
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        data-testid="email"
        error={errors.email?.message}
        {...form.register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        data-testid="password"
        error={errors.password?.message}
        {...form.register('password')}
      />
      {submitError ? <Notice tone="error">{submitError}</Notice> : null}
      <Button type="submit" data-testid="sign-in" disabled={login.isPending}>
        {login.isPending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
