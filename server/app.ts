import compression from 'compression';
import express from 'express';
import helmet from 'helmet';
import type { DataSource } from 'typeorm';
import type { TrustProxy } from './config';
import { authRouter } from './auth/auth.router';
import { AuthService } from './auth/auth.service';
import { createLucia } from './auth/lucia';
import { loadSession } from './auth/session';
import { SessionCache } from './auth/session-cache';
import { KnownAddressesRepository } from './auth/known-addresses.repository';
import { DEFAULT_SIGN_IN_LIMITS, SignInLimiter, type SignInLimits } from './auth/sign-in-limits';
import { apiNotFound, errorHandler } from './http/error-handler';
import { DEFAULT_PUBLIC_LIMITS, publicLimiters, type PublicLimits } from './http/public-limits';
import { databaseCounters } from './db/shared-counters';
import { requestGuards } from './http/request-guards';
import { requireSameOrigin } from './http/same-origin';
import { UsersRepository } from './users/users.repository';
import { usersRouter } from './users/users.router';
import { UsersService } from './users/users.service';
import { webApp } from './web/web-app';
import { calcRouter } from './calc/calc.router';
import { CalcService } from './calc/calc.service';
import { catalogueRouter } from './catalogue/catalogue.router';
import { CatalogueReviewService } from './catalogue/review.service';
import { CatalogueVersionsService } from './catalogue/versions.service';
import { CatalogueStore } from './catalogue/catalogue.repository';
import { CatalogueService } from './catalogue/catalogue.service';
import { CatalogueCsvService } from './catalogue/catalogue-csv.service';
import { ImportJobs } from './catalogue/csv-import/import-jobs';
import { ImportJobRepository } from './catalogue/csv-import/import-job.repository';
import { datasheetsRouter } from './datasheets/datasheets.router';
import { DatasheetsService } from './datasheets/datasheets.service';
import { FolderObjectStore } from './storage/folder-object-store';
import type { ObjectStore } from './storage/object-store';
import { FlexPartsRepository } from './flex-parts/flex-parts.repository';
import { flexPartsRouter } from './flex-parts/flex-parts.router';
import { FlexPartsService } from './flex-parts/flex-parts.service';
import { JobsStore } from './jobs/jobs.repository';
import { jobsRouter } from './jobs/jobs.router';
import { JobsService } from './jobs/jobs.service';
import { RunResults } from './jobs/run-results';
import { PreferencesRepository } from './preferences/preferences.repository';
import { preferencesRouter } from './preferences/preferences.router';
import { PreferencesService } from './preferences/preferences.service';
import type { Mailer } from './mail/mailer';
import { OutboxRepository } from './mail/outbox.repository';
import { outboxRouter } from './mail/outbox.router';
import { QuotesStore } from './quotes/quotes.repository';
import { publicQuotesRouter, quotesRouter } from './quotes/quotes.router';
import { QuotesService } from './quotes/quotes.service';
import { shopSettingsRouter } from './settings/shop-settings.router';
import { ShopSettingsService } from './settings/shop-settings.service';
import { CurrencyRatesRepository } from './currency/currency-rates.repository';
import { currencyRatesRouter } from './currency/currency-rates.router';
import { CurrencyRatesService } from './currency/currency-rates.service';
import type Stripe from 'stripe';
import { DepositWebhooks } from './payments/deposit-webhooks';
import { DepositsStore } from './payments/deposits.repository';
import { depositsRouter, paymentWebhookRouter, publicDepositRouter } from './payments/deposits.router';
import { DepositsService } from './payments/deposits.service';
import { WeldPlanService } from './welds/weld-plan.service';
import { WeldRulesStore } from './welds/weld-rules.repository';
import { weldPlanRouter, weldRulesRouter } from './welds/weld-rules.router';
import { WeldRulesService } from './welds/weld-rules.service';

export interface AppOptions {
  /** The uploads folder, where data sheets are kept unless objectStore says otherwise. */
  uploadsDir: string;
  /** Where data sheets are kept (see `openObjectStore`); absent means the uploads folder. */
  objectStore?: ObjectStore;
  /** Sends quotes and notifications (the embedded fake SMTP server by default). */
  mailer: Mailer;
  webDir?: string;
  publicUrl?: string;
  /** Proxy hops (or proxy addresses) whose X-Forwarded-For and -Proto are believed; see README. */
  trustProxy?: TrustProxy;
  signInLimits?: Partial<SignInLimits>;
  publicLimits?: Partial<PublicLimits>;
  /** The payment provider's SDK client and webhook signing secret; without them deposits cannot be paid. */
  payments?: { client: Stripe; webhookSecret: string };
}

/** Builds the whole Express app on an open DataSource without listening (tests use it directly). */
export function createApp(dataSource: DataSource, options: AppOptions) {
  const auth = createLucia(dataSource);
  const usersRepository = new UsersRepository(dataSource);
  const counters = databaseCounters(dataSource);
  const signInLimiter = new SignInLimiter({ ...DEFAULT_SIGN_IN_LIMITS, ...options.signInLimits }, counters);
  const sessions = new SessionCache(auth);
  const authService = new AuthService(usersRepository, auth, sessions, signInLimiter, new KnownAddressesRepository(dataSource), options.mailer);
  const usersService = new UsersService(usersRepository, sessions);
  const catalogueStore = new CatalogueStore(dataSource);
  const catalogueService = new CatalogueService(catalogueStore);
  const objectStore = options.objectStore ?? new FolderObjectStore(options.uploadsDir);
  const datasheetsService = new DatasheetsService(catalogueStore, objectStore);
  const flexPartsService = new FlexPartsService(new FlexPartsRepository(dataSource));

  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', options.trustProxy ?? false);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // react-native-web writes its styles into a <style> tag at run time.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'", 'data:'],
          // Left to the proxy that terminates HTTPS; on plain HTTP it would break the app.
          'upgrade-insecure-requests': null,
        },
      },
      // Sent only over HTTPS, below: over plain HTTP it means nothing and can lock a browser out of the host.
      strictTransportSecurity: false,
    }),
  );
  app.use((req, res, next) => {
    if (req.secure) res.setHeader('Strict-Transport-Security', 'max-age=31536000; includeSubDomains');
    next();
  });
  // JavaScript, fonts, JSON and CSV go out gzipped; PDFs and images are already compressed and are left alone.
  app.use(compression());

  const shopSettings = new ShopSettingsService(dataSource);
  const depositsStore = new DepositsStore(dataSource);
  const deposits = new DepositsService(depositsStore, shopSettings, options.payments?.client, options.mailer, usersRepository);

  const api = express.Router();
  api.use(requestGuards);
  api.use(paymentWebhookRouter(new DepositWebhooks(depositsStore, deposits, options.payments?.webhookSecret)));
  api.use(express.json({ limit: '1mb' }));
  api.use(requireSameOrigin(options.publicUrl));
  api.use(loadSession(auth, sessions));
  api.get('/health', (_req, res) => {
    res.json({ status: 'ok' });
  });
  api.use('/auth', authRouter(auth, authService));
  api.use('/users', usersRouter(usersService));
  api.use('/calc', calcRouter(new CalcService(catalogueService, flexPartsService, shopSettings)));
  api.use('/flex-parts', flexPartsRouter(flexPartsService));
  api.use(datasheetsRouter(datasheetsService, objectStore));
  const currencyRates = new CurrencyRatesService(new CurrencyRatesRepository(dataSource), shopSettings);
  const jobsService = new JobsService(new JobsStore(dataSource), new RunResults(catalogueService, flexPartsService, shopSettings, currencyRates));
  const weldRules = new WeldRulesService(new WeldRulesStore(dataSource));
  api.use(jobsRouter(jobsService));
  api.use(weldPlanRouter(new WeldPlanService(jobsService, catalogueService, flexPartsService, weldRules)));
  api.use('/weld-rules', weldRulesRouter(weldRules));
  const preferences = new PreferencesService(new PreferencesRepository(dataSource));
  const quotes = new QuotesService(new QuotesStore(dataSource), new JobsStore(dataSource), catalogueService, shopSettings, usersRepository, options.mailer, currencyRates, deposits, preferences);
  api.use('/currency-rates', currencyRatesRouter(currencyRates));
  api.use('/settings', shopSettingsRouter(shopSettings));
  api.use('/quotes', quotesRouter(quotes, options.publicUrl));
  api.use(depositsRouter(deposits, options.publicUrl));
  api.use('/public', ...publicLimiters({ ...DEFAULT_PUBLIC_LIMITS, ...options.publicLimits }, counters), publicQuotesRouter(quotes, options.publicUrl), publicDepositRouter(deposits, options.publicUrl));
  api.use('/outbox', outboxRouter(new OutboxRepository(dataSource)));
  api.use('/me', preferencesRouter(preferences));
  api.use(catalogueRouter(catalogueService, new CatalogueCsvService(catalogueService, catalogueStore, new ImportJobs(new ImportJobRepository(dataSource))), new CatalogueReviewService(catalogueStore, catalogueService), new CatalogueVersionsService(catalogueStore, catalogueService)));
  api.use(apiNotFound);
  api.use(errorHandler);
  app.use('/api', api);

  if (options.webDir) app.use(webApp(options.webDir));
  app.use(errorHandler);
  return app;
}
