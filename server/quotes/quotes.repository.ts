import type { DataSource, EntityManager } from 'typeorm';
import { In } from 'typeorm';
import { Quote, QuoteEvent } from './quote.entities';
import { Store } from '../db/store';

export class QuotesRepository {
  constructor(private readonly m: EntityManager) {}

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
  save(quote: Quote) {
    return this.m.save(Quote, quote);
  }
  addEvent(event: Partial<QuoteEvent>) {
    return this.m.save(QuoteEvent, Object.assign(new QuoteEvent(), event));
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
