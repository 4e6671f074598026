import express, { type Express, type Request } from 'express';
import session from 'express-session';
import MySQLStoreFactory from 'express-mysql-session';
import helmet from 'helmet';
import { csrfSync } from 'csrf-sync';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import { ROOT, type Config } from './config';
import { apiNotFound, errorHandler } from './errors/error-handler';
import { HttpError } from './errors/http-error';
import type { Mailer } from './mail/mailer';
import { authenticate } from './middleware/auth';
import { adminRouter } from './modules/admin/admin.router';
import { OutboxService } from './modules/admin/outbox.service';
import { UsersService } from './modules/admin/users.service';
import { AuthService } from './modules/auth/auth.service';
import { authRouter } from './modules/auth/auth.router';
import { clubRouter } from './modules/club/club.router';
import { ClubService } from './modules/club/club.service';
import { learningRouter } from './modules/learning/learning.router';
import { LearningService } from './modules/learning/learning.service';
import { MediaStorage } from './media/storage';
import { mediaRouter } from './modules/tours/media.router';
import { tourRouter } from './modules/tours/tour.router';
import { TourService } from './modules/tours/tour.service';
import { captionRouter, TRACK_BODY_LIMIT, TRACK_BODY_PATHS } from './modules/captions/caption.router';
import { CaptionService } from './modules/captions/caption.service';
import { cultivarRouter } from './modules/cultivars/cultivar.router';
import { cultivarMediaRouter, cultivarPhotoRouter } from './modules/cultivars/cultivar-photo.router';
import { CultivarPhotoService } from './modules/cultivars/cultivar-photo.service';
import { glossaryRouter } from './modules/glossary/glossary.router';
import { GlossaryService } from './modules/glossary/glossary.service';
import { NameDetection } from './modules/spelling-fixes/name-detection';
import { spellingFixRouter } from './modules/spelling-fixes/spelling-fix.router';
import { SpellingFixService } from './modules/spelling-fixes/spelling-fix.service';
import { CultivarService } from './modules/cultivars/cultivar.service';
import { stopRouter } from './modules/stops/stop.router';
import { StopService } from './modules/stops/stop.service';
import { searchRouter } from './modules/search/search.router';
import { SearchService } from './modules/search/search.service';
import { watchRouter } from './modules/watch/watch.router';
import { WatchService } from './modules/watch/watch.service';
import { authorRouter } from './modules/authors/author.router';
import { AuthorService } from './modules/authors/author.service';

export interface AppDeps {
  config: Config;
  dataSource: DataSource;
  mailer: Mailer;
  /** Serve the built client from dist/ (production, demo and e2e). */
  serveClient?: boolean;
  log?: (msg: string, err?: unknown) => void;
  /** Called after a request queued background work, so an in-process worker can start at once. */
  onJobEnqueued?: () => void;
}

export interface AppHandle {
  app: Express;
  /** Closes what the app opened itself (the session store's pool). */
  close(): Promise<void>;
}

/** Builds the Express app; used by the server entry and by the tests. */
export function createApp(deps: AppDeps): AppHandle {
  const { config, dataSource } = deps;
  const log = deps.log ?? ((msg, err) => console.error(msg, err ?? ''));
  const app = express();
  app.disable('x-powered-by');
  if (config.TRUST_PROXY) app.set('trust proxy', 1);

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          mediaSrc: ["'self'", 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          workerSrc: ["'self'", 'blob:'],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          upgradeInsecureRequests: config.COOKIE_SECURE ? [] : null,
        },
      },
      crossOriginEmbedderPolicy: false,
      strictTransportSecurity: config.COOKIE_SECURE ? undefined : false,
    }),
  );

  const MySQLStore = MySQLStoreFactory(session as never);
  const store = new MySQLStore({
    host: config.DB_HOST,
    port: config.DB_PORT,
    user: config.DB_USER,
    password: config.dbPassword,
    database: config.DB_NAME,
    createDatabaseTable: true,
    clearExpired: true,
    checkExpirationInterval: 15 * 60_000,
    expiration: 30 * 24 * 3600_000,
  });

  const sessionMw = session({
      name: 'grovewalk.sid',
      secret: config.sessionSecret,
      store,
      resave: false,
      saveUninitialized: false,
      rolling: false,
      cookie: { httpOnly: true, sameSite: 'lax', secure: config.COOKIE_SECURE, maxAge: 30 * 24 * 3600_000 },
  });
  const api = express.Router();
  // A whole caption track (import, autosave) is read with its own larger limit first; the general
  // parser then skips a body already read, so every other route keeps 1 MB.
  api.use(TRACK_BODY_PATHS, express.json({ limit: TRACK_BODY_LIMIT }));
  api.use(express.json({ limit: '1mb' }));
  api.use(sessionMw);
  const { csrfSynchronisedProtection, generateToken } = csrfSync({
    getTokenFromRequest: (req: Request) => req.get('x-csrf-token'),
  });
  api.use((req, res, next) => {
    csrfSynchronisedProtection(req, res, (err?: unknown) => {
      if (err) return next(new HttpError(403, 'csrf_invalid', 'This page is out of date (it may have been open a long time, or you signed in or out in another tab). Reload the page and try again.'));
      next();
    });
  });
  api.use(authenticate(dataSource));

  const auth = new AuthService({ dataSource, mailer: deps.mailer, publicUrl: config.publicUrl, bcryptCost: config.BCRYPT_COST, log });
  api.get('/health', (_req, res) => res.json({ ok: true }));
  api.use(authRouter(auth, { signInLimit: config.SIGN_IN_LIMIT, csrfToken: (req) => generateToken(req) }));
  api.use(clubRouter(new ClubService(dataSource)));
  const storage = new MediaStorage(config.mediaDir);
  const tours = new TourService(dataSource, storage, deps.onJobEnqueued);
  api.use('/tours', tourRouter(tours, storage, config.UPLOAD_LIMIT_BYTES));
  const captions = new CaptionService(dataSource, tours);
  const cultivars = new CultivarService(dataSource);
  api.use(captionRouter(captions, tours));
  api.use(stopRouter(new StopService(dataSource, tours, cultivars, captions)));
  api.use(cultivarRouter(cultivars));
  api.use(searchRouter(new SearchService(dataSource)));
  api.use(watchRouter(new WatchService(dataSource)));
  api.use(authorRouter(new AuthorService(dataSource, tours)));
  const cultivarPhotos = new CultivarPhotoService(dataSource, config.mediaDir, cultivars);
  api.use(cultivarPhotoRouter(cultivarPhotos));
  api.use(glossaryRouter(new GlossaryService(dataSource, cultivars)));
  api.use(spellingFixRouter(new SpellingFixService({ dataSource, mailer: deps.mailer, publicUrl: config.publicUrl, log }), new NameDetection(dataSource, cultivars)));
  api.use(learningRouter(new LearningService(dataSource, config.sessionSecret)));
  api.use('/admin', adminRouter(new UsersService(dataSource), new OutboxService(dataSource)));
  api.use(apiNotFound);

  app.use('/api', api);
  app.use('/media/cultivars', sessionMw, authenticate(dataSource), cultivarMediaRouter(cultivarPhotos), apiNotFound);
  app.use('/media', sessionMw, authenticate(dataSource), mediaRouter(tours, storage), apiNotFound);

  const dist = path.join(ROOT, 'dist');
  if (deps.serveClient && existsSync(path.join(dist, 'index.html'))) {
    app.use(
      express.static(dist, {
        index: false,
        setHeaders(res, file) {
          res.setHeader('Cache-Control', file.includes(`${path.sep}assets${path.sep}`) ? 'public, max-age=31536000, immutable' : 'no-cache');
        },
      }),
    );
    app.get('/{*splat}', (_req, res) => {
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(path.join(dist, 'index.html'));
    });
  }

  app.use(errorHandler({ exposeStack: config.NODE_ENV === 'development', log: (err) => log('unhandled error', err) }));

  return {
    app,
    close: async () => {
      await store.close();
    },
  };
}
