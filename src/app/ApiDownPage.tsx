import { useState } from 'react';
import { Button, LogoMark } from '../lib/ui';

export interface ApiDownPageProps {
  /** Called by "Try again"; may return a promise (the button shows a spinner meanwhile). */
  onRetry: () => unknown;
  /** Override the headline, e.g. for unexpected server errors. */
  title?: string;
  detail?: string;
}

/** Full-page state when Quadrant's API cannot be reached, with a retry button. */
export function ApiDownPage({ onRetry, title = 'Quadrant’s server is not answering', detail }: ApiDownPageProps) {
  const [busy, setBusy] = useState(false);
  return (
    <main id="main" className="grid min-h-screen place-items-center px-6">
      <div role="alert" className="max-w-md text-center">
        <div className="mx-auto mb-6 w-fit opacity-80">
          <LogoMark size={48} />
        </div>
        <h1 className="text-2xl font-semibold tracking-tight">{title}</h1>
        <p className="mt-3 text-ink-muted">
          {detail ??
            'We could not reach the server. It may be restarting or your connection may be down. Nothing you saved is lost.'}
        </p>
        <Button
          className="mt-6"
          loading={busy}
          onClick={async () => {
            setBusy(true);
            try {
              await onRetry();
            } finally {
              setBusy(false);
            }
          }}
        >
          Try again
        </Button>
      </div>
    </main>
  );
}
