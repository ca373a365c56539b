// Ask for a link to choose a new password; the answer is the same whether or not the address has an account.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { ForgotPassword } from '../../../../shared/schemas/people';
import { useForgotPassword } from '../api/forgot-password';

export function ForgotPasswordForm() {
  const forgot = useForgotPassword();
  const form = useForm<z.input<typeof ForgotPassword>, unknown, z.output<typeof ForgotPassword>>({ resolver: zodResolver(ForgotPassword), defaultValues: { email: '' } });
  if (forgot.isSuccess) return <Notice testId="forgot-sent">{forgot.data.message} The link works once, for one hour.</Notice>;
  return (
    <form noValidate aria-label="Forgot password" className="flex flex-col gap-4" onSubmit={form.handleSubmit((v) => forgot.mutate(v.email))}>
      <TextField label="E-mail" type="email" autoComplete="username" data-testid="forgot-email" error={form.formState.errors.email?.message} {...form.register('email')} />
      {forgot.isError ? <Notice tone="error">{forgot.error.message}</Notice> : null}
      <Button type="submit" data-testid="forgot-send" disabled={forgot.isPending}>
        {forgot.isPending ? 'Sending…' : 'Send me a link'}
      </Button>
    </form>
  );
}
