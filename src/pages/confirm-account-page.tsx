// The page the "finish creating your account" link opens: one button makes the account and its
// farm, then on to your farms. A button rather than an automatic request, so a mail scanner that
// opens links does not use the link up.
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { Button } from '../components/ui/button';
import { Notice } from '../components/ui/notice';
import { useConfirmRegistration } from '../features/auth/api/register';
import { paths } from '../lib/paths';
import { AuthFrame } from './auth-frame';

export function ConfirmAccountPage() {
  const token = useSearchParams()[0].get('token');
  const navigate = useNavigate();
  const confirm = useConfirmRegistration();
  return (
    <AuthFrame title="Finish creating your account">
      {token ? (
        <>
          <p className="text-sm text-ink-soft">You will be the farmer of the new farm; you can invite your advisor and landowners later.</p>
          {confirm.isError ? <Notice tone="error">{confirm.error.message}</Notice> : null}
          <Button
            type="button"
            data-testid="confirm-account"
            disabled={confirm.isPending}
            onClick={() => confirm.mutate(token, { onSuccess: () => navigate(paths.farms.getHref(), { replace: true }) })}
          >
            {confirm.isPending ? 'Creating your account…' : 'Create the account'}
          </Button>
        </>
      ) : (
        <Notice tone="error">This page needs the link from the mail. Create the account again if it is lost.</Notice>
      )}
      <Link to={paths.signIn.getHref()} className="text-sm font-semibold text-clay-dark underline">
        Sign in instead
      </Link>
    </AuthFrame>
  );
}
