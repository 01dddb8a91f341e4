import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { signInPathFor } from '../lib/navigation';
import { useMe } from '../lib/session';

/** Renders child routes for signed-in users; sends everyone else to /sign-in and back afterwards. */
export function RequireAuth() {
  const { data: user } = useMe();
  const location = useLocation();
  if (!user) return <Navigate to={signInPathFor(location.pathname + location.search + location.hash)} replace />;
  return <Outlet />;
}
