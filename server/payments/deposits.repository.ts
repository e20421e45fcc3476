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
  /**
   * Writes `changes` only while the row still stands where the caller read it (`from` statuses, or
   * not yet refunded through Dilato): a webhook and a refund can race on PostgreSQL, and a plain save
   * of what one of them read would write the other's change back out. False when the row had moved on.
   */
  async moveOn(id: string, from: Deposit['status'][] | 'not_refunded_here', changes: Partial<Deposit>): Promise<boolean> {
    const qb = this.m.createQueryBuilder().update(Deposit).set(changes).where('id = :id', { id });
    if (from === 'not_refunded_here') qb.andWhere('refund_reason IS NULL');
    else qb.andWhere('status IN (:...from)', { from });
    return ((await qb.execute()).affected ?? 0) > 0;
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
