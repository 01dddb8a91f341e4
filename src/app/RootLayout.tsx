import { Outlet, ScrollRestoration } from 'react-router-dom';
import { isApiUnreachable } from '../lib/api';
import { useMe } from '../lib/session';
import { LoadingState } from '../lib/ui';
import { ApiDownPage } from './ApiDownPage';

/** Skip link, then either the page or — when the API is down — the full-page retry state. */
export function RootLayout() {
  const me = useMe();
  if (me.isPending) {
    return (
      <main id="main" className="min-h-screen">
        <LoadingState label="Opening Quadrant…" />
      </main>
    );
  }
  if (me.isError) {
    const down = isApiUnreachable(me.error);
    return (
      <ApiDownPage
        onRetry={() => me.refetch()}
        title={down ? undefined : 'Quadrant could not start'}
        detail={down ? undefined : 'The server answered with an unexpected error. Trying again usually helps.'}
      />
    );
  }
  return (
    <>
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:fixed focus:left-4 focus:top-3 focus:z-50 focus:rounded-md focus:bg-ink focus:px-4 focus:py-2 focus:text-white"
      >
        Skip to main content
      </a>
      <Outlet />
      <ScrollRestoration />
    </>
  );
}
