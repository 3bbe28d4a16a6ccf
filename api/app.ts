// Builds the Express app: security headers, sessions, sign-in, feature routers, the client, and one error handler.
import express, { type Express } from 'express';
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import type { AppContext } from './app-context.js';
import { authRoutes, sessionCookieName } from './auth/auth.routes.js';
import { configurePassport } from './auth/passport-setup.js';
import { AppError } from './http/app-error.js';
import { csrfCookieOnReads } from './http/csrf.js';
import { errorHandler } from './http/error-handler.js';
import { createSecureRouter, type SecureRouter } from './http/secure-router.js';
import { exposureRoutes } from './exposure/exposure.routes.js';
import { holdsRoutes } from './holds/holds.routes.js';
import { notificationsRoutes } from './notifications/notifications.routes.js';
import { lotsRoutes } from './lots/lots.routes.js';
import { stockCountsRoutes } from './stock-counts/stock-counts.routes.js';
import { outboxRoutes } from './outbox/outbox.routes.js';
import { sitesRoutes } from './sites/sites.routes.js';
import { usersRoutes } from './users/users.routes.js';
import { catalogueRoutes } from './catalogue/catalogue.routes.js';
import { photosRoutes } from './photos/photos.routes.js';
import { purchaseOrdersRoutes } from './purchase-orders/purchase-orders.routes.js';
import { shipmentsRoutes } from './shipments/shipments.routes.js';
import { fridgesRoutes } from './fridges/fridges.routes.js';
import { loggersRoutes } from './loggers/loggers.routes.js';
import { logImportsRoutes } from './log-imports/log-imports.routes.js';
import { readingsRoutes } from './readings/readings.routes.js';
import { dailyChecksRoutes } from './daily-checks/daily-checks.routes.js';
import { excursionsRoutes } from './excursions/excursions.routes.js';
import { housesRoutes } from './houses/houses.routes.js';
import { flocksRoutes } from './flocks/flocks.routes.js';
import { programmesRoutes } from './programmes/programmes.routes.js';
import { vaccinationsRoutes } from './vaccinations/vaccinations.routes.js';
import { vaccinationDayRoutes } from './vaccination-day/vaccination-day.routes.js';
import { demandRoutes } from './demand/demand.routes.js';
import { refuseNulText } from './http/refuse-nul-text.js';

/** Every feature's router; a new feature adds one line here. */
function featureRouters(context: AppContext): SecureRouter[] {
  return [
    usersRoutes(context),
    sitesRoutes(context),
    outboxRoutes(context),
    healthRoutes(context),
    catalogueRoutes(context),
    purchaseOrdersRoutes(context),
    shipmentsRoutes(context),
    photosRoutes(context),
    fridgesRoutes(context),
    loggersRoutes(context),
    logImportsRoutes(context),
    readingsRoutes(context),
    dailyChecksRoutes(context),
    excursionsRoutes(context),
    housesRoutes(context),
    flocksRoutes(context),
    programmesRoutes(context),
    vaccinationsRoutes(context),
    vaccinationDayRoutes(context),
    demandRoutes(context),
    exposureRoutes(context),
    holdsRoutes(context),
    notificationsRoutes(context),
    lotsRoutes(context),
    stockCountsRoutes(context),
  ];
}

function healthRoutes(context: AppContext): SecureRouter {
  const router = createSecureRouter('/api/health');
  router.get('/', { public: true }, async (_req, res) => {
    await context.sequelize.query('SELECT 1');
    res.json({ ok: true });
  });
  return router;
}

export function createApp(context: AppContext): Express {
  const { config, logger } = context;
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          // Angular inserts component styles at run time.
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          mediaSrc: ["'self'", 'blob:'],
          fontSrc: ["'self'"],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
          upgradeInsecureRequests: config.COOKIE_SECURE ? [] : null,
        },
      },
    }),
  );
  app.use(
    pinoHttp({
      logger,
      autoLogging: { ignore: (req) => !req.url?.startsWith('/api/') },
      // Routine successes are debug noise; refusals are worth a line, failures an error.
      customLogLevel: (_req, res, error) => (error || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'info' : 'debug'),
      redact: ['req.headers.cookie', 'req.headers["x-xsrf-token"]', 'res.headers["set-cookie"]'],
    }),
  );
  app.use(express.json({ limit: '1mb' }));
  app.use(refuseNulText);

  const PgStore = connectPgSimple(session);
  app.use(
    '/api',
    session({
      name: sessionCookieName,
      secret: config.SESSION_SECRET,
      store: new PgStore({ pool: context.pool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: 15 * 60 }),
      resave: false,
      saveUninitialized: false,
      cookie: { httpOnly: true, sameSite: 'lax', secure: config.COOKIE_SECURE, maxAge: 12 * 60 * 60 * 1000 },
    }),
  );
  const passport = configurePassport(context.hasher);
  app.use('/api', passport.initialize(), passport.session(), csrfCookieOnReads);

  for (const router of [authRoutes(context, passport), ...featureRouters(context)]) {
    app.use(router.prefix, router.express);
  }
  app.use('/api', () => {
    throw AppError.notFound('No such API route.');
  });

  const dist = config.CLIENT_DIST_DIR;
  if (existsSync(join(dist, 'index.html'))) {
    app.use(express.static(dist, { index: false, maxAge: '1h' }));
    // The client's own pages are public files; the data they show comes from guarded API routes.
    // dotfiles: 'allow' because CLIENT_DIST_DIR may sit under a dot-folder such as .runtime.
    const client = createSecureRouter('');
    client.get('/{*splat}', { public: true }, (_req, res) => res.sendFile(join(dist, 'index.html'), { dotfiles: 'allow', headers: { 'Cache-Control': 'no-cache' } }));
    app.use(client.express);
  }
  app.use(errorHandler(logger));
  return app;
}
