import type { DataSource, Repository } from 'typeorm';
import { SignInAddress } from './sign-in-address.entity';

/** The addresses (hashed) each user has signed in from. */
export class KnownAddressesRepository {
  private readonly repo: Repository<SignInAddress>;

  constructor(dataSource: DataSource) {
    this.repo = dataSource.getRepository(SignInAddress);
  }

  async isKnown(userId: string, addressHash: string): Promise<boolean> {
    return (await this.repo.countBy({ userId, addressHash })) > 0;
  }

  async remember(userId: string, addressHash: string): Promise<void> {
    await this.repo.upsert({ userId, addressHash, lastSuccessAt: new Date() }, ['userId', 'addressHash']);
  }
}
