import type { ReactNode } from 'react';
import { ButtonLink } from './Button';

export interface NotFoundViewProps {
  title?: string;
  /** Defaults to a sentence naming `path`. */
  message?: ReactNode;
  path?: string;
  /** Where the button goes; defaults to "/" with "Go to your workspaces". */
  backTo?: string;
  backLabel?: string;
}

/** The 404 view: used by the catch-all route and by pages whose object does not exist (or is not shared with you). */
export function NotFoundView({ title = 'Page not found', message, path, backTo = '/', backLabel = 'Go to your workspaces' }: NotFoundViewProps) {
  return (
    <section className="mx-auto max-w-xl py-16 text-center" aria-labelledby="not-found-title">
      <p className="font-mono text-sm tracking-widest text-ink-faint">404</p>
      <h1 id="not-found-title" className="mt-2 text-3xl font-semibold tracking-tight">
        {title}
      </h1>
      <p className="mt-3 text-ink-muted">
        {message ??
          (path ? (
            <>
              Nothing lives at <code className="rounded bg-sunken px-1.5 py-0.5 font-mono text-sm text-ink">{path}</code>. The link may be
              mistyped, or the page may have moved.
            </>
          ) : (
            'The link may be mistyped, or the page may have moved.'
          ))}
      </p>
      <ButtonLink to={backTo} className="mt-8">
        {backLabel}
      </ButtonLink>
    </section>
  );
}
