// Create an account: the new user becomes the farmer of a new farm once the mailed link is opened.
import { Link } from 'react-router-dom';
import { RegisterForm } from '../features/auth/components/register-form';
import { paths } from '../lib/paths';
import { AuthFrame } from './auth-frame';

export function RegisterPage() {
  return (
    <AuthFrame title="Create an account">
      <p className="text-sm text-ink-soft">You will be the farmer of a new farm; you can invite your advisor and landowners later.</p>
      <RegisterForm />
      <p className="text-sm">
        Already have an account?{' '}
        <Link to={paths.signIn.getHref()} className="font-semibold text-clay-dark underline">
          Sign in
        </Link>
      </p>
    </AuthFrame>
  );
}
