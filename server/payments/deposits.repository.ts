import type { DataSource, EntityManager } from 'typeorm';
import { In } from 'typeorm';
import { Store } from '../db/store';
import { Quote } from '../quotes/quote.entities';
import { QuotesRepository } from '../quotes/quotes.repository';
import { Deposit, PaymentEventSeen } from './deposit.entities';

export class DepositsRepository {
  /** The quote's own rows (history, activity), written in the same transaction as the deposit. */
  readonly quotes: QuotesRepository;

  constructor(private readonly m: EntityManager) {
    this.quotes = new QuotesRepository(m);
  }

  ofQuote(quoteId: string) {
    return this.m.findOneBy(Deposit, { quoteId });
  }
  ofQuotes(quoteIds: string[]) {
    return quoteIds.length === 0 ? Promise.resolve([]) : this.m.findBy(Deposit, { quoteId: In(quoteIds) });
  }
  find(id: string) {
    return this.m.findOneBy(Deposit, { id });
  }
  byPaymentIntent(paymentIntentId: string) {
    return this.m.findOneBy(Deposit, { paymentIntentId });
  }
  quotesOfJob(jobId: string) {
    return this.m.find(Quote, { where: { jobId }, order: { createdAt: 'ASC' } });
  }
  save(deposit: Deposit) {
    return this.m.save(Deposit, deposit);
  }
  /** True the first time an event id is seen; false for a replay. */
  async firstSight(id: string, type: string): Promise<boolean> {
    if (await this.m.existsBy(PaymentEventSeen, { id })) return false;
    await this.m.insert(PaymentEventSeen, { id, type, receivedAt: new Date() });
    return true;
  }
}

export class DepositsStore extends Store<DepositsRepository> {
  constructor(dataSource: DataSource) {
    super(dataSource, (m) => new DepositsRepository(m));
  }
}
