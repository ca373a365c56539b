// Forgot password: ask for a mailed link.
import { Link } from 'react-router-dom';
import { ForgotPasswordForm } from '../features/auth/components/forgot-password-form';
import { paths } from '../lib/paths';
import { AuthFrame } from './auth-frame';

export function ForgotPasswordPage() {
  return (
    <AuthFrame title="Forgot your password?">
      <p className="text-sm text-ink-soft">Give the address you sign in with, and we mail you a link to choose a new password.</p>
      <ForgotPasswordForm />
      <Link to={paths.signIn.getHref()} className="text-sm font-semibold text-clay-dark underline">
        Back to sign in
      </Link>
    </AuthFrame>
  );
}

export default ForgotPasswordPage;
