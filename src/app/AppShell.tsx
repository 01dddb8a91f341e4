import { Link, NavLink, Outlet, useMatches, useParams } from 'react-router-dom';
import { useWorkspace } from '../lib/workspace';
import { useMe } from '../lib/session';
import { Logo, cx } from '../lib/ui';
import { UserMenu } from './UserMenu';

/** Route `handle` flags read by the shell. */
export interface RouteHandle {
  /** Let the page use the full window width (the diagram lab). */
  fullWidth?: boolean;
}

function CurrentWorkspaceCrumb({ workspaceId }: { workspaceId: string }) {
  const { data } = useWorkspace(workspaceId);
  if (!data) return null;
  return (
    <>
      <span aria-hidden="true" className="text-line-strong">
        /
      </span>
      <NavLink
        to={`/w/${workspaceId}`}
        end
        className="max-w-[16rem] truncate rounded px-1.5 py-1 text-ink no-underline hover:bg-sunken hover:text-ink"
      >
        {data.workspace.name}
      </NavLink>
    </>
  );
}

/** The signed-in layout: header with logo, workspace navigation and the user menu; then the page. */
export function AppShell() {
  const { data: user } = useMe();
  const { workspaceId } = useParams();
  const matches = useMatches();
  const fullWidth = matches.some((m) => (m.handle as RouteHandle | undefined)?.fullWidth);

  return (
    <div className="flex min-h-screen flex-col">
      <header className="sticky top-0 z-20 border-b border-line bg-paper/95 backdrop-blur">
        <div className={cx('mx-auto flex h-16 items-center gap-4 px-4 sm:px-6', !fullWidth && 'max-w-6xl')}>
          <Link to="/" className="rounded-md no-underline" aria-label="Quadrant home">
            <Logo />
          </Link>
          <nav aria-label="Workspace" className="ml-2 flex min-w-0 items-center gap-1 text-sm">
            {user && (
              <NavLink
                to="/workspaces"
                end
                className={({ isActive }) =>
                  cx('rounded px-2 py-1 no-underline hover:bg-sunken hover:text-ink', isActive ? 'font-medium text-ink' : 'text-ink-muted')
                }
              >
                Workspaces
              </NavLink>
            )}
            {user && workspaceId && <CurrentWorkspaceCrumb workspaceId={workspaceId} />}
          </nav>
          <div className="ml-auto flex items-center gap-2">
            {user ? (
              <UserMenu user={user} />
            ) : (
              <Link to="/sign-in" className="rounded px-3 py-1.5 text-sm font-medium">
                Sign in
              </Link>
            )}
          </div>
        </div>
      </header>
      <main id="main" tabIndex={-1} className={cx('flex-1 outline-none', fullWidth ? 'w-full' : 'mx-auto w-full max-w-6xl px-4 py-8 sm:px-6 sm:py-10')}>
        <Outlet />
      </main>
      {!fullWidth && (
        <footer className="border-t border-line">
          <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-x-6 gap-y-2 px-4 py-5 text-xs text-ink-faint sm:px-6">
            <span>Quadrant — Heegaard diagrams on triangulated surfaces</span>
            <span className="flex shrink-0 items-center gap-3">
              <span className="sr-only">Curve colours:</span>
              <span className="inline-flex items-center gap-1.5 whitespace-nowrap">
                <span aria-hidden="true" className="h-0.5 w-4 rounded bg-curve-alpha" />α curves
              </span>
              <span className="inline-flex items-center gap-1.5 whitespace-nowrap">
                <span aria-hidden="true" className="h-0.5 w-4 rounded bg-curve-beta" />β curves
              </span>
            </span>
          </div>
        </footer>
      )}
    </div>
  );
}
