// Change the password while signed in; other sessions end, this one stays.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { ChangePassword } from '../../../../shared/schemas/people';
import { useChangePassword } from '../api/change-password';
import { PASSWORD_HINT } from '../../../../shared/schemas/password';

export function ChangePasswordForm() {
  const change = useChangePassword();
  const form = useForm<z.infer<typeof ChangePassword>>({ resolver: zodResolver(ChangePassword), defaultValues: { currentPassword: '', newPassword: '' } });
  const { errors } = form.formState;
  const serverIssue = (path: string) => (change.error && 'issues' in change.error ? (change.error as { issues: { path: string; message: string }[] }).issues.find((i) => i.path === path)?.message : undefined);
  return (
    <form noValidate aria-label="Change password" className="flex flex-col gap-3" onSubmit={form.handleSubmit((v) => change.mutate(v, { onSuccess: () => form.reset() }))}>
      <TextField label="Current password" type="password" autoComplete="current-password" error={errors.currentPassword?.message ?? serverIssue('currentPassword')} {...form.register('currentPassword')} />
      <TextField label="New password" type="password" autoComplete="new-password" hint={PASSWORD_HINT} error={errors.newPassword?.message ?? serverIssue('newPassword')} {...form.register('newPassword')} />
      {change.isSuccess ? <Notice>Saved. Every other place you were signed in is signed out.</Notice> : null}
      {change.isError && !serverIssue('currentPassword') && !serverIssue('newPassword') ? <Notice tone="error">{change.error.message}</Notice> : null}
      <div>
        <Button type="submit" disabled={change.isPending}>
          {change.isPending ? 'Saving…' : 'Change the password'}
        </Button>
      </div>
    </form>
  );
}
