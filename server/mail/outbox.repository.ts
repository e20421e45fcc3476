import type { DataSource, Repository } from 'typeorm';
import { MailMessage } from './mail-message.entity';

export class OutboxRepository {
  private readonly repo: Repository<MailMessage>;

  constructor(dataSource: DataSource) {
    this.repo = dataSource.getRepository(MailMessage);
  }

  save(message: MailMessage) {
    return this.repo.save(message);
  }

  create(fields: Partial<MailMessage>) {
    return this.repo.create(fields);
  }

  list(limit: number) {
    return this.repo
      .createQueryBuilder('m')
      .orderBy('m.received_at', 'DESC')
      .addOrderBy('m.rowid', 'DESC')
      .limit(limit)
      .getMany();
  }

  findById(id: string) {
    return this.repo.findOneBy({ id });
  }
}
