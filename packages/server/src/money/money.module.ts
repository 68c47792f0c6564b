import type { Router } from "express";
import type { Logger } from "pino";
import type { DataSource } from "typeorm";
import type Stripe from "stripe";
import type { Sessions } from "../auth/sessions.js";
import type { CatalogueService } from "../catalogue/catalogue.service.js";
import type { AppConfig } from "../config.js";
import type { FilesService } from "../files/files.service.js";
import type { RouteSpec } from "../http/routes.js";
import { createJobQueue, type QueueSpec } from "../jobs/job-queue.js";
import type { Outbox } from "../outbox/outbox.js";
import { loadPaymentsConfig, type PaymentsConfig } from "../payments/payments.config.js";
import { paymentsWebhookRouter } from "../payments/payments.router.js";
import { createPaymentsService, createStripe } from "../payments/payments.service.js";
import { priceBookRouter } from "../price-book/price-book.router.js";
import { createPriceBookService } from "../price-book/price-book.service.js";
import type { ProjectsService } from "../projects/projects.service.js";
import { PROPOSAL_PDF_QUEUE, proposalPdfQueue } from "../proposals/proposal-pdf-job.js";
import { projectProposalRoutes, proposalsRouter } from "../proposals/proposals.router.js";
import { createProposalsService, type ProposalsService } from "../proposals/proposals.service.js";
import { scenarioRoutes } from "../scenarios/scenarios.routes.js";
import { createScenariosService } from "../scenarios/scenarios.service.js";
import { createSearchRegistry, type SearchRegistryOptions } from "../scenarios/search-registry.js";
import { workOrderProjectRoutes, workOrderTasksRouter } from "../work-orders/work-orders.routes.js";
import { createWorkOrdersService } from "../work-orders/work-orders.service.js";

export interface MoneyModuleOptions {
  payments?: PaymentsConfig;
  stripe?: Stripe;
  searches?: SearchRegistryOptions;
}

/** Outside production, `HUSHMARK_TEST_SEARCH_STEP_MS` slows each search step (tests that cancel a running search across processes). */
function searchOptions(config: AppConfig, given: SearchRegistryOptions | undefined): SearchRegistryOptions {
  const step = Number(process.env.HUSHMARK_TEST_SEARCH_STEP_MS ?? 0);
  return { ...(config.env !== "production" && step > 0 ? { stepDelayMs: step } : {}), ...given };
}

/**
 * From diagnosis to paid work: price book, scenarios and option searches, proposals with their
 * PDFs (a background job), deposits through the payment service, work orders and verification.
 */
export function createMoneyModule(deps: { dataSource: DataSource; config: AppConfig; logger: Logger; outbox: Outbox; projects: ProjectsService; catalogue: CatalogueService; sessions: Sessions; files: FilesService; options?: MoneyModuleOptions | undefined }) {
  const { dataSource, config, logger, outbox, projects, catalogue, sessions, files } = deps;
  const paymentsConfig = deps.options?.payments ?? loadPaymentsConfig({ ...process.env, NODE_ENV: config.env });
  const stripe = deps.options?.stripe ?? createStripe(paymentsConfig);
  const priceBook = createPriceBookService(dataSource);
  const searches = createSearchRegistry(dataSource, searchOptions(config, deps.options?.searches));
  const scenarios = createScenariosService(dataSource, projects, catalogue, priceBook, searches);
  const jobs = createJobQueue({ databaseUrl: config.databaseUrl, schema: config.jobsSchema, logger, work: config.role !== "api", queues: [proposalPdfQueue(dataSource, catalogue, files, logger) as QueueSpec<never>] });
  let proposals: ProposalsService;
  const workOrders = createWorkOrdersService(dataSource, { projects, proposals: () => proposals, files });
  proposals = createProposalsService(dataSource, {
    projects, scenarios, priceBook, outbox, files, catalogue, publicUrl: config.publicUrl,
    hooks: {
      renderPdf: async (proposalId, version) => {
        await jobs.send(PROPOSAL_PDF_QUEUE, { proposalId, version });
      },
      onApproved: (m, proposal, content) => workOrders.createForApproval(m, proposal, content),
    },
  });
  const payments = createPaymentsService(dataSource, { config: paymentsConfig, stripe, proposals, outbox, logger });
  const projectRoutes: RouteSpec[] = [...scenarioRoutes(scenarios), ...projectProposalRoutes(proposals), ...workOrderProjectRoutes(workOrders)];
  return {
    projectRoutes,
    /** Mounts the payment webhook on a router that sits before the JSON parser. */
    mountWebhook: (router: Router) => router.use(paymentsWebhookRouter(payments, sessions)),
    routers: [priceBookRouter(priceBook, sessions), proposalsRouter(proposals, payments, sessions), workOrderTasksRouter(workOrders, sessions)],
    jobs,
    close: async () => {
      await searches.close();
      await jobs.stop();
    },
  };
}
