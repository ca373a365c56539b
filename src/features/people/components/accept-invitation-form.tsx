// Answering an invitation: a name and a new password, or the password of the account the
// address already has.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { NewPassword } from '../../../../shared/schemas/people';
import { PASSWORD_HINT } from '../../../../shared/schemas/password';
import { plainText } from '../../../../shared/schemas/plain-text';
import type { InvitationView } from '../../../../shared/schemas/people';
import { useAcceptInvitation } from '../api/accept-invitation';

const NewAccount = z.object({ name: plainText('name', 120, 'name is required'), password: NewPassword });
const Existing = z.object({ password: z.string().min(1, 'password is required') });
type Values = { name?: string; password: string };

export function AcceptInvitationForm({ token, invitation, onJoined }: { token: string; invitation: InvitationView; onJoined: (farmId: number) => void }) {
  const accept = useAcceptInvitation(token);
  const form = useForm<Values>({ resolver: zodResolver(invitation.hasAccount ? Existing : NewAccount), defaultValues: { name: '', password: '' } });
  const { errors } = form.formState;
  return (
    <form noValidate aria-label="Accept the invitation" className="flex flex-col gap-4" onSubmit={form.handleSubmit((v) => accept.mutate(v, { onSuccess: (r) => onJoined(r.farmId) }))}>
      <TextField label="E-mail" value={invitation.email} readOnly autoComplete="username" />
      {invitation.hasAccount ? (
        <p className="text-sm text-ink-soft">This address has a Fieldshed account: sign in with its password to join.</p>
      ) : (
        <TextField label="Your name" autoComplete="name" data-testid="accept-name" error={errors.name?.message} {...form.register('name')} />
      )}
      <TextField
        label={invitation.hasAccount ? 'Password' : 'Choose a password'}
        type="password"
        autoComplete={invitation.hasAccount ? 'current-password' : 'new-password'}
        hint={invitation.hasAccount ? undefined : PASSWORD_HINT}
        data-testid="accept-password"
        error={errors.password?.message}
        {...form.register('password')}
      />
      {accept.isError ? <Notice tone="error">{accept.error.message}</Notice> : null}
      <Button type="submit" data-testid="accept-join" disabled={accept.isPending}>
        {accept.isPending ? 'Joining…' : `Join ${invitation.farmName}`}
      </Button>
    </form>
  );
}
