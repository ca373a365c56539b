// The page an invitation link opens: what the invitation offers, then join (new account or sign in).
import { useNavigate, useParams, Link } from 'react-router-dom';
import { Notice } from '../components/ui/notice';
import { Loading } from '../components/ui/spinner';
import { isApiError } from '../lib/api-client';
import { paths } from '../lib/paths';
import { useInvitation } from '../features/people/api/get-invitation';
import { AcceptInvitationForm } from '../features/people/components/accept-invitation-form';
import { AuthFrame } from './auth-frame';

const ROLE_WORDS = { farmer: 'a farmer', advisor: 'the advisor', landowner: 'a landowner' } as const;

export function AcceptInvitationPage() {
  const token = useParams().token ?? '';
  const invitation = useInvitation(token);
  const navigate = useNavigate();
  return (
    <AuthFrame title="You are invited">
      {invitation.isPending ? (
        <Loading label="Reading the invitation…" />
      ) : invitation.isError ? (
        <>
          <Notice tone="error" testId="invitation-closed">
            {isApiError(invitation.error, 404) ? 'This invitation link is not known. Check that the whole link was copied.' : invitation.error.message}
          </Notice>
          <Link to={paths.signIn.getHref()} className="text-sm font-semibold text-clay-dark underline">
            Go to sign in
          </Link>
        </>
      ) : (
        <>
          <p data-testid="invitation-summary">
            {invitation.data.invitedBy ?? 'The farmer'} invites you to <strong>{invitation.data.farmName}</strong> as {ROLE_WORDS[invitation.data.role]}.
          </p>
          <AcceptInvitationForm token={token} invitation={invitation.data} onJoined={(farmId) => navigate(paths.farmMap.getHref(farmId), { replace: true })} />
        </>
      )}
    </AuthFrame>
  );
}

export default AcceptInvitationPage;
