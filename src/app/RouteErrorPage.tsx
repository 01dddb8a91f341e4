import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { errorMessage, hasStatus, isApiUnreachable } from '../lib/api';
import { Button } from '../lib/ui';
import { ApiDownPage } from './ApiDownPage';
import { NotFoundPage } from './NotFoundPage';

/**
 * Route-level error boundary (`inShell`: rendered inside the signed-in layout, keeping its header) (the router's errorElement). Shows 404s as the not-found page, an unreachable
 * API as the full-page retry state, a failed lazy chunk as "reload", and anything else as a calm message.
 */
export function RouteErrorPage({ inShell = false }: { inShell?: boolean }) {
  const error = useRouteError();
  // Inside the app shell the header stays and the shell already provides <main>.
  const Frame = inShell ? 'section' : 'main';
  if ((isRouteErrorResponse(error) && error.status === 404) || hasStatus(error, 404)) {
    return (
      <Frame id={inShell ? undefined : 'main'} className="px-6">
        <NotFoundPage />
      </Frame>
    );
  }
  if (isApiUnreachable(error) && !inShell) return <ApiDownPage onRetry={() => window.location.reload()} />;
  const chunkFailed = error instanceof Error && /dynamically imported module|Failed to fetch|Importing a module script failed/i.test(error.message);
  return (
    <Frame id={inShell ? undefined : 'main'} className="mx-auto max-w-xl px-6 py-20 text-center">
      <div role="alert">
        <h1 className="text-2xl font-semibold tracking-tight">
          {chunkFailed ? 'Quadrant was updated' : isApiUnreachable(error) ? 'Quadrant’s server is not answering' : 'Something went wrong on this page'}
        </h1>
        <p className="mt-3 text-ink-muted">
          {chunkFailed
            ? 'A part of the app could not be loaded, probably because a new version was published. Reloading fixes it.'
            : 'The page hit an unexpected error. Reloading usually helps; your saved work is safe.'}
        </p>
        {!chunkFailed && (
          <pre className="mt-4 overflow-x-auto rounded-md bg-sunken px-3 py-2 text-left font-mono text-xs text-ink-muted">
            {isRouteErrorResponse(error) ? `${error.status} ${error.statusText}` : errorMessage(error)}
          </pre>
        )}
        <Button className="mt-6" onClick={() => window.location.reload()}>
          Reload the page
        </Button>
      </div>
    </Frame>
  );
}
