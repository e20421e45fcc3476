import fs from 'node:fs';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import { alloyInputSchema, flexPartInputSchema, sourceInputSchema } from '../../shared/schemas/alloy';
import { CatalogueStore } from '../catalogue/catalogue.repository';
import { CatalogueService, SEED_ACTOR } from '../catalogue/catalogue.service';
import { FlexPartsRepository } from '../flex-parts/flex-parts.repository';
import { FlexPartsService } from '../flex-parts/flex-parts.service';

export const SEED_DIR = path.resolve(__dirname, '..', '..', 'data', 'seed');
const SEED_NOTE = 'Seeded from data/seed/catalogue.json';

interface SeedPoint {
  tempC: number;
  source: string;
  [value: string]: unknown;
}
interface SeedAlloy {
  uns: string;
  densitySource: string;
  limitsSource: string;
  cte: SeedPoint[];
  modulus: SeedPoint[];
  yield: SeedPoint[];
  [field: string]: unknown;
}
interface SeedFile {
  sources: ({ key: string } & Record<string, unknown>)[];
  alloys: SeedAlloy[];
}

function readJson<T>(file: string): T {
  return JSON.parse(fs.readFileSync(path.join(SEED_DIR, file), 'utf8')) as T;
}

/** Adds the reference catalogue's missing sources and alloys (by key and UNS), each published as version 1. */
export async function seedCatalogue(dataSource: DataSource): Promise<{ sources: number; alloys: number }> {
  const store = new CatalogueStore(dataSource);
  const service = new CatalogueService(store);
  const seedFile = readJson<SeedFile>('catalogue.json');
  const idByKey = new Map<string, string>();
  let sources = 0;
  let alloys = 0;

  for (const raw of seedFile.sources) {
    const existing = await store.read().findSourceByKey(raw.key);
    if (existing) {
      idByKey.set(raw.key, existing.id);
      continue;
    }
    const created = await service.createSource(sourceInputSchema.parse(raw), raw.key);
    idByKey.set(raw.key, created.id);
    sources += 1;
  }

  const sourceId = (key: string) => {
    const id = idByKey.get(key);
    if (!id) throw new Error(`seed catalogue cites an unknown source "${key}"`);
    return id;
  };
  const cite = (points: SeedPoint[]) => points.map(({ source, ...rest }) => ({ ...rest, sourceId: sourceId(source) }));

  for (const raw of seedFile.alloys) {
    if (await store.read().findAlloyByUns(raw.uns)) continue;
    const { densitySource, limitsSource, cte, modulus, yield: yieldPoints, ...rest } = raw;
    const input = alloyInputSchema.parse({
      ...rest,
      densitySourceId: sourceId(densitySource),
      limitsSourceId: sourceId(limitsSource),
      cte: cite(cte),
      modulus: cite(modulus),
      yield: cite(yieldPoints),
    });
    const created = await service.create(input, SEED_ACTOR, SEED_NOTE);
    await service.publish(created.id, SEED_ACTOR, SEED_NOTE);
    alloys += 1;
  }
  return { sources, alloys };
}

/** The invented flex sections of the demo shop, added by code when missing. */
export async function seedFlexParts(dataSource: DataSource): Promise<number> {
  const service = new FlexPartsService(new FlexPartsRepository(dataSource));
  const repo = new FlexPartsRepository(dataSource);
  let added = 0;
  for (const raw of readJson<Record<string, unknown>[]>('flex-parts.json')) {
    const input = flexPartInputSchema.parse(raw);
    const found = await repo.findByCode(input.code);
    if (!found) {
      await service.create(input, true);
      added += 1;
    } else if (found.isDemo && found.meanDiameterMm === null && found.ratedAngularDeg === 0 && found.ratedCycles === null) {
      // A demo part from before the ratings existed gets them; a part the shop has edited is left alone.
      const { purpose, overallLengthMm, meanDiameterMm, ratedAngularDeg, ratedCycles } = input;
      await service.update(found.id, { purpose, overallLengthMm, meanDiameterMm, ratedAngularDeg, ratedCycles });
    }
    if (found?.isDemo && found.cuffUns === null && input.cuffUns !== null) await service.update(found.id, { cuffUns: input.cuffUns });
  }
  return added;
}
