import { useLocation } from 'react-router-dom';
import { NotFoundView } from '../lib/ui';

/** The catch-all 404 route. */
export function NotFoundPage() {
  const { pathname } = useLocation();
  return <NotFoundView path={pathname} />;
}
