import { useLocation } from 'react-router-dom';
import { NotFoundView } from '../lib/ui';
import { useDocumentTitle } from '../lib/document-title';

/** The catch-all 404 route. */
export function NotFoundPage() {
  const { pathname } = useLocation();
  useDocumentTitle('Page not found');
  return <NotFoundView path={pathname} />;
}
