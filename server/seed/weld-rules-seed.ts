import fs from 'node:fs';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import { weldRuleInputSchema } from '../../shared/schemas/weld-rules';
import { WeldRulesStore } from '../welds/weld-rules.repository';
import { seedRuleId, WeldRulesService } from '../welds/weld-rules.service';
import { SEED_DIR } from './catalogue-seed';

const SEED_NOTE = 'Seeded from published guidance (data/seed/weld-rules.json)';

/** Adds the seed weld rules whose keys are missing; a rule the shop deleted or edited is left as the shop left it. */
export async function seedWeldRules(dataSource: DataSource): Promise<number> {
  const store = new WeldRulesStore(dataSource);
  const service = new WeldRulesService(store);
  const file = JSON.parse(fs.readFileSync(path.join(SEED_DIR, 'weld-rules.json'), 'utf8')) as { rules: ({ key: string } & Record<string, unknown>)[] };
  let added = 0;
  for (const { key, ...raw } of file.rules) {
    if (await store.read().findByKey(key)) continue;
    if ((await store.read().revisions(seedRuleId(key))).length > 0) continue;
    await service.create(weldRuleInputSchema.parse(raw), null, key, SEED_NOTE);
    added += 1;
  }
  return added;
}
