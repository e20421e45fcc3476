import type { DataSource, EntityManager } from 'typeorm';
import { In } from 'typeorm';
import { Quote, QuoteEvent, QuoteLimitOverride } from './quote.entities';
import { Store } from '../db/store';
import { ActivityRows } from '../activity/activity.repository';

export class QuotesRepository {
  /** Who changed what, written in the same transaction as the change. */
  readonly activity: ActivityRows;

  constructor(private readonly m: EntityManager) {
    this.activity = new ActivityRows(m);
  }

  list() {
    return this.m.find(Quote, { order: { updatedAt: 'DESC' } });
  }
  find(id: string) {
    return this.m.findOneBy(Quote, { id });
  }
  findByTokenHash(tokenHash: string) {
    return this.m.findOneBy(Quote, { tokenHash });
  }
  count() {
    return this.m.count(Quote);
  }
  /** The one draft → sent transition, guarded in the database: false when the quote was no longer a draft. */
  async markSent(id: string, fields: Pick<Quote, 'snapshot' | 'tokenHash' | 'sentAt'>): Promise<boolean> {
    const result = await this.m
      .createQueryBuilder()
      .update(Quote)
      .set({ ...fields, status: 'sent', updatedAt: fields.sentAt! })
      .where('id = :id AND status = :draft', { id, draft: 'draft' })
      .execute();
    return result.affected === 1;
  }
  /** Back to draft after the e-mail could not go out; only the send that set this token can undo itself. */
  async undoSent(id: string, tokenHash: string): Promise<boolean> {
    const result = await this.m
      .createQueryBuilder()
      .update(Quote)
      .set({ status: 'draft', snapshot: null, tokenHash: null, sentAt: null, updatedAt: new Date() })
      .where('id = :id AND status = :sent AND token_hash = :tokenHash', { id, sent: 'sent', tokenHash })
      .execute();
    return result.affected === 1;
  }
  save(quote: Quote) {
    return this.m.save(Quote, quote);
  }
  addEvent(event: Partial<QuoteEvent>) {
    return this.m.save(QuoteEvent, Object.assign(new QuoteEvent(), event));
  }
  limitOverridesOf(quoteId: string) {
    return this.m.find(QuoteLimitOverride, { where: { quoteId }, order: { optionIndex: 'ASC' } });
  }
  /** One override per option: a new reason replaces the old one. */
  async putLimitOverride(row: QuoteLimitOverride) {
    await this.m.delete(QuoteLimitOverride, { quoteId: row.quoteId, optionIndex: row.optionIndex });
    return this.m.save(QuoteLimitOverride, row);
  }
  eventsOf(quoteIds: string[]) {
    return quoteIds.length === 0
      ? Promise.resolve([])
      : this.m
          .createQueryBuilder(QuoteEvent, 'e')
          .where({ quoteId: In(quoteIds) })
          .orderBy('e.at', 'ASC')
          .addOrderBy('e.rowid', 'ASC')
          .getMany();
  }
}

export class QuotesStore extends Store<QuotesRepository> {
  constructor(dataSource: DataSource) {
    super(dataSource, (m) => new QuotesRepository(m));
  }
}
