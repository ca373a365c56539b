// Sign in.
import { Link, Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { SignInForm } from '../features/auth/components/sign-in-form';
import { useMe } from '../features/auth/api/get-me';
import { useConfig } from '../features/config/api/get-config';
import { paths } from '../lib/paths';
import { AuthFrame } from './auth-frame';

/** Only same-site paths are followed after signing in. */
const safeRedirect = (to: string | null) => (to && to.startsWith('/') && !to.startsWith('//') ? to : paths.farms.getHref());

export function SignInPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const me = useMe();
  const config = useConfig();
  const redirectTo = safeRedirect(params.get('redirectTo'));
  if (me.data) return <Navigate to={redirectTo} replace />;

  return (
    <AuthFrame title="Sign in">
      <SignInForm onSuccess={() => navigate(redirectTo, { replace: true })} />
      <Link to={paths.forgotPassword.getHref()} className="text-sm font-semibold text-clay-dark underline" data-testid="forgot-link">
        Forgot your password?
      </Link>
      <p className="text-sm">
        New to Fieldshed?{' '}
        <Link to={paths.register.getHref()} className="font-semibold text-clay-dark underline">
          Create an account
        </Link>
      </p>
      {config.data?.devMailbox ? (
        <p className="text-sm text-ink-soft">
          Mail stays on this machine:{' '}
          <Link to={paths.devMailbox.getHref()} className="font-semibold text-clay-dark underline" data-testid="dev-mailbox-link">
            open the Dev mailbox
          </Link>
        </p>
      ) : null}
    </AuthFrame>
  );
}
