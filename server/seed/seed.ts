import type { DataSource } from 'typeorm';
import { seedDemoUsers } from './demo-users';

export interface SeedReport {
  demoUsers: number;
}

/** Runs every seed step; each is idempotent, so this is safe on every start. */
export async function seed(dataSource: DataSource, options: { demo: boolean }): Promise<SeedReport> {
  const report: SeedReport = { demoUsers: 0 };
  if (options.demo) report.demoUsers = await seedDemoUsers(dataSource);
  return report;
}
