import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import helmet from 'helmet';
import pg from 'pg';
import { pinoHttp } from 'pino-http';
import type { Sequelize } from 'sequelize';
import { configurePassport } from './auth/passport';
import { createSessionMiddleware } from './auth/session';
import type { Env } from './config/env';
import { initModels } from './db/models';
import { errorHandler, unknownRoute } from './lib/errors';
import { logger, redactUrl } from './lib/logger';
import { requestClientContext } from './lib/request-context';
import { sameOriginJson } from './lib/same-origin';
import { refuseUnstorableText } from './lib/storable-body';
import { adminRoutes } from './modules/admin/admin.routes';
import { inviteRoutes } from './modules/admin/invites.routes';
import { attachmentRoutes } from './modules/attachments/attachments.routes';
import { configureAttachments, prepareSignature } from './modules/attachments/attachments.service';
import { configureInvites } from './modules/admin/invite-email';
import { inviteLinkKey } from './modules/admin/invite-token';
import { configureMail } from './modules/emails/mail-transport';
import { reportLinkKey } from './modules/reports/report-link';
import { configureReports, enqueueVisitReport, reportDelivery } from './modules/reports/reports.service';
import { configureVisitClose } from './modules/visits/visit-close-ports';
import { DiskStorage } from './lib/file-storage';
import { customerRoutes } from './modules/customers/customers.routes';
import { emailRoutes } from './modules/emails/emails.routes';
import { healthRoutes } from './modules/health/health.routes';
import { managerRoutes } from './modules/manager/manager.routes';
import { pressRoutes } from './modules/presses/presses.routes';
import { reportRoutes } from './modules/reports/reports.routes';
import { sessionRoutes } from './modules/session/session.routes';
import { signInThrottle } from './modules/session/sign-in-throttle';
import { siteRoutes } from './modules/sites/sites.routes';
import { visitRoutes } from './modules/visits/visits.routes';

export interface AppDeps {
  env: Env;
  sequelize: Sequelize;
}

export interface CrankwiseApp {
  app: Express;
  /** Closes the session store's pool; the caller owns the Sequelize instance. */
  close: () => Promise<void>;
}

export function createApp({ env, sequelize }: AppDeps): CrankwiseApp {
  logger.level = env.LOG_LEVEL;
  initModels(sequelize);
  const sessionPool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 5 });
  // An idle connection the database drops (restart, failover) is reported here; without a listener
  // node-postgres would throw it as an uncaught exception and stop the process. The pool replaces it.
  sessionPool.on('error', (err) => logger.warn({ err: { message: err.message, code: (err as { code?: unknown }).code } }, 'session pool lost a connection; it reconnects on next use'));
  const passport = configurePassport();
  const app = express();

  app.disable('x-powered-by');
  app.set('trust proxy', env.TRUST_PROXY);
  const secure = env.COOKIE_SECURE ?? env.NODE_ENV === 'production';
  // HSTS and upgrade-insecure-requests only make sense behind HTTPS; on plain http they break a LAN tablet.
  app.use(
    helmet({
      strictTransportSecurity: secure,
      contentSecurityPolicy: { directives: { upgradeInsecureRequests: secure ? [] : null } },
    }),
  );
  app.use(
    pinoHttp({
      logger,
      genReqId: (req, res) => {
        const id = randomUUID();
        res.setHeader('X-Request-Id', id);
        return id;
      },
      autoLogging: { ignore: (req) => req.url === '/api/health' },
      serializers: {
        req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, url: redactUrl(req.url) }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
    }),
  );
  app.use(requestClientContext);
  app.use(express.json({ limit: '1mb' }));
  app.use(createSessionMiddleware({ pool: sessionPool, secret: env.SESSION_SECRET, secureCookie: secure }));
  app.use(passport.initialize());
  app.use(passport.session());

  // The process's services that routes and the close-out share, configured once here.
  const storage = new DiskStorage(path.resolve(env.UPLOAD_DIR));
  const attachments = configureAttachments({ storage, maxUploadBytes: env.UPLOAD_MAX_BYTES });
  configureMail({ host: env.SMTP_HOST, port: env.SMTP_PORT, secure: env.SMTP_SECURE, user: env.SMTP_USER, pass: env.SMTP_PASS, from: env.MAIL_FROM });
  configureInvites({ publicBaseUrl: env.PUBLIC_BASE_URL, linkKey: inviteLinkKey(env) });
  configureReports({
    companyName: env.COMPANY_NAME,
    publicBaseUrl: env.PUBLIC_BASE_URL,
    linkKey: reportLinkKey(env),
    linkDays: env.REPORT_LINK_DAYS,
    timeZone: env.REPORT_TIME_ZONE,
    storage,
  });
  // Closing a visit stores the signature and queues the report; visits gets both from here.
  configureVisitClose({ prepareSignature, enqueueVisitReport });

  const api = express.Router();
  api.use(noStoreByDefault);
  // State changes only from our own pages, as JSON; text the database cannot store never reaches it.
  api.use(sameOriginJson({ publicBaseUrl: env.PUBLIC_BASE_URL, multipartPaths: [/^\/visits\/[^/]+\/attachments\/?$/] }));
  api.use(refuseUnstorableText);
  api.use('/health', healthRoutes(sequelize));
  api.use('/session', sessionRoutes(signInThrottle(sequelize, { perAccount: env.SIGNIN_RATE_LIMIT, perAddress: env.SIGNIN_ADDRESS_LIMIT, windowMs: env.SIGNIN_RATE_WINDOW_MS })));
  api.use('/customers', customerRoutes());
  api.use('/sites', siteRoutes());
  api.use('/presses', pressRoutes());
  api.use('/visits/:visitId/attachments', attachmentRoutes(attachments, { maxUploadBytes: env.UPLOAD_MAX_BYTES, uploadDir: storage.root }));
  api.use('/visits', visitRoutes({ reportDelivery }));
  api.use('/admin', adminRoutes());
  api.use('/invites', inviteRoutes());
  api.use('/manager', managerRoutes());
  api.use('/emails', emailRoutes());
  api.use('/report', reportRoutes());
  api.use(unknownRoute);
  app.use('/api', api);

  serveClient(app, env.CLIENT_DIST);
  app.use(errorHandler);

  return { app, close: () => sessionPool.end() };
}

/**
 * API answers carry personal and plant data: no browser or proxy cache keeps them unless a route
 * sets its own Cache-Control (photos, reports), which replaces this default.
 */
const noStoreByDefault: express.RequestHandler = (_req, res, next) => {
  res.setHeader('Cache-Control', 'no-store');
  next();
};

/** Serves the built client and lets React Router handle every other page path. */
function serveClient(app: Express, distSetting: string | undefined): void {
  if (!distSetting) return;
  const dist = path.resolve(distSetting);
  const index = path.join(dist, 'index.html');
  if (!fs.existsSync(index)) {
    logger.warn({ dist }, 'client build not found; only the API is served');
    return;
  }
  // Source maps would hand out the whole client source; production builds make none, and any left
  // in a folder are not served.
  app.use((req, res, next) => (req.path.endsWith('.map') ? res.status(404).type('text/plain').send('Not found') : next()));
  // Hashed assets never change under their name; index.html must always be fetched fresh.
  app.use('/assets', express.static(path.join(dist, 'assets'), { immutable: true, maxAge: '1y', fallthrough: false }));
  app.use(express.static(dist, { index: false, maxAge: '1h' }));
  // A page path (no file extension) gets the app; a missing file such as /favicon.ico gets a plain 404.
  app.get(/^\/(?!api\/)[^.]*$/, (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    // dotfiles: the build may live under a folder such as .data/; the file itself is ours.
    res.sendFile(index, { dotfiles: 'allow' });
  });
}
