import express, { type Express } from 'express';
import session from 'express-session';
import connectSessionSequelize from 'connect-session-sequelize';
import helmet from 'helmet';
import compression from 'compression';
import expressStaticGzip from 'express-static-gzip';
import { pinoHttp } from 'pino-http';
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Sequelize } from 'sequelize';
import type { Config } from './config.ts';
import { createLogger, type Logger } from './logger.ts';
import { createSequelize } from './db/sequelize.ts';
import { closeReadPool } from './db/read-pool.ts';
import { initModels } from './models/index.ts';
import { watchIdempotentCreates } from './services/idempotency-context.ts';
import { createPassport } from './auth/passport.ts';
import { createMailer, type Mailer } from './services/mail.service.ts';
import { startOutboxWorker } from './services/outbox.service.ts';
import { requireCsrf } from './middleware/csrf.ts';
import { requireSameOrigin } from './middleware/same-origin.ts';
import { jsonBody } from './middleware/json-body.ts';
import { sessionUser } from './middleware/session-user.ts';
import { privateAnswers } from './middleware/private-answers.ts';
import { outsideApi, unlessAnonymousRead } from './middleware/anonymous-reads.ts';
import { errorHandler, apiNotFound, isDbDown } from './middleware/error-handler.ts';
import { limiter } from './middleware/rate-limit.ts';
import { largeBodyLimit } from './middleware/large-bodies.ts';
import { bearerToken, unlessBearer } from './middleware/bearer-token.ts';
import { idempotency } from './middleware/idempotency.ts';
import { maintenance } from './middleware/maintenance.ts';
import { healthRoutes } from './routes/health.routes.ts';
import { sessionRoutes } from './routes/session.routes.ts';
import { authRoutes } from './routes/auth.routes.ts';
import { adminRoutes } from './routes/admin.routes.ts';
import { workbenchRoutes } from './routes/workbench.routes.ts';
import { shareRoutes } from './routes/share.routes.ts';
import { commentRoutes } from './routes/comment.routes.ts';
import { reviewThreadRoutes } from './routes/review-thread.routes.ts';
import { followRoutes } from './routes/follow.routes.ts';
import { notificationRoutes } from './routes/notification.routes.ts';
import { mailChoiceRoutes, ONE_CLICK_UNSUBSCRIBE } from './routes/mail-choice.routes.ts';
import { photoRoutes } from './routes/photo.routes.ts';
import { buildRoutes } from './routes/build.routes.ts';
import { actuatorRoutes } from './routes/actuator.routes.ts';
import { runRoutes } from './routes/run.routes.ts';
import { partRoutes } from './routes/part.routes.ts';
import { reviewRoutes } from './routes/review.routes.ts';
import { accountRoutes } from './routes/account.routes.ts';
import { exchangeRoutes } from './routes/exchange.routes.ts';
import { apiTokenRoutes } from './routes/api-token.routes.ts';
import { dataLicenceRoutes } from './routes/data-licence.routes.ts';
import { registryDatasetRoutes } from './routes/registry-dataset.routes.ts';
import { openApiRoutes } from './routes/openapi.routes.ts';
import { opsRoutes } from './routes/ops.routes.ts';
import { outboxRoutes } from './routes/outbox.routes.ts';
import { createDrain, type Drain } from './ops/drain.ts';
import { createMetrics } from './ops/metrics.ts';
import { createReadiness } from './ops/readiness.ts';
import { createOutageLog } from './ops/db-outage.ts';
import type { PhotoStore } from './storage/photo-store.ts';
import { createPhotoStore } from './storage/create-photo-store.ts';

export interface AppHandle {
  app: Express;
  sequelize: Sequelize;
  mailer: Mailer;
  log: Logger;
  /** SIGTERM's first step (server/index.ts): /api/ready turns 503 and responses close their connections. */
  drain: Drain;
  /** Where photo files live (the uploads folder, or an S3 bucket when S3_BUCKET is set). */
  photos: PhotoStore;
  close(): Promise<void>;
}

interface SessionStore extends session.Store {
  stopExpiringSessions(): void;
  touch(sid: string, data: session.SessionData, callback?: (err?: unknown) => void): void;
}

/** Build the whole Express app (no listen), with its pool, session store, passport and mailer. */
export async function createApp(config: Config, deps: { mailer?: Mailer; log?: Logger } = {}): Promise<AppHandle> {
  const log = deps.log ?? createLogger(config.logLevel);
  const sequelize = createSequelize(config.db);
  initModels(sequelize);
  watchIdempotentCreates(sequelize);
  const photos = await createPhotoStore(config);
  const mailer =
    deps.mailer ??
    createMailer(config.smtpUrl ?? 'smtp://127.0.0.1:2525', config.mailFrom, log, { timeoutMs: config.outbox.smtpTimeoutMs });
  const metrics = createMetrics({ sequelize, uploadsDir: config.uploadsDir });
  const drain = createDrain();
  const outage = createOutageLog(sequelize, log);
  const outbox = startOutboxWorker(mailer, {
    appUrl: config.publicUrl,
    log,
    intervalMs: config.env === 'test' ? 250 : 5000,
    leaseS: config.outbox.leaseS,
    onGivenUp: metrics.mailGivenUp,
    // During a database outage the worker's failed passes join the one outage warning.
    onPassFailed: (err) => (isDbDown(err) ? outage.noteDown(err) : log.warn({ err }, 'outbox pass failed')),
  });
  const passport = createPassport(config, log);
  const SequelizeStore = connectSessionSequelize(session.Store);
  const store = new SequelizeStore({
    db: sequelize,
    table: 'Session',
    checkExpirationInterval: 15 * 60 * 1000,
    expiration: 30 * 24 * 60 * 60 * 1000,
    extendDefaultFields: (defaults: { data: string; expires: Date }, s: { passport?: { user?: number } }) => ({
      data: defaults.data,
      expires: defaults.expires,
      userId: s.passport?.user ?? null,
    }),
  }) as unknown as SessionStore;
  // express-session touches (extends) a session after the response is already on the wire; a
  // database failure there reaches the final handler, which cuts that finished response off.
  // An expiry not extended once is harmless, so the failure is logged and dropped.
  const touch = store.touch.bind(store);
  store.touch = (sid, data, done) =>
    touch(sid, data, (err?: unknown) => {
      if (err && isDbDown(err)) outage.noteDown(err);
      else if (err) log.warn({ err }, 'session touch failed');
      done?.();
    });
  const https = config.publicUrl.startsWith('https://');

  const app = express();
  app.disable('x-powered-by');
  app.set('query parser', 'simple');
  // Behind a proxy the client's address (rate limits per address, logs) comes from X-Forwarded-For.
  if (https || config.trustProxy > 0) app.set('trust proxy', Math.max(config.trustProxy, 1));
  app.use(drain.middleware, metrics.middleware);
  const probes = new Set(['/api/health', '/api/ready', '/metrics']);
  app.use(
    pinoHttp({
      logger: log,
      autoLogging: { ignore: (req) => probes.has(req.url ?? '') },
      // A 503 during a database outage is logged once by the outage log; its access line needs no error stack.
      customErrorObject: (_req, res, err, val) =>
        (res as { locals?: { dbDown?: boolean } }).locals?.dbDown ? { res: val.res, responseTime: val.responseTime } : val,
      serializers: {
        req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, url: req.url }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
    }),
  );
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'"],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
          frameAncestors: ["'none'"],
          ...(https ? { upgradeInsecureRequests: [] } : {}),
        },
      },
      crossOriginEmbedderPolicy: false,
      strictTransportSecurity: https,
    }),
  );
  app.use(compression());
  app.use(requireSameOrigin(config.publicUrl, { except: [ONE_CLICK_UNSUBSCRIBE] }));

  const dist = resolve(config.clientDist);
  if (existsSync(dist)) {
    // Hashed assets, precompressed at build time (Brotli 11, gzip 9): the best encoding the client accepts, as stored.
    app.use(
      '/assets',
      expressStaticGzip(resolve(dist, 'assets'), {
        enableBrotli: true,
        orderPreference: ['br', 'gz'],
        index: false,
        serveStatic: { immutable: true, maxAge: '1y', index: false, fallthrough: false },
      }),
    );
    app.use(outsideApi(express.static(dist, { index: false, maxAge: '1h' })));
  }
  app.use('/uploads', photos.handler());
  app.use(healthRoutes(sequelize));
  app.use(
    opsRoutes({
      drain,
      metrics,
      metricsToken: config.ops.metricsToken,
      readiness: createReadiness({
        sequelize,
        photos,
        minFreeMb: config.ops.readyMinFreeMb,
        maxOutbox: config.ops.readyMaxOutbox,
      }),
    }),
  );
  // Answers that depend on who asks are never stored by a cache (Cache-Control: no-store), whatever the route.
  app.use(privateAnswers('scanwright.sid'));
  app.use(maintenance(sequelize));
  // A rig's personal API token: checked (401/403/429) before any body is read; such requests skip sessions and CSRF.
  app.use(...bearerToken(config));

  // Workbench calculations are open to visitors, and reading a body of up to 32 MB (a 200 000-sample sine record) costs
  // seconds of CPU: large ones are limited per client before the body is read (normal use sends kilobytes).
  // A compressed body is counted by its inflated size, after the parser has inflated it (within the 32 MB limit).
  const largeBodies = largeBodyLimit(config);
  app.use('/api/workbench', largeBodies.beforeBody);
  app.use(['/api/workbench', '/api/actuators', '/api/runs'], jsonBody('32mb'));
  app.use('/api/workbench', largeBodies.afterBody);
  app.use(jsonBody('1mb'));
  // One-click unsubscribe (RFC 8058): the signed link is the credential, so no session or CSRF token; a mail
  // provider POSTs it from its own servers (and may name its own Origin, hence the exception above).
  app.use(mailChoiceRoutes());
  const sessions = session({
    name: 'scanwright.sid',
    secret: config.sessionSecret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: false,
    cookie: { httpOnly: true, sameSite: 'lax', secure: https, maxAge: 30 * 24 * 60 * 60 * 1000, path: '/' },
  });
  app.use(...unlessAnonymousRead('scanwright.sid', sessions, passport.initialize(), sessionUser(passport.session())).map(unlessBearer));
  app.use(['/api', '/auth/logout'], unlessBearer(requireCsrf));
  app.use(idempotency);

  // The registry search is the hottest route: first in line.
  app.use(partRoutes(config, photos));
  app.use(sessionRoutes());
  app.use(authRoutes(passport, limiter(config, { windowMs: 60_000, limit: 20, what: 'sign-in attempts' })));
  app.use(adminRoutes());
  app.use(outboxRoutes());
  app.use(workbenchRoutes());
  app.use(photoRoutes(photos));
  app.use(buildRoutes(config, photos));
  app.use(actuatorRoutes());
  app.use(runRoutes(config));
  app.use(reviewRoutes(config));
  app.use(accountRoutes());
  app.use(apiTokenRoutes());
  app.use(dataLicenceRoutes());
  app.use(registryDatasetRoutes(config));
  app.use(openApiRoutes(config));
  app.use(exchangeRoutes(config, photos));
  app.use(commentRoutes(config));
  app.use(reviewThreadRoutes(config));
  app.use(followRoutes());
  app.use(notificationRoutes());
  app.use(['/api', '/auth'], apiNotFound);

  const indexHtml = resolve(dist, 'index.html');
  app.use(shareRoutes({ indexHtml, origin: config.publicUrl }));
  app.get('/{*splat}', (_req, res, next) => {
    if (!existsSync(indexHtml)) return next();
    res.set('Cache-Control', 'no-cache').sendFile(indexHtml);
  });
  app.use(errorHandler(config.env === 'development', { onDbDown: outage.noteDown }));

  return {
    app,
    sequelize,
    mailer,
    log,
    drain,
    photos,
    async close() {
      outage.close();
      await outbox.stop();
      store.stopExpiringSessions();
      mailer.close();
      await closeReadPool(sequelize);
      await sequelize.close();
      await photos.close();
    },
  };
}
