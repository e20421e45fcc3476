import type { DataSource, EntityManager } from 'typeorm';

/** Hands out a feature's repository: on the shared connection for reads, inside one transaction for writes. */
export class Store<R> {
  constructor(
    private readonly dataSource: DataSource,
    private readonly make: (manager: EntityManager) => R,
  ) {}

  read(): R {
    return this.make(this.dataSource.manager);
  }

  write<T>(work: (repo: R) => Promise<T>): Promise<T> {
    return this.dataSource.transaction((m) => work(this.make(m)));
  }
}

/** A new entity instance with the given fields (without TypeORM's `create`, which needs a repository). */
export function build<T extends object>(entity: new () => T, fields: Partial<T>): T {
  return Object.assign(new entity(), fields) as T;
}
