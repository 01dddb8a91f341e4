/**
 * Safe "return to" handling for sign-in: only same-app absolute paths are accepted, so a crafted
 * `?next=https://elsewhere` or `//elsewhere` cannot redirect off-site.
 */
export function safeNextPath(next: string | null | undefined, fallback = '/workspaces'): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return fallback;
  if (next.startsWith('/sign-in') || next.startsWith('/sign-up')) return fallback;
  return next;
}

/** The sign-in URL that returns to `path` afterwards. */
export function signInPathFor(path: string): string {
  return path && path !== '/' ? `/sign-in?next=${encodeURIComponent(path)}` : '/sign-in';
}
