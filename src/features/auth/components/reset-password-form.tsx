// Choose a new password from a mailed link.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { NewPassword } from '../../../../shared/schemas/people';
import { useResetPassword } from '../api/reset-password';
import { PASSWORD_HINT } from '../../../../shared/schemas/password';

const Form = z.object({ password: NewPassword });

export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const reset = useResetPassword();
  const form = useForm<z.infer<typeof Form>>({ resolver: zodResolver(Form), defaultValues: { password: '' } });
  return (
    <form noValidate aria-label="Choose a new password" className="flex flex-col gap-4" onSubmit={form.handleSubmit((v) => reset.mutate({ token, password: v.password }, { onSuccess: onDone }))}>
      <TextField label="New password" type="password" autoComplete="new-password" hint={`${PASSWORD_HINT} Every other place you are signed in is signed out.`} data-testid="reset-password" error={form.formState.errors.password?.message} {...form.register('password')} />
      {reset.isError ? <Notice tone="error">{reset.error.message}</Notice> : null}
      <Button type="submit" data-testid="reset-save" disabled={reset.isPending}>
        {reset.isPending ? 'Saving…' : 'Save and sign in'}
      </Button>
    </form>
  );
}
