import "reflect-metadata";
import cookieParser from "cookie-parser";
import express, { type Express } from "express";
import compression from "compression";
import helmet from "helmet";
import { pino, type Logger } from "pino";
import { pinoHttp } from "pino-http";
import type { DataSource } from "typeorm";
import { analysisRoutes } from "./analyses/analyses.routes.js";
import { createAnalysesService } from "./analyses/analyses.service.js";
import { createAnalysisPool, type AnalysisPool } from "./analyses/pool.js";
import { auditRouter } from "./audit/audit.router.js";
import { catalogueRouter } from "./catalogue/catalogue.router.js";
import { createCatalogueService } from "./catalogue/catalogue.service.js";
import { authRouter } from "./auth/auth.router.js";
import { createAuthService } from "./auth/auth.service.js";
import { DEFAULT_SIGN_IN_LIMITS, addressLimiter, signInLimiters, type LimitSettings } from "./auth/rate-limit.js";
import { createSessions } from "./auth/sessions.js";
import type { AppConfig } from "./config.js";
import { devMailRouter } from "./dev/dev-mail.router.js";
import { csrfGuard } from "./http/csrf.js";
import { errorHandler, HttpError } from "./http/errors.js";
import { healthRouter } from "./http/health.js";
import { webAppRouter } from "./http/static.js";
import { createMailer, type Mailer } from "./mail/mailer.js";
import { createOutbox, type Outbox, type OutboxOptions } from "./outbox/outbox.js";
import { createPeopleService } from "./people/people.service.js";
import { peopleRouter } from "./people/people.router.js";
import { planRoutes } from "./plans/plans.routes.js";
import { emptyPlanDocument, planDocumentCheck } from "./plans/plan-documents.js";
import { createPlansService, type PlanDocumentCheck } from "./plans/plans.service.js";
import { projectsRouter } from "./projects/projects.router.js";
import { createProjectsService, type EmptyPlanFactory } from "./projects/projects.service.js";
import { createMeasurementsModule, type MeasurementsModuleOptions } from "./measurements/measurements.module.js";
import { createMoneyModule, type MoneyModuleOptions } from "./money/money.module.js";
import { createUnderlaysModule, type UnderlaysModuleOptions } from "./underlays/underlays.module.js";

export { loadConfig, type AppConfig } from "./config.js";
export { createDataSource } from "./data-source.js";
export { routeTable } from "./http/routes.js";

export interface AppDeps {
  dataSource: DataSource;
  config: AppConfig;
  logger?: Logger;
  mailer?: Mailer;
  outbox?: OutboxOptions;
  signInLimits?: LimitSettings;
  /** Per-address limit on sign-up, reset and invitation acceptance, per 15 minutes. */
  accountLimitPerAddress?: number;
  emptyPlan?: EmptyPlanFactory;
  checkPlan?: PlanDocumentCheck;
  analysisPool?: AnalysisPool;
  measurements?: MeasurementsModuleOptions;
  money?: MoneyModuleOptions;
  underlays?: UnderlaysModuleOptions;
}

const PLAN_PUT = /^\/v1\/projects\/[^/]+\/plan$/;

/** Builds the Express app over a connected DataSource; `index.ts` is what listens. */
export function createApp(deps: AppDeps): { app: Express; mailer: Mailer; outbox: Outbox; close: () => Promise<void> } {
  const { dataSource, config } = deps;
  const logger = deps.logger ?? pino({ level: config.logLevel });
  const mailer = deps.mailer ?? createMailer(config, logger);
  const outbox = createOutbox({ dataSource, mailer, logger, mailFrom: config.mailFrom, options: deps.outbox });
  const app = express();
  app.disable("x-powered-by");
  if (config.trustProxy) app.set("trust proxy", /^\d+$/.test(config.trustProxy) ? Number(config.trustProxy) : config.trustProxy);

  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          defaultSrc: ["'self'"],
          baseUri: ["'none'"],
          // 'wasm-unsafe-eval' lets the IFC import's worker compile its WebAssembly reader; JavaScript eval stays blocked.
          scriptSrc: ["'self'", "'wasm-unsafe-eval'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", "data:", "blob:"],
          fontSrc: ["'self'"],
          connectSrc: ["'self'"],
          mediaSrc: ["'self'", "blob:"],
          workerSrc: ["'self'", "blob:"],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          formAction: ["'self'"],
          ...(config.env === "production" ? { upgradeInsecureRequests: [] } : {}),
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );
  // A large plan is ~0.5 MB of JSON; gzip makes it a tenth of that on a site's mobile connection.
  app.use(compression({ threshold: 2048 }));
  app.use(pinoHttp({ logger, autoLogging: { ignore: (req) => req.url === "/api/v1/health" } }));
  app.use(cookieParser());

  const beforeJson = express.Router(); // the payment webhook verifies its raw body
  app.use("/api/v1", beforeJson);
  const small = express.json({ limit: "256kb" });
  const large = express.json({ limit: "10mb" });
  app.use("/api", (req, res, next) => (req.method === "PUT" && PLAN_PUT.test(req.path) ? large : small)(req, res, next));
  app.use("/api", csrfGuard([config.publicUrl]));

  app.use(healthRouter(dataSource));
  if (config.env !== "production") app.use(devMailRouter(config));

  const sessions = createSessions(dataSource, config);
  const auth = createAuthService(dataSource, config, outbox);
  const people = createPeopleService(dataSource, config, outbox);
  const projects = createProjectsService(dataSource, deps.emptyPlan ?? emptyPlanDocument);
  const plans = createPlansService(dataSource, projects, deps.checkPlan ?? planDocumentCheck);
  const pool = deps.analysisPool ?? createAnalysisPool();
  const catalogue = createCatalogueService(dataSource);
  const analyses = createAnalysesService(dataSource, projects, catalogue, pool);
  const media = createMeasurementsModule({ dataSource, config, logger, projects, options: deps.measurements });
  const underlays = createUnderlaysModule({ dataSource, config, projects, storage: deps.measurements?.storage, options: deps.underlays });
  const money = createMoneyModule({ dataSource, config, logger, outbox, projects, catalogue, sessions, files: media.files, options: deps.money });
  money.mountWebhook(beforeJson);
  const perAddress = deps.accountLimitPerAddress ?? 30;

  const api = express.Router();
  api.use(
    authRouter({
      auth,
      sessions,
      config,
      signInLimit: signInLimiters(dataSource, deps.signInLimits ?? DEFAULT_SIGN_IN_LIMITS),
      resetLimit: addressLimiter(dataSource, "account", 15 * 60_000, perAddress),
    }),
  );
  api.use(peopleRouter(people, sessions, addressLimiter(dataSource, "accept", 15 * 60_000, perAddress)));
  api.use(projectsRouter(projects, sessions, [...planRoutes(plans), ...analysisRoutes(analyses), ...media.routes, ...underlays.routes, ...money.projectRoutes]));
  api.use(catalogueRouter(catalogue, sessions));
  api.use(auditRouter(dataSource, sessions));
  for (const r of money.routers) api.use(r);
  api.use((req, _res, next) => next(new HttpError(404, "not_found", `There is no ${req.method} ${req.baseUrl}${req.path} in this API.`)));

  // Each router registers its routes with their own prefix (`/auth`, `/people`, …) relative to /api/v1.
  app.use("/api/v1", api);
  app.use(webAppRouter(config.webDist));
  app.use(errorHandler(logger));
  const close = async () => {
    await outbox.close();
    mailer.close();
    if (!deps.analysisPool) await pool.close();
    await media.close();
    underlays.close();
    await money.close();
  };
  return { app, mailer, outbox, close };
}
