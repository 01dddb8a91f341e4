import { lazy, Suspense, type ComponentType, type LazyExoticComponent } from 'react';
import { createBrowserRouter, Navigate } from 'react-router-dom';
import { useMe } from '../lib/session';
import { LoadingState } from '../lib/ui';
import { AppShell, type RouteHandle } from './AppShell';
import { NotFoundPage } from './NotFoundPage';
import { RequireAuth } from './RequireAuth';
import { RootLayout } from './RootLayout';
import { RouteErrorPage } from './RouteErrorPage';
import { SHARE_CLIENT_PATH } from '../../server/contract/index.js';

// Auth and workspace pages are small and part of the first load's likely path; the lab pages (which pull in
// the 3D viewer) are lazy so three.js ships in its own chunk.
import SignInPage from '../features/auth/SignInPage';
import SignUpPage from '../features/auth/SignUpPage';
import InviteAcceptPage from '../features/workspaces/InviteAcceptPage';
import MembersTab from '../features/workspaces/MembersTab';
import WorkspacePage from '../features/workspaces/WorkspacePage';
import WorkspacesPage from '../features/workspaces/WorkspacesPage';

const LibraryPage = lazy(() => import('../features/library/LibraryPage'));
const DiagramPage = lazy(() => import('../features/diagram/DiagramPage'));
const SharePage = lazy(() => import('../features/share/SharePage'));

function withSuspense(Page: LazyExoticComponent<ComponentType>, label: string) {
  return (
    <Suspense fallback={<LoadingState label={label} />}>
      <Page />
    </Suspense>
  );
}

/** `/`: to the workspaces when signed in, else to sign-in. */
function HomeRedirect() {
  const { data: user } = useMe();
  return <Navigate to={user ? '/workspaces' : '/sign-in'} replace />;
}

const fullWidth: RouteHandle = { fullWidth: true };

/** All routes of the client. */
export function createAppRouter() {
  return createBrowserRouter([
    {
      element: <RootLayout />,
      errorElement: <RouteErrorPage />,
      children: [
        { index: true, path: '/', element: <HomeRedirect /> },
        { path: '/sign-in', element: <SignInPage /> },
        { path: '/sign-up', element: <SignUpPage /> },
        {
          element: <AppShell />,
          errorElement: <RouteErrorPage />,
          children: [
            {
              element: <RequireAuth />,
              errorElement: <RouteErrorPage inShell />,
              children: [
                { path: '/workspaces', element: <WorkspacesPage /> },
                {
                  path: '/w/:workspaceId',
                  element: <WorkspacePage />,
                  children: [
                    { index: true, element: withSuspense(LibraryPage, 'Loading the library…') },
                    { path: 'members', element: <MembersTab /> },
                  ],
                },
                { path: '/w/:workspaceId/d/:diagramId', handle: fullWidth, element: withSuspense(DiagramPage, 'Loading the diagram lab…') },
                { path: '/invite/:token', element: <InviteAcceptPage /> },
                { path: '/invitations/accept', element: <InviteAcceptPage /> },
              ],
            },
            { path: `${SHARE_CLIENT_PATH}/:token`, handle: fullWidth, element: withSuspense(SharePage, 'Loading the shared diagram…') },
            { path: '*', element: <NotFoundPage /> },
          ],
        },
      ],
    },
  ]);
}
