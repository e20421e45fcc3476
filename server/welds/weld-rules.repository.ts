import type { DataSource, EntityManager } from 'typeorm';
import { build, Store } from '../db/store';
import { WeldRuleRevision, WeldRuleRow } from './weld-rule.entities';

/** The only place weld rules and their revisions are read and written. */
export class WeldRulesRepository {
  constructor(private readonly m: EntityManager) {}

  all() {
    return this.m.find(WeldRuleRow, { order: { filler: 'ASC', id: 'ASC' } });
  }
  find(id: string) {
    return this.m.findOneBy(WeldRuleRow, { id });
  }
  findByKey(key: string) {
    return this.m.findOneBy(WeldRuleRow, { key });
  }
  save(row: WeldRuleRow) {
    return this.m.save(WeldRuleRow, row);
  }
  async remove(id: string) {
    await this.m.delete(WeldRuleRow, { id });
  }
  revisions(ruleId: string) {
    return this.m.find(WeldRuleRevision, { where: { ruleId }, order: { version: 'DESC', at: 'DESC' } });
  }
  addRevision(fields: Partial<WeldRuleRevision>) {
    return this.m.save(WeldRuleRevision, build(WeldRuleRevision, fields));
  }
}

export class WeldRulesStore extends Store<WeldRulesRepository> {
  constructor(dataSource: DataSource) {
    super(dataSource, (m) => new WeldRulesRepository(m));
  }
}
