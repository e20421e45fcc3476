import type { DataSource } from 'typeorm';
import { CatalogueStore } from '../catalogue/catalogue.repository';
import { CatalogueService } from '../catalogue/catalogue.service';
import { seedCatalogue, seedFlexParts } from './catalogue-seed';
import { seedDemoJobs } from './demo-jobs';
import { seedDemoUsers } from './demo-users';
import { seedWeldRules } from './weld-rules-seed';

export interface SeedOptions {
  /** The invented shop: its people and flex parts. */
  demo: boolean;
  /** The reference catalogue of published alloy data (prices in it are demo values). */
  catalogue?: boolean;
}

export interface SeedReport {
  demoUsers: number;
  sources: number;
  alloys: number;
  flexParts: number;
  weldRules: number;
  demoJobs?: number;
}

/** Runs every seed step; each adds only what is missing, so this is safe on every start. */
export async function seed(dataSource: DataSource, options: SeedOptions): Promise<SeedReport> {
  const report: SeedReport = { demoUsers: 0, sources: 0, alloys: 0, flexParts: 0, weldRules: 0 };
  await new CatalogueService(new CatalogueStore(dataSource)).fillListKeys();
  if (options.catalogue ?? true) {
    Object.assign(report, await seedCatalogue(dataSource));
    report.weldRules = await seedWeldRules(dataSource);
  }
  if (options.demo) {
    report.demoUsers = await seedDemoUsers(dataSource);
    report.flexParts = await seedFlexParts(dataSource);
    report.demoJobs = await seedDemoJobs(dataSource);
  }
  return report;
}
