import { createHash, randomUUID } from 'node:crypto';
import { optionLimitState } from '../../shared/quotes/limit-cautions';
import type { DepositView } from '../../shared/schemas/deposits';
import { DEFAULT_PREFERENCES } from '../../shared/schemas/preferences';
import type { PublicQuoteView, QuoteStatus } from '../../shared/schemas/quotes';
import type { UnitSystem } from '../../shared/units';
import { AppError } from '../http/app-error';
import type { JobsStore } from '../jobs/jobs.repository';
import type { Mailer } from '../mail/mailer';
import type { PreferencesService } from '../preferences/preferences.service';
import type { UsersRepository } from '../users/users.repository';
import { overrideFor, publicOptions } from './public-options';
import { decisionMail, money } from './quote-emails';
import type { Quote } from './quote.entities';
import type { QuotesRepository, QuotesStore } from './quotes.repository';

/** Where a quote's deposit stands (the payments feature answers). */
export interface DepositViews {
  viewOf(quote: Pick<Quote, 'id' | 'status' | 'acceptedOptionIndex' | 'snapshot'>): Promise<DepositView | null>;
}

export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');
export const today = () => new Date().toISOString().slice(0, 10);
export const OPEN: QuoteStatus[] = ['sent', 'viewed'];

/** Quotes past their date stop being open; the change is written the first time anyone looks. */
export async function expireIfDue(repo: QuotesRepository, quote: Quote): Promise<Quote> {
  if (OPEN.includes(quote.status) && quote.validUntil < today()) {
    quote.status = 'expired';
    quote.updatedAt = new Date();
    await repo.save(quote);
    await repo.addEvent({ id: randomUUID(), quoteId: quote.id, status: 'expired', note: `Valid until ${quote.validUntil}`, by: null, at: new Date() });
  }
  return quote;
}

/** The customer's side of a quote, through the private link: open it, accept an option or decline. */
export class CustomerQuotes {
  constructor(
    private readonly store: QuotesStore,
    private readonly jobs: JobsStore,
    private readonly users: UsersRepository,
    private readonly mailer: Mailer,
    private readonly deposits?: DepositViews,
    private readonly preferences?: PreferencesService,
  ) {}

  /** The customer first reads the quote in the units of whoever prepared it. */
  private async unitsOf(quote: Quote): Promise<UnitSystem> {
    if (!this.preferences || !quote.createdBy) return DEFAULT_PREFERENCES.unitSystem;
    return (await this.preferences.get(quote.createdBy)).unitSystem;
  }

  depositOf(quote: Quote): Promise<DepositView | null> {
    return this.deposits ? this.deposits.viewOf(quote) : Promise.resolve(null);
  }

  private async jobName(jobId: string): Promise<string | undefined> {
    return (await this.jobs.read().findJob(jobId))?.name;
  }


  private async byToken(repo: QuotesRepository, token: string): Promise<Quote> {
    const quote = /^[A-Za-z0-9_-]{20,100}$/.test(token) ? await repo.findByTokenHash(hashToken(token)) : null;
    if (!quote) throw new AppError(404, 'quote_not_found', 'This quote link is not valid.');
    await expireIfDue(repo, quote);
    if (quote.status === 'expired') throw new AppError(410, 'quote_expired', `This quote expired on ${quote.validUntil}.`);
    return quote;
  }

  private async publicView(quote: Quote): Promise<PublicQuoteView> {
    const pricing = quote.snapshot!;
    const jobName = (await this.jobName(quote.jobId)) ?? 'your system';
    return {
      number: quote.number,
      shopName: pricing.settings.shopName,
      customerName: quote.customerName,
      customerCompany: quote.customerCompany,
      jobName,
      validUntil: quote.validUntil,
      message: quote.message,
      status: quote.status,
      currency: pricing.currency,
      acceptedOptionIndex: quote.acceptedOptionIndex,
      units: await this.unitsOf(quote),
      deposit: await this.depositOf(quote),
      options: publicOptions(pricing),
    };
  }

  async openByToken(token: string): Promise<PublicQuoteView> {
    return this.store.write(async (repo) => {
      const quote = await this.byToken(repo, token);
      if (quote.status === 'sent') {
        Object.assign(quote, { status: 'viewed', updatedAt: new Date() });
        await repo.save(quote);
        await repo.addEvent({ id: randomUUID(), quoteId: quote.id, status: 'viewed', note: 'Opened by the customer', by: null, at: new Date() });
      }
      return this.publicView(quote);
    });
  }

  async decide(token: string, decision: { accept: true; optionIndex: number; name: string } | { accept: false; name: string; reason: string }, origin: string): Promise<PublicQuoteView> {
    const result = await this.store.write(async (repo) => {
      const quote = await this.byToken(repo, token);
      if (!OPEN.includes(quote.status)) throw AppError.conflict('already_decided', `This quote was already ${quote.status}.`);
      const pricing = quote.snapshot!;
      if (decision.accept && !pricing.options[decision.optionIndex]) {
        throw AppError.badRequest('invalid_input', 'Choose one of the options.', { optionIndex: 'There is no such option' });
      }
      if (decision.accept && optionLimitState(pricing.options[decision.optionIndex]) === 'over' && !overrideFor(pricing.limitOverrides, decision.optionIndex)) {
        throw AppError.conflict('over_limit', `Option ${decision.optionIndex + 1} runs over its material’s temperature limit and cannot be accepted here. Please ask ${pricing.settings.shopName} about it.`, {
          optionIndex: 'Over its temperature limit',
        });
      }
      const status: QuoteStatus = decision.accept ? 'accepted' : 'declined';
      Object.assign(quote, { status, acceptedOptionIndex: decision.accept ? decision.optionIndex : null, decidedBy: decision.name, updatedAt: new Date() });
      await repo.save(quote);
      const note = decision.accept ? `Option ${decision.optionIndex + 1} (${pricing.options[decision.optionIndex].label})` : decision.reason || 'No reason given';
      await repo.addEvent({ id: randomUUID(), quoteId: quote.id, status, note, by: decision.name, at: new Date() });
      return quote;
    });
    const seller = result.createdBy ? await this.users.findById(result.createdBy) : null;
    if (seller) {
      const pricing = result.snapshot!;
      const option = decision.accept ? pricing.options[decision.optionIndex] : undefined;
      const jobName = (await this.jobName(result.jobId)) ?? '';
      await this.mailer.send(
        decisionMail(
          {
            number: result.number,
            jobName,
            customerName: result.customerName,
            customerCompany: result.customerCompany,
            decidedBy: decision.name,
            accepted: decision.accept,
            optionLabel: option?.label,
            total: option ? money(option.total, pricing.currency) : undefined,
            reason: decision.accept ? undefined : decision.reason,
            link: `${origin}/quotes/${result.id}`,
          },
          seller.email,
        ),
      );
    }
    return this.publicView(result);
  }
}
