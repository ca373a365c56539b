// The Express app factory: used by server/index.ts and by the API tests (supertest).
import express, { type Express } from 'express';
import helmet from 'helmet';
import cookieParser from 'cookie-parser';
import path from 'node:path';
import { existsSync } from 'node:fs';
import type { Sequelize } from 'sequelize';
import type { Config } from './config';
import { initModels } from './models';
import { requireUser } from './middleware/auth';
import { DATABASE_RETRY_AFTER_S, errorHandler, notFoundApi } from './middleware/error-handler';
import { clientFiles } from './middleware/client-files';
import { sameOrigin } from './middleware/same-origin';
import { authRoutes } from './routes/auth.routes';
import { farmsRoutes } from './routes/farms.routes';
import { fieldsRoutes } from './routes/fields.routes';
import { fieldImportRoutes } from './routes/field-import.routes';
import { terrainRoutes } from './routes/terrain.routes';
import { estimateRoutes } from './routes/estimate.routes';
import { soilsRoutes } from './routes/soils.routes';
import { seasonsRoutes } from './routes/seasons.routes';
import { treatmentsRoutes } from './routes/treatments.routes';
import { factorOverridesRoutes } from './routes/factor-overrides.routes';
import { plansRoutes } from './routes/plans.routes';
import { changesRoutes } from './routes/changes.routes';
import { peopleRoutes } from './routes/people.routes';
import { devMailboxRoutes } from './routes/dev-mailbox.routes';
import { exportsRoutes } from './routes/exports.routes';
import { placesRoutes } from './routes/places.routes';
import { placeSearchFor } from './services/places/place-search.service';
import { tileOrigins } from './lib/tile-origins';
import { setMailContext } from './services/mail/outbox';
import { LocalFileStorage, type FileStorage } from './services/storage/file-storage';
import type { JobQueue } from './services/jobs/job-queue';
import { JSON_BODY_MAX_BYTES } from '../shared/limits';
import type { ClientConfig } from '../shared/schemas/config';

export type AppOptions = {
  sequelize: Sequelize;
  config: Config;
  /** Uploaded and generated files (DEMs, layer images). Default: a folder under DATA_DIR. */
  storage?: FileStorage;
  /** The background job queue; without it, uploads that need processing answer 503. */
  jobs?: JobQueue;
  clientDir?: string;
  /** True while mail goes to the local fake mail server: GET /api/dev/mailbox then shows its catch. */
  devMailbox?: boolean;
  /** The geocoding service place search uses when config.geocoderUrl is unset (npm start's local fake). */
  geocoderUrl?: string;
};

export function createApp({ sequelize, config, clientDir, jobs, storage: givenStorage, devMailbox = false, geocoderUrl }: AppOptions): Express {
  // Mail written to the outbox goes to the job queue once its transaction commits.
  setMailContext({ dispatch: jobs ? (id) => jobs.sendMail(id) : null, publicUrl: config.publicUrl });
  const storage = givenStorage ?? new LocalFileStorage(path.join(config.dataDir, 'uploads'));
  const terrain = terrainRoutes({ sequelize, storage, jobs, demMaxCells: config.limits.demMaxCells });
  initModels(sequelize);
  const app = express();
  app.set('trust proxy', 'loopback');
  app.disable('x-powered-by');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // Leaflet draws tiles and overlays as <img>; every configured basemap host must be allowed.
          'img-src': ["'self'", 'data:', 'blob:', ...tileOrigins(config.basemaps.map((b) => b.url))],
          'upgrade-insecure-requests': config.isProduction ? [] : null,
        },
      },
    }),
  );
  app.use(express.json({ limit: JSON_BODY_MAX_BYTES }));
  app.use(cookieParser());

  const api = express.Router();
  api.use(sameOrigin([config.publicUrl, ...config.allowedOrigins]));
  api.get('/health', async (_req, res) => {
    const db = await sequelize.authenticate().then(() => true, () => false);
    if (!db) res.set('Retry-After', String(DATABASE_RETRY_AFTER_S));
    res.status(db ? 200 : 503).json({ ok: db, db });
  });
  api.get('/config', (_req, res) => {
    res.json({ basemaps: config.basemaps, devMailbox } satisfies ClientConfig);
  });
  api.use('/auth', authRoutes(sequelize, config));
  const people = peopleRoutes(sequelize, config);
  api.use('/invitations', people.invitations);
  // Without the fake there is no mailbox: 404 for everyone, signed in or not.
  api.use('/dev', devMailbox ? devMailboxRoutes() : notFoundApi);
  api.use(requireUser(config));
  api.use('/farms', people.farms);
  api.use('/farms', farmsRoutes({ sequelize, jobs }));
  api.use('/farms', fieldImportRoutes({ sequelize, jobs }));
  api.use('/farms', terrain.farms);
  api.use('/fields', fieldsRoutes({ sequelize, jobs, storage }));
  api.use('/fields', terrain.fields);
  api.use('/jobs', terrain.jobs);
  api.use('/estimate', estimateRoutes());
  api.use('/places', placesRoutes(placeSearchFor(config.geocoderUrl ?? geocoderUrl ?? null, `Fieldshed (${config.publicUrl})`)));
  api.use('/', soilsRoutes({ sequelize, storage }));
  const seasons = seasonsRoutes(sequelize, jobs);
  api.use('/farms', seasons.farms);
  api.use('/fields', seasons.fields);
  api.use('/fields', factorOverridesRoutes(sequelize));
  api.use('/board', seasons.board);
  const treatments = treatmentsRoutes(sequelize);
  api.use('/farms', treatments.farms);
  api.use('/fields', treatments.fields);
  const plans = plansRoutes({ sequelize, storage });
  api.use('/farms', plans.farms);
  api.use('/plans', plans.plans);
  api.use('/plan-actions', plans.actions);
  api.use('/farms', changesRoutes());
  const exportsApi = exportsRoutes({ sequelize, storage });
  api.use('/farms', exportsApi.farms);
  api.use('/plans', exportsApi.plans);
  api.use(notFoundApi);
  app.use('/api', api);

  const dist = clientDir ?? path.resolve('dist');
  if (existsSync(path.join(dist, 'index.html'))) {
    app.use(clientFiles(dist));
    // Client-side routes: every other GET gets the app shell.
    app.get(/^(?!\/api\/).*/, (_req, res) => res.sendFile(path.join(dist, 'index.html')));
  }
  app.use(errorHandler);
  return app;
}
