import { randomBytes, randomUUID } from 'node:crypto';
import { toShopCurrency } from '../../shared/currency/convert';
import { peakTempC } from '../../shared/engine/limits';
import { compareWithFirst, priceOption, type PricedAlloy, type PricedRunInput } from '../../shared/quotes/pricing';
import type { PublicUser } from '../../shared/schemas/auth';
import { optionKey, optionLimitState } from '../../shared/quotes/limit-cautions';
import { overridesInForce, requireOverrides } from './limit-overrides';
import { formatQuantity, type UnitSystem } from '../../shared/units';
import type { PreferencesService } from '../preferences/preferences.service';
import type { LimitOverrideInput, QuoteInput, QuotePricing, QuoteSummary, QuoteView } from '../../shared/schemas/quotes';
import type { CatalogueService, PublishedAlloy } from '../catalogue/catalogue.service';
import type { CurrencyRatesService } from '../currency/currency-rates.service';
import type { ActivityView } from '../../shared/schemas/activity';
import { activityView, changesBetween } from '../activity/activity.views';
import { AppError } from '../http/app-error';
import type { JobsStore } from '../jobs/jobs.repository';
import type { Mailer } from '../mail/mailer';
import type { ShopSettingsService } from '../settings/shop-settings.service';
import type { UsersRepository } from '../users/users.repository';
import { quoteMail } from './quote-emails';
import { Quote, QuoteLimitOverride } from './quote.entities';
import type { QuotesRepository, QuotesStore } from './quotes.repository';
import { CustomerQuotes, expireIfDue, hashToken, today, type DepositViews } from './customer-quotes';

export { hashToken, type DepositViews } from './customer-quotes';

type Actor = Pick<PublicUser, 'id' | 'name' | 'role'>;


function alloyIdsOf(options: Quote['options']): string[] {
  return [...new Set(options.flatMap((o) => [o.alloyId, ...Object.values(o.runAlloys ?? {})]))];
}

export class QuotesService {
  constructor(
    private readonly store: QuotesStore,
    private readonly jobs: JobsStore,
    private readonly catalogue: CatalogueService,
    private readonly settings: ShopSettingsService,
    private readonly users: UsersRepository,
    private readonly mailer: Mailer,
    private readonly currencyRates?: CurrencyRatesService,
    deposits?: DepositViews,
    preferences?: PreferencesService,
  ) {
    this.customer = new CustomerQuotes(store, jobs, users, mailer, deposits, preferences);
  }

  /** What the customer does through the private link. */
  readonly customer: CustomerQuotes;

  // ---- pricing ----

  private async jobRuns(jobId: string): Promise<{ jobName: string; runs: PricedRunInput[] }> {
    const repo = this.jobs.read();
    const job = await repo.findJob(jobId);
    if (!job) throw AppError.badRequest('invalid_input', 'Some values need attention.', { jobId: 'There is no such job' });
    const runs = (await repo.runsOf(jobId)).map((r) => ({
      runId: r.id,
      name: r.name,
      lengthMm: r.segments.reduce((sum, s) => sum + s.lengthMm, 0),
      tube: { odMm: r.odMm, wallMm: r.wallMm },
      peakTempC: peakTempC(r.segments),
    }));
    return { jobName: job.name, runs };
  }

  /** Prices the options from the job's runs and today's published catalogue and shop settings. */
  private async priceNow(quote: Pick<Quote, 'jobId' | 'options'>): Promise<QuotePricing> {
    const [{ runs }, settings] = await Promise.all([this.jobRuns(quote.jobId), this.settings.get()]);
    if (runs.length === 0) throw AppError.badRequest('job_has_no_runs', 'The job has no runs to quote yet.', { jobId: 'The job has no runs yet' });
    const alloys = new Map<string, PricedAlloy>();
    const rates = this.currencyRates ? await this.currencyRates.table() : { shopCurrency: settings.currency, rates: [] };
    for (const id of alloyIdsOf(quote.options)) {
      let a: PublishedAlloy;
      try {
        a = await this.catalogue.publishedAlloy(id);
      } catch {
        const index = quote.options.findIndex((o) => alloyIdsOf([o]).includes(id));
        throw AppError.badRequest('invalid_input', 'An option names an alloy that is not published.', { [`options.${index}.alloyId`]: 'Not a published alloy' });
      }
      // Prices in another currency are converted at the admin's rate, or the quote is refused: never summed as they stand.
      const price = toShopCurrency(a.data.pricePerKg, a.currency, rates);
      if (!price.ok) {
        const index = quote.options.findIndex((o) => alloyIdsOf([o]).includes(id));
        throw AppError.badRequest('currency_not_converted', `${a.designation} (${a.uns}): ${price.message}`, { [`options.${index}.alloyId`]: price.message });
      }
      alloys.set(id, {
        alloyId: id,
        designation: a.designation,
        uns: a.uns,
        family: a.family,
        version: a.version,
        densityKgM3: a.data.densityKgM3,
        pricePerKg: price.amount,
        maxContinuousC: a.data.maxContinuousC,
        maxIntermittentC: a.data.maxIntermittentC,
      });
    }
    const options = quote.options.map((o) => priceOption(runs, o, alloys, settings));
    return {
      currency: settings.currency,
      settings,
      runs,
      alloys: [...alloys.values()],
      options,
      comparisons: compareWithFirst(options),
      pricedAt: new Date().toISOString(),
      frozen: false,
    };
  }

  // ---- views ----

  private async view(repo: QuotesRepository, quote: Quote): Promise<QuoteView> {
    let pricing: QuotePricing | null = quote.snapshot;
    let pricingProblem: string | null = null;
    if (!pricing) {
      try {
        pricing = await this.priceNow(quote);
      } catch (err) {
        pricingProblem = err instanceof AppError ? err.message : 'The quote could not be priced.';
      }
    }
    const [job, events] = await Promise.all([this.jobs.read().findJob(quote.jobId), repo.eventsOf([quote.id])]);
    const limitOverrides = quote.snapshot ? (quote.snapshot.limitOverrides ?? []) : await overridesInForce(repo, quote);
    return {
      id: quote.id,
      number: quote.number,
      jobId: quote.jobId,
      jobName: job?.name ?? '(job removed)',
      customerName: quote.customerName,
      customerEmail: quote.customerEmail,
      customerCompany: quote.customerCompany,
      validUntil: quote.validUntil,
      message: quote.message,
      status: quote.status,
      options: quote.options,
      pricing,
      pricingProblem,
      acceptedOptionIndex: quote.acceptedOptionIndex,
      decidedBy: quote.decidedBy,
      createdBy: quote.createdBy,
      createdAt: new Date(quote.createdAt).toISOString(),
      sentAt: quote.sentAt ? new Date(quote.sentAt).toISOString() : null,
      events: events.map((e) => ({ at: new Date(e.at).toISOString(), status: e.status, note: e.note, by: e.by })),
      limitOverrides,
      deposit: await this.customer.depositOf(quote),
    };
  }

  async list(): Promise<QuoteSummary[]> {
    const repo = this.store.read();
    const quotes = await Promise.all((await repo.list()).map((q) => expireIfDue(repo, q)));
    const jobNames = new Map<string, string>();
    const items: QuoteSummary[] = [];
    for (const q of quotes) {
      if (!jobNames.has(q.jobId)) jobNames.set(q.jobId, (await this.jobs.read().findJob(q.jobId))?.name ?? '(job removed)');
      let pricing = q.snapshot;
      if (!pricing) pricing = await this.priceNow(q).catch(() => null);
      const totals = pricing?.options.map((o) => o.total) ?? [];
      items.push({
        id: q.id,
        number: q.number,
        jobName: jobNames.get(q.jobId)!,
        customerName: q.customerName,
        customerCompany: q.customerCompany,
        status: q.status,
        validUntil: q.validUntil,
        currency: pricing?.currency ?? '',
        totalFrom: totals.length ? Math.min(...totals) : null,
        totalTo: totals.length ? Math.max(...totals) : null,
        updatedAt: new Date(q.updatedAt).toISOString(),
        deposit: await this.customer.depositOf(q),
      });
    }
    return items;
  }

  async get(id: string): Promise<QuoteView> {
    const repo = this.store.read();
    const quote = await repo.find(id);
    if (!quote) throw AppError.notFound('There is no such quote.');
    return this.view(repo, await expireIfDue(repo, quote));
  }

  async activity(id: string): Promise<ActivityView[]> {
    const repo = this.store.read();
    if (!(await repo.find(id))) throw AppError.notFound('There is no such quote.');
    return (await repo.activity.list({ subject: 'quote', subjectId: id })).map(activityView);
  }

  // ---- temperature limit overrides ----

  /** An engineer or admin vouches for an option over its temperature limit, with the reason; written in the quote's history. */
  async recordLimitOverride(id: string, input: LimitOverrideInput, actor: Actor): Promise<QuoteView> {
    return this.store.write(async (repo) => {
      const quote = await repo.find(id);
      if (!quote) throw AppError.notFound('There is no such quote.');
      if (quote.status !== 'draft') throw AppError.conflict('not_draft', 'A sent quote cannot be changed; make a new one.');
      const spec = quote.options[input.optionIndex];
      if (!spec) throw AppError.badRequest('invalid_input', 'Choose one of the options.', { optionIndex: 'There is no such option' });
      const priced = (await this.priceNow(quote)).options[input.optionIndex];
      if (optionLimitState(priced) !== 'over') {
        throw AppError.badRequest('not_over_limit', `Option ${input.optionIndex + 1} is within its temperature limit; it needs no override.`, { optionIndex: 'Within its limit' });
      }
      const at = new Date();
      await repo.putLimitOverride(
        Object.assign(new QuoteLimitOverride(), { id: randomUUID(), quoteId: id, optionIndex: input.optionIndex, optionKey: optionKey(spec), reason: input.reason, byUserId: actor.id, byName: actor.name, at }),
      );
      // The history keeps a recorded sentence, so it states the excess in both systems for every reader.
      const over = (system: UnitSystem) => formatQuantity('temperatureDelta', -priced.tempMarginC, system).text;
      const note = `Limit override for option ${input.optionIndex + 1} (${spec.label}, ${over('metric')} / ${over('imperial')} over): ${input.reason}`;
      await repo.addEvent({ id: randomUUID(), quoteId: id, status: 'draft', note, by: actor.name, at });
      await repo.activity.add(
        { subject: 'quote', subjectId: id, subjectName: quote.number, jobId: null, action: 'limit_overridden', changes: [{ path: `options.${input.optionIndex}.limitOverride`, before: null, after: input.reason }] },
        actor,
      );
      return this.view(repo, quote);
    });
  }

  // ---- sales ----

  async create(input: QuoteInput, actor: Actor): Promise<QuoteView> {
    await this.jobRuns(input.jobId);
    return this.store.write(async (repo) => {
      const now = new Date();
      const number = `Q-${now.getUTCFullYear()}-${String((await repo.count()) + 1).padStart(4, '0')}`;
      const quote = Object.assign(new Quote(), {
        id: randomUUID(),
        number,
        ...input,
        status: 'draft' as const,
        snapshot: null,
        tokenHash: null,
        acceptedOptionIndex: null,
        decidedBy: null,
        createdBy: actor.id,
        createdAt: now,
        updatedAt: now,
        sentAt: null,
      });
      await this.priceNow(quote);
      await repo.save(quote);
      await repo.addEvent({ id: randomUUID(), quoteId: quote.id, status: 'draft', note: 'Created', by: actor.name, at: now });
      await repo.activity.add({ subject: 'quote', subjectId: quote.id, subjectName: number, jobId: null, action: 'created' }, actor);
      return this.view(repo, quote);
    });
  }

  async update(id: string, patch: Partial<QuoteInput>, actor: Actor | null = null): Promise<QuoteView> {
    return this.store.write(async (repo) => {
      const quote = await repo.find(id);
      if (!quote) throw AppError.notFound('There is no such quote.');
      if (quote.status !== 'draft') throw AppError.conflict('not_draft', 'A sent quote cannot be changed; make a new one.');
      const changes = changesBetween(quote, patch);
      if (changes.length > 0) await repo.activity.add({ subject: 'quote', subjectId: id, subjectName: quote.number, jobId: null, action: 'edited', changes }, actor);
      Object.assign(quote, patch, { updatedAt: new Date() });
      if (patch.jobId) await this.jobRuns(patch.jobId);
      await this.priceNow(quote);
      await repo.save(quote);
      return this.view(repo, quote);
    });
  }

  private mailFor(quote: Quote, jobName: string, pricing: QuotePricing, link: string) {
    return quoteMail(
      { number: quote.number, shopName: pricing.settings.shopName, customerName: quote.customerName, jobName, validUntil: quote.validUntil, message: quote.message, link, pricing },
      quote.customerEmail,
    );
  }

  async emailPreview(id: string, origin: string) {
    const quote = await this.store.read().find(id);
    if (!quote) throw AppError.notFound('There is no such quote.');
    const pricing = quote.snapshot ?? (await this.priceNow(quote));
    const { jobName } = await this.jobRuns(quote.jobId);
    return this.mailFor(quote, jobName, pricing, `${origin}/q/…`);
  }

  /**
   * Freezes the prices, makes the customer's private link and e-mails it. The draft → sent step is
   * one conditional UPDATE: of calls racing each other one wins, the others answer 409 and mail nothing.
   * When the e-mail cannot go out the quote goes back to draft, so no link exists that nobody received.
   */
  async send(id: string, actor: Actor, origin: string): Promise<QuoteView> {
    const token = randomBytes(32).toString('base64url');
    const tokenHash = hashToken(token);
    const mail = await this.store.write(async (repo) => {
      const quote = await repo.find(id);
      if (!quote) throw AppError.notFound('There is no such quote.');
      if (quote.status !== 'draft') throw AppError.conflict('not_draft', 'This quote has already been sent.');
      if (quote.validUntil < today()) throw AppError.badRequest('invalid_input', 'The quote’s date has passed.', { validUntil: 'Choose a date from today on' });
      const priced = await this.priceNow(quote);
      const pricing: QuotePricing = { ...priced, frozen: true, limitOverrides: requireOverrides(priced, await overridesInForce(repo, quote)) };
      const { jobName } = await this.jobRuns(quote.jobId);
      if (!(await repo.markSent(id, { snapshot: pricing, tokenHash, sentAt: new Date() }))) {
        throw AppError.conflict('not_draft', 'This quote has already been sent.');
      }
      await repo.addEvent({ id: randomUUID(), quoteId: id, status: 'sent', note: `E-mailed to ${quote.customerEmail}`, by: actor.name, at: new Date() });
      await repo.activity.add({ subject: 'quote', subjectId: id, subjectName: quote.number, jobId: null, action: 'sent', changes: [{ path: 'customerEmail', before: null, after: quote.customerEmail }] }, actor);
      return this.mailFor(quote, jobName, pricing, `${origin}/q/${token}`);
    });
    try {
      await this.mailer.send(mail);
    } catch (err) {
      console.error(`[dilato] quote ${id}: the e-mail could not be sent:`, err);
      await this.store.write(async (repo) => {
        if (await repo.undoSent(id, tokenHash)) {
          await repo.addEvent({ id: randomUUID(), quoteId: id, status: 'draft', note: 'The e-mail could not be sent; back to draft', by: actor.name, at: new Date() });
        }
      });
      throw new AppError(502, 'mail_failed', 'The e-mail could not be sent, so the quote stays a draft. Check the mail server and send it again.');
    }
    return this.get(id);
  }
}
