import type { ReactNode } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import type { Capability } from '@shared/roles';
import { createBrowserRouter, redirect, type LoaderFunctionArgs } from 'react-router';
import { Loading } from '../components/ui/loading';
import { ForgotPasswordPage } from '../features/account/components/forgot-password-page';
import { EditTemplatePage, NewTemplatePage } from '../features/checks/components/templates/template-editor-page';
import { TemplatesPage } from '../features/checks/components/templates/templates-page';
import { EditEventPage } from '../features/events/components/edit-event-page';
import { EventsPage } from '../features/events/components/events-page';
import { NewEventPage } from '../features/events/components/new-event-page';
import { MailboxPage } from '../features/mailbox/components/mailbox-page';
import { sessionQueryOptions } from '../features/session/api/get-session';
import { SignInPage } from '../features/session/components/sign-in-page';
import { safeNext, signInPath } from '../lib/safe-next';
import { AppShell } from './app-shell';
import { MorePage } from './more-page';
import { RequireCapability } from './require-capability';
import { NotFound, RouteError } from './route-error';
import { AccountLinkRoute } from './routes/account-route';
import { BatteriesRoute, BatteryLabelsRoute, BatteryRoute } from './routes/batteries-route';
import { BoardRoute } from './routes/board-route';
import { ChecksRoute, RunRoute } from './routes/checks-route';
import { NewRepairRoute, RepairRoute, RepairsRoute, SubsystemsRoute } from './routes/repairs-route';
import { IncidentRoute, ReportIncidentRoute, SafetyPrintRoute, SafetyRoute } from './routes/safety-route';
import { ScheduleRoute } from './routes/schedule-route';
import { ScreenRoute } from './routes/screen-route';
import { TeamRoute } from './routes/team-route';

/** A page only members whose roles grant the capability may open. */
const guarded = (capability: Capability, page: ReactNode) => <RequireCapability capability={capability}>{page}</RequireCapability>;

export function createAppRouter(queryClient: QueryClient) {
  // Arriving at the sign-in page always asks the server: after a sign-out or an expired session
  // the cached answer is out of date, and a live session should skip the form altogether.
  async function signInLoader({ request }: LoaderFunctionArgs) {
    const session = await queryClient.fetchQuery({ ...sessionQueryOptions(), staleTime: 0 });
    if (session) throw redirect(safeNext(new URL(request.url).searchParams.get('next')));
    queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== 'session' });
    return null;
  }

  async function requireSession({ request }: LoaderFunctionArgs) {
    const session = await queryClient.ensureQueryData(sessionQueryOptions());
    if (!session) {
      const url = new URL(request.url);
      throw redirect(signInPath(url.pathname + url.search + url.hash));
    }
    return null;
  }

  const starting = <Loading label="Opening Pitwright" />;

  return createBrowserRouter([
    {
      // A TV in the pit: no session, no navigation; its token is checked by the server.
      path: '/screen/:token',
      element: <ScreenRoute />,
      errorElement: <RouteError />,
      hydrateFallbackElement: starting,
    },
    {
      path: '/sign-in',
      loader: signInLoader,
      element: <SignInPage />,
      errorElement: <RouteError />,
      hydrateFallbackElement: starting,
    },
    {
      // Signed out or in, as a link from an e-mail finds the person.
      path: '/forgot-password',
      element: <ForgotPasswordPage />,
      errorElement: <RouteError />,
    },
    {
      path: '/account-link',
      element: <AccountLinkRoute />,
      errorElement: <RouteError />,
    },
    {
      path: '/',
      loader: requireSession,
      element: <AppShell />,
      errorElement: <RouteError />,
      hydrateFallbackElement: starting,
      children: [
        {
          // A page that throws keeps the header and navigation around its error.
          errorElement: <RouteError />,
          children: [
            {
              index: true,
              element: guarded('board:read', <BoardRoute />),
            },
            {
              path: 'schedule',
              element: guarded('board:read', <ScheduleRoute />),
            },
            {
              path: 'checks',
              element: guarded('board:read', <ChecksRoute />),
            },
            {
              path: 'checks/runs/:runId',
              element: guarded('board:read', <RunRoute />),
            },
            {
              path: 'checks/templates',
              element: guarded('board:read', <TemplatesPage />),
            },
            {
              path: 'checks/templates/new',
              element: guarded('templates:edit', <NewTemplatePage />),
            },
            {
              path: 'checks/templates/:templateId',
              element: guarded('board:read', <EditTemplatePage />),
            },
            {
              path: 'batteries',
              element: guarded('board:read', <BatteriesRoute />),
            },
            {
              path: 'batteries/labels',
              element: guarded('board:read', <BatteryLabelsRoute />),
            },
            {
              path: 'batteries/:batteryId',
              element: guarded('board:read', <BatteryRoute />),
            },
            {
              path: 'repairs',
              element: guarded('board:read', <RepairsRoute />),
            },
            {
              path: 'repairs/new',
              element: guarded('repairs:work', <NewRepairRoute />),
            },
            {
              path: 'repairs/subsystems',
              element: guarded('repairs:manage', <SubsystemsRoute />),
            },
            {
              path: 'repairs/:repairId',
              element: guarded('board:read', <RepairRoute />),
            },
            {
              path: 'safety',
              element: guarded('incidents:report', <SafetyRoute />),
            },
            {
              path: 'safety/report',
              element: guarded('incidents:report', <ReportIncidentRoute />),
            },
            {
              // Its reporter may open it too: the server decides, and the page says why when it refuses.
              path: 'safety/incidents/:incidentId',
              element: guarded('incidents:report', <IncidentRoute />),
            },
            {
              path: 'safety/print',
              element: guarded('incidents:read', <SafetyPrintRoute />),
            },
            {
              path: 'events',
              element: guarded('events:read', <EventsPage />),
            },
            {
              path: 'events/new',
              element: guarded('events:manage', <NewEventPage />),
            },
            {
              path: 'events/:eventId/edit',
              element: guarded('events:manage', <EditEventPage />),
            },
            {
              path: 'team',
              element: guarded('team:read', <TeamRoute />),
            },
            {
              path: 'mailbox',
              element: guarded('mailbox:read', <MailboxPage />),
            },
            {
              // The areas a phone's bottom bar has no room for.
              path: 'more',
              element: guarded('board:read', <MorePage />),
            },
            { path: '*', element: <NotFound /> },
          ],
        },
      ],
    },
  ]);
}
