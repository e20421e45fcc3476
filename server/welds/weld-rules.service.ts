import { randomUUID } from 'node:crypto';
import type { WeldRuleInput, WeldRulePatch, WeldRuleRevisionView, WeldRuleView } from '../../shared/schemas/weld-rules';
import { isTitanium } from '../../shared/welds/weld-metals';
import { titaniumRefusal } from '../../shared/welds/weld-pairing';
import { sharedPair } from '../../shared/welds/weld-rule-match';
import { build } from '../db/store';
import { AppError } from '../http/app-error';
import { WeldRuleRow, type WeldRuleRevision } from './weld-rule.entities';
import type { WeldRulesRepository, WeldRulesStore } from './weld-rules.repository';

export interface WeldActor {
  id: string;
  name: string;
}

/** A seeded rule's id follows its key, so a rule the shop deleted is known by its revisions and not seeded again. */
export const seedRuleId = (key: string) => `seed-${key}`;

const EDITABLE = ['sideA', 'sideB', 'filler', 'fillerSpec', 'purge', 'notes', 'procedureRef', 'source'] as const;

export function weldRuleView(r: WeldRuleRow): WeldRuleView {
  return {
    id: r.id,
    key: r.key,
    sideA: r.sideA,
    sideB: r.sideB,
    filler: r.filler,
    fillerSpec: r.fillerSpec,
    purge: r.purge,
    notes: r.notes,
    procedureRef: r.procedureRef,
    source: r.source,
    version: r.version,
    updatedBy: r.updatedBy,
    updatedAt: new Date(r.updatedAt).toISOString(),
  };
}

const revisionView = (r: WeldRuleRevision): WeldRuleRevisionView => ({
  id: r.id,
  ruleId: r.ruleId,
  version: r.version,
  action: r.action,
  userName: r.userName,
  note: r.note,
  diff: r.diff,
  at: new Date(r.at).toISOString(),
});

/** Titanium on one side only: no filler joins it to steel or nickel, so no rule may claim one. */
function checkWeldable(sides: { sideA: string[]; sideB: string[] }): void {
  const ti = (uns: string) => isTitanium({ uns, designation: uns, family: null });
  for (const a of sides.sideA) {
    for (const b of sides.sideB) {
      if (ti(a) !== ti(b)) {
        throw AppError.badRequest('never_fusion_welded', titaniumRefusal({ uns: a, designation: `UNS ${a}`, family: null }, { uns: b, designation: `UNS ${b}`, family: null }) + '.', {
          sideB: 'Titanium is welded only to titanium',
        });
      }
    }
  }
}

/** The shop's weld table: every pair has at most one rule, every change a revision. */
export class WeldRulesService {
  constructor(private readonly store: WeldRulesStore) {}

  async list(): Promise<WeldRuleView[]> {
    return (await this.store.read().all()).map(weldRuleView);
  }

  private async ruleIn(repo: WeldRulesRepository, id: string): Promise<WeldRuleRow> {
    const row = await repo.find(id);
    if (!row) throw AppError.notFound('There is no such weld rule.');
    return row;
  }

  async get(id: string): Promise<WeldRuleView> {
    return weldRuleView(await this.ruleIn(this.store.read(), id));
  }

  async revisions(id: string): Promise<WeldRuleRevisionView[]> {
    const rows = await this.store.read().revisions(id);
    if (rows.length === 0) throw AppError.notFound('There is no such weld rule.');
    return rows.map(revisionView);
  }

  private async checkNoOverlap(repo: WeldRulesRepository, sides: { sideA: string[]; sideB: string[] }, ownId: string | null): Promise<void> {
    for (const other of await repo.all()) {
      if (other.id === ownId) continue;
      const pair = sharedPair(sides, other);
      if (pair) {
        throw AppError.conflict('rule_overlap', `The rule for ${other.filler} already covers ${pair[0]} to ${pair[1]}: edit that rule, or take the pair out of one of them.`, {
          sideA: `Overlaps the ${other.filler} rule`,
        });
      }
    }
  }

  async create(input: WeldRuleInput, actor: WeldActor | null, key: string | null = null, note = ''): Promise<WeldRuleView> {
    checkWeldable(input);
    return this.store.write(async (repo) => {
      await this.checkNoOverlap(repo, input, null);
      const now = new Date();
      const row = build(WeldRuleRow, { id: key ? seedRuleId(key) : randomUUID(), key, ...input, version: 1, updatedBy: actor?.name ?? null, createdAt: now, updatedAt: now });
      await repo.save(row);
      const diff = EDITABLE.map((path) => ({ path, before: null, after: input[path] }));
      await repo.addRevision({ id: randomUUID(), ruleId: row.id, version: 1, action: 'created', userId: actor?.id ?? null, userName: actor?.name ?? null, note, diff, at: now });
      return weldRuleView(row);
    });
  }

  async patch(id: string, patch: WeldRulePatch, actor: WeldActor | null): Promise<WeldRuleView> {
    return this.store.write(async (repo) => {
      const row = await this.ruleIn(repo, id);
      const { note = '', ...fields } = patch;
      const next = { sideA: fields.sideA ?? row.sideA, sideB: fields.sideB ?? row.sideB };
      checkWeldable(next);
      await this.checkNoOverlap(repo, next, id);
      const diff = EDITABLE.filter((k) => fields[k] !== undefined && JSON.stringify(fields[k]) !== JSON.stringify(row[k])).map((path) => ({ path, before: row[path], after: fields[path] }));
      if (diff.length === 0) return weldRuleView(row);
      const now = new Date();
      Object.assign(row, fields, { version: row.version + 1, updatedBy: actor?.name ?? null, updatedAt: now });
      await repo.save(row);
      await repo.addRevision({ id: randomUUID(), ruleId: id, version: row.version, action: 'edited', userId: actor?.id ?? null, userName: actor?.name ?? null, note, diff, at: now });
      return weldRuleView(row);
    });
  }

  async remove(id: string, actor: WeldActor | null): Promise<void> {
    await this.store.write(async (repo) => {
      const row = await this.ruleIn(repo, id);
      await repo.remove(id);
      const diff = [{ path: 'rule', before: weldRuleView(row), after: null }];
      await repo.addRevision({ id: randomUUID(), ruleId: id, version: row.version, action: 'deleted', userId: actor?.id ?? null, userName: actor?.name ?? null, note: '', diff, at: new Date() });
    });
  }
}
