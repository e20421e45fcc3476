import type { DataSource, Repository } from 'typeorm';
import { User } from './user.entity';

export class UsersRepository {
  private readonly repo: Repository<User>;

  constructor(dataSource: DataSource) {
    this.repo = dataSource.getRepository(User);
  }

  findById(id: string) {
    return this.repo.findOneBy({ id });
  }

  findByEmail(email: string) {
    return this.repo.findOneBy({ email });
  }

  list() {
    return this.repo.find({ order: { active: 'DESC', name: 'ASC' } });
  }

  activeAdmins() {
    return this.repo.find({ where: { role: 'admin', active: true }, order: { name: 'ASC' } });
  }

  countActiveAdmins() {
    return this.repo.countBy({ role: 'admin', active: true });
  }

  async insert(user: User) {
    await this.repo.insert(user);
    return (await this.findById(user.id))!;
  }

  save(user: User) {
    return this.repo.save(user);
  }

  create(fields: Pick<User, 'id' | 'email' | 'name' | 'role' | 'passwordHash' | 'active'>) {
    return this.repo.create(fields);
  }
}
