// The page a password link opens: choose the new password, then on to your farms.
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { Notice } from '../components/ui/notice';
import { ResetPasswordForm } from '../features/auth/components/reset-password-form';
import { paths } from '../lib/paths';
import { AuthFrame } from './auth-frame';

export function ResetPasswordPage() {
  const token = useSearchParams()[0].get('token');
  const navigate = useNavigate();
  return (
    <AuthFrame title="Choose a new password">
      {token ? (
        <ResetPasswordForm token={token} onDone={() => navigate(paths.farms.getHref(), { replace: true })} />
      ) : (
        <Notice tone="error">This page needs the link from the mail. Ask for a new one if it is lost.</Notice>
      )}
      <Link to={paths.forgotPassword.getHref()} className="text-sm font-semibold text-clay-dark underline">
        Ask for a new link
      </Link>
    </AuthFrame>
  );
}

export default ResetPasswordPage;
