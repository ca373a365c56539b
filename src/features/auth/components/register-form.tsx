// Ask for an account and its first farm (shared Register schema); the rest follows by mail. Server issues on a named
// input are shown under that input.
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { isApiError } from '../../../lib/api-client';
import { Register } from '../../../../shared/schemas/auth';
import { useRegister } from '../api/register';
import { PASSWORD_HINT } from '../../../../shared/schemas/password';

type Values = z.input<typeof Register>;
const NAMES: (keyof Values)[] = ['name', 'email', 'password', 'farmName'];

export function RegisterForm() {
  const registerAccount = useRegister();
  const form = useForm<Values, unknown, z.output<typeof Register>>({
    resolver: zodResolver(Register),
    defaultValues: { name: '', email: '', password: '', farmName: '' },
  });
  const { errors } = form.formState;

  // Put the server's per-input issues beside their inputs.
  const error = registerAccount.error;
  useEffect(() => {
    if (!isApiError(error)) return;
    for (const issue of error.issues) {
      const name = issue.path.split('.')[0] as keyof Values;
      if (NAMES.includes(name)) form.setError(name, { message: issue.message });
    }
  }, [error, form]);
  const placedOnInputs = isApiError(error) && error.issues.some((i) => NAMES.includes(i.path.split('.')[0] as keyof Values));

  if (registerAccount.isSuccess) return <Notice testId="register-sent">{registerAccount.data.message}</Notice>;
  return (
    <form
      noValidate
      aria-label="Create an account"
      className="flex flex-col gap-4"
      onSubmit={form.handleSubmit((values) => registerAccount.mutate(values))}
    >
      <TextField label="Your name" autoComplete="name" data-testid="register-name" error={errors.name?.message} {...form.register('name')} />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        data-testid="register-email"
        error={errors.email?.message}
        {...form.register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={PASSWORD_HINT}
        data-testid="register-password"
        error={errors.password?.message}
        {...form.register('password')}
      />
      <TextField
        label="Farm name"
        autoComplete="organization"
        data-testid="register-farm-name"
        error={errors.farmName?.message}
        {...form.register('farmName')}
      />
      {error && !placedOnInputs ? <Notice tone="error">{error.message}</Notice> : null}
      <Button type="submit" data-testid="register-submit" disabled={registerAccount.isPending}>
        {registerAccount.isPending ? 'Creating your account…' : 'Create the account'}
      </Button>
    </form>
  );
}
