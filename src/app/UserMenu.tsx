import { useEffect, useId, useRef, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { useSignOut, type User } from '../lib/session';

function initials(name: string): string {
  const parts = name.trim().split(/[\s-]+/).filter(Boolean);
  return ((parts[0]?.[0] ?? '') + (parts.length > 1 ? parts[parts.length - 1][0] : '')).toUpperCase() || '?';
}

/** The header's account button: shows who is signed in and offers "Sign out". */
export function UserMenu({ user }: { user: User }) {
  const [open, setOpen] = useState(false);
  const menuId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const signOut = useSignOut();
  const navigate = useNavigate();

  useEffect(() => {
    if (!open) return;
    const onDown = (e: MouseEvent) => {
      if (!rootRef.current?.contains(e.target as Node)) setOpen(false);
    };
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') setOpen(false);
    };
    document.addEventListener('mousedown', onDown);
    document.addEventListener('keydown', onKey);
    return () => {
      document.removeEventListener('mousedown', onDown);
      document.removeEventListener('keydown', onKey);
    };
  }, [open]);

  return (
    <div ref={rootRef} className="relative">
      <button
        type="button"
        aria-expanded={open}
        aria-controls={menuId}
        aria-label={`Account: ${user.name}`}
        onClick={() => setOpen((v) => !v)}
        className="flex items-center gap-2 rounded-full py-1 pl-1 pr-3 text-sm text-ink hover:bg-sunken"
      >
        <span aria-hidden="true" className="grid h-8 w-8 place-items-center rounded-full bg-ink text-xs font-semibold tracking-wide text-white">
          {initials(user.name)}
        </span>
        <span className="hidden max-w-40 truncate sm:inline">{user.name}</span>
        <svg aria-hidden="true" width="12" height="12" viewBox="0 0 12 12" className="text-ink-muted">
          <path d="M2.5 4.5L6 8l3.5-3.5" fill="none" stroke="currentColor" strokeWidth="1.6" />
        </svg>
      </button>
      {open && (
        <div id={menuId} className="absolute right-0 z-30 mt-2 w-64 rounded-[var(--radius-card)] border border-line bg-surface p-2 shadow-lg">
          <div className="border-b border-line px-3 pb-3 pt-2">
            <p className="truncate font-medium text-ink">{user.name}</p>
            <p className="truncate text-sm text-ink-muted">{user.email}</p>
          </div>
          <button
            type="button"
            className="mt-2 w-full rounded-md px-3 py-2 text-left text-sm text-ink hover:bg-sunken"
            disabled={signOut.isPending}
            onClick={() =>
              signOut.mutate(undefined, {
                onSettled: () => navigate('/sign-in', { replace: true }),
              })
            }
          >
            {signOut.isPending ? 'Signing out…' : 'Sign out'}
          </button>
        </div>
      )}
    </div>
  );
}
