// Routes inside need a signed-in user; others are sent to Sign in and come back afterwards.
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { Loading } from '../../../components/ui/spinner';
import { Notice } from '../../../components/ui/notice';
import { paths } from '../../../lib/paths';
import { useMe } from '../api/get-me';

export function RequireAuth() {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) return <Loading label="Checking your session…" />;
  if (me.isError)
    return (
      <div className="p-6">
        <Notice tone="error" title="Fieldshed cannot reach its server">
          {me.error.message}
        </Notice>
      </div>
    );
  if (!me.data) return <Navigate to={paths.signIn.getHref(location.pathname + location.search)} replace />;
  return <Outlet />;
}
