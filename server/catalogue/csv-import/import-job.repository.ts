import { IsNull, LessThan, type DataSource } from 'typeorm';
import { ImportJobRow } from './import-job.entity';

/** The only reader and writer of `import_job`. */
export class ImportJobRepository {
  constructor(private readonly dataSource: DataSource) {}

  private get rows() {
    return this.dataSource.getRepository(ImportJobRow);
  }

  find(id: string) {
    return this.rows.findOneBy({ id });
  }
  running() {
    return this.rows.findOneBy({ runningSlot: 'one' });
  }
  /** Throws a unique violation when another import holds the running slot. */
  insert(row: ImportJobRow) {
    return this.rows.insert(row);
  }
  update(id: string, fields: Partial<ImportJobRow>) {
    return this.rows.update({ id }, fields);
  }
  forgetFinishedBefore(cutoff: Date) {
    return this.rows.delete({ runningSlot: IsNull(), finishedAt: LessThan(cutoff) });
  }
}
