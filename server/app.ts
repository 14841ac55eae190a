import fs from 'node:fs';
import path from 'node:path';
import express, { Router } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import { csrfSync } from 'csrf-sync';
import type { Sequelize } from 'sequelize';
import type { Config } from './config';
import { createPassport } from './auth/passport';
import { requireAuth } from './auth/require-auth';
import { SessionStore } from './auth/session-store';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { createMailDispatcher } from './mail/dispatcher';
import { initModels } from './models';
import { photoStore } from './photos/photo-store';
import { alertRulesRouter } from './routes/alert-rules';
import { accountLinksRouter } from './routes/account-links';
import { batteriesRouter } from './routes/batteries';
import { batteryPlanRouter } from './routes/battery-plan';
import { batterySettingsRouter } from './routes/battery-settings';
import { batteryInstallsRouter, batteryUsesRouter } from './routes/battery-uses';
import { chargersRouter } from './routes/chargers';
import { batteryChargingRouter, chargingSessionsRouter } from './routes/charging-sessions';
import { checklistRunsRouter, eventChecklistRunsRouter } from './routes/checklist-runs';
import { checklistTemplatesRouter } from './routes/checklist-templates';
import { eventsRouter } from './routes/events';
import { fieldProgressRouter } from './routes/field-progress';
import { invitesRouter } from './routes/invites';
import { mailboxRouter } from './routes/mailbox';
import { mailFailuresRouter } from './routes/mail-failures';
import { healthRouter } from './routes/health';
import { incidentPhotosRouter } from './routes/incident-photos';
import { incidentsCsvRouter, incidentsRouter } from './routes/incidents';
import { eventMatchesRouter, matchesRouter } from './routes/matches';
import { repairPhotosRouter } from './routes/repair-photos';
import { repairSubsystemsRouter } from './routes/repair-subsystems';
import { eventRepairsRouter, repairsRouter } from './routes/repairs';
import { screenBoardRouter, screensRouter } from './routes/screens';
import { sessionRouter } from './routes/session';
import { teamRouter } from './routes/team';
import { timelineRouter } from './routes/timeline';

export const SESSION_COOKIE = 'pitwright.sid';

/** The Express app without a listening socket: what the server and Supertest both use. */
export function createApp({ config, sequelize }: { config: Config; sequelize: Sequelize }) {
  initModels(sequelize);
  // Sends what commands queue in the outbox, after their commit; close() stops it.
  const mail = createMailDispatcher(config.mail);
  mail.start();
  const app = express();
  app.disable('x-powered-by');
  if (config.trustProxy) app.set('trust proxy', config.trustProxy);
  app.use(
    helmet({
      // A pit network is often plain http on a LAN: never rewrite requests to https.
      contentSecurityPolicy: { directives: { upgradeInsecureRequests: null } },
      strictTransportSecurity: false,
    }),
  );

  const store = new SessionStore(sequelize, config.sessionIdleMs);
  const sessionMiddleware = session({
    name: SESSION_COOKIE,
    secret: config.sessionSecret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: 'auto', maxAge: config.sessionIdleMs },
  });
  const passport = createPassport();
  const csrf = csrfSync({
    getTokenFromRequest: (req) => req.get('x-csrf-token'),
    // Signed-out callers have nothing to forge (requireAuth answers 401); sign-in makes the token.
    skipCsrfProtection: (req) => !req.user || (req.method === 'POST' && req.path === '/session'),
    errorConfig: { code: 'EBADCSRFTOKEN' },
  });

  const api = Router();
  api.use('/health', healthRouter(() => sequelize.authenticate()));
  // Pit screens read with their token alone: before the session, so a TV never gets a cookie.
  api.use('/screen', screenBoardRouter());
  api.use(express.json({ limit: '1mb' }), sessionMiddleware, passport.initialize(), passport.session());
  api.use(csrf.csrfSynchronisedProtection);
  const features = { mailbox: config.mail.usesFake };
  api.use('/session', sessionRouter({ passport, csrf, cookieName: SESSION_COOKIE, features, publicUrl: config.publicUrl }));
  // Opened from an e-mail, signed out: the link's token is the credential.
  api.use('/account-links', accountLinksRouter({ csrf, features }));
  api.use('/mailbox', requireAuth, mailboxRouter({ usesFake: config.mail.usesFake }));
  api.use('/team/screens', requireAuth, screensRouter());
  api.use('/team/battery-settings', requireAuth, batterySettingsRouter());
  api.use('/team/repair-subsystems', requireAuth, repairSubsystemsRouter());
  api.use('/team/mail-failures', requireAuth, mailFailuresRouter());
  api.use('/team/invites', requireAuth, invitesRouter({ publicUrl: config.publicUrl }));
  api.use('/team/alert-rules', requireAuth, alertRulesRouter());
  api.use('/team', requireAuth, teamRouter());
  // The event's areas before the events router, so that requireAuth runs once per request.
  api.use('/events/:eventId/matches', requireAuth, eventMatchesRouter());
  api.use('/events/:eventId/field-progress', requireAuth, fieldProgressRouter());
  api.use('/events/:eventId/timeline', requireAuth, timelineRouter());
  api.use('/events/:eventId/checklist-runs', requireAuth, eventChecklistRunsRouter());
  api.use('/events/:eventId/battery-plan', requireAuth, batteryPlanRouter());
  api.use('/events/:eventId/repairs', requireAuth, eventRepairsRouter());
  api.use('/events', requireAuth, eventsRouter());
  api.use('/matches', requireAuth, matchesRouter());
  api.use('/checklist-templates', requireAuth, checklistTemplatesRouter());
  api.use('/checklist-runs', requireAuth, checklistRunsRouter());
  // A battery's uses and charging before the batteries router, as for the event's areas above.
  api.use('/batteries/:id/uses', requireAuth, batteryInstallsRouter());
  api.use('/batteries/:id/charging', requireAuth, batteryChargingRouter());
  api.use('/batteries', requireAuth, batteriesRouter());
  api.use('/battery-uses', requireAuth, batteryUsesRouter());
  api.use('/chargers', requireAuth, chargersRouter());
  api.use('/charging-sessions', requireAuth, chargingSessionsRouter());
  // A ticket's photos before the repairs router, as for the event's areas above.
  api.use('/repairs/:id/photos', requireAuth, repairPhotosRouter(photoStore(config.uploadsDir, 'repairs')));
  api.use('/repairs', requireAuth, repairsRouter());
  api.use('/incidents.csv', requireAuth, incidentsCsvRouter());
  api.use('/incidents/:id/photos', requireAuth, incidentPhotosRouter(photoStore(config.uploadsDir, 'incidents')));
  api.use('/incidents', requireAuth, incidentsRouter({ publicUrl: config.publicUrl }));
  api.use(apiNotFound);
  app.use('/api', api);

  serveClient(app, config.clientDir);
  app.use(errorHandler);
  const close = () => {
    mail.stop();
    store.close();
  };
  return { app, sessionMiddleware, passport, close };
}

function serveClient(app: express.Express, clientDir: string) {
  const indexHtml = path.join(clientDir, 'index.html');
  if (!fs.existsSync(indexHtml)) return;
  app.use('/assets', express.static(path.join(clientDir, 'assets'), { immutable: true, maxAge: '1y' }));
  app.use(express.static(clientDir, { index: false }));
  app.get('/{*splat}', (_req, res) => {
    res.set('Cache-Control', 'no-cache').sendFile(indexHtml);
  });
}
