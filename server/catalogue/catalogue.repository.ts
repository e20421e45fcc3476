import { In, type DataSource, type EntityManager } from 'typeorm';
import { build, Store } from '../db/store';
import { AlloyListRows } from './alloy-list.repository';
import { CacheStamps } from '../cache/cache-stamps.repository';
import {
  Alloy,
  AlloyRevision,
  AlloyVersion,
  Datasheet,
  PropertyPoint,
  Source,
  type PropertyKind,
} from './catalogue.entities';

/** The only place catalogue rows are read and written. Bind it to a transaction's manager to write atomically. */
export class CatalogueRepository {
  /** The alloy list's paged queries. */
  readonly list: AlloyListRows;
  /** The catalogue's cache stamp, bumped by every write readers of published data must see. */
  readonly stamps: CacheStamps;

  constructor(private readonly m: EntityManager) {
    this.list = new AlloyListRows(m);
    this.stamps = new CacheStamps(m);
  }

  findAlloy(id: string) {
    return this.m.findOneBy(Alloy, { id });
  }
  alloysInReview() {
    return this.m.findBy(Alloy, { reviewStep: 'submitted' });
  }
  findAlloyByUns(uns: string) {
    return this.m.findOneBy(Alloy, { uns });
  }
  saveAlloy(alloy: Alloy) {
    return this.m.save(Alloy, alloy);
  }

  findVersion(id: string) {
    return this.m.findOneBy(AlloyVersion, { id });
  }
  findVersions(ids: string[]) {
    return ids.length === 0 ? Promise.resolve([]) : this.m.findBy(AlloyVersion, { id: In(ids) });
  }
  versionsOf(alloyId: string) {
    return this.m.find(AlloyVersion, { where: { alloyId }, select: { id: true, version: true, state: true } });
  }
  versionSummariesOf(alloyId: string) {
    return this.m.find(AlloyVersion, { where: { alloyId }, select: { id: true, version: true, state: true, designation: true, publishedAt: true, createdAt: true } });
  }
  findVersionByNumber(alloyId: string, version: number) {
    return this.m.findOneBy(AlloyVersion, { alloyId, version });
  }
  async latestVersionNumber(alloyId: string): Promise<number> {
    const row = await this.m
      .createQueryBuilder(AlloyVersion, 'v')
      .select('MAX(v.version)', 'max')
      .where('v.alloy_id = :alloyId', { alloyId })
      .getRawOne<{ max: number | null }>();
    return row?.max ?? 0;
  }
  /** Versions written before the list's sort and search columns existed. */
  versionsWithoutListKeys() {
    return this.m.find(AlloyVersion, { where: [{ designationKey: '' }, { searchText: '' }], select: { id: true, designation: true, uns: true } });
  }
  async setListKeys(id: string, designationKey: string, searchText: string) {
    await this.m.update(AlloyVersion, { id }, { designationKey, searchText });
  }
  saveVersion(version: AlloyVersion) {
    return this.m.save(AlloyVersion, version);
  }

  pointsFor(versionIds: string[]) {
    return versionIds.length === 0
      ? Promise.resolve([])
      : this.m.find(PropertyPoint, { where: { versionId: In(versionIds) }, order: { tempC: 'ASC' } });
  }
  /** Plain INSERTs for rows known to be new (no read-before-write, no reload), e.g. a large import. */
  async insertNew<T extends object>(entity: new () => T, rows: T[]) {
    if (rows.length > 0) await this.m.createQueryBuilder().insert().into(entity).values(rows as never).updateEntity(false).execute();
  }
  async replacePoints(versionId: string, kind: PropertyKind, points: PropertyPoint[]) {
    await this.m.delete(PropertyPoint, { versionId, kind });
    if (points.length > 0) await this.m.insert(PropertyPoint, points);
  }

  allSources() {
    return this.m.find(Source, { order: { title: 'ASC' } });
  }
  findSources(ids: string[]) {
    return ids.length === 0 ? Promise.resolve([]) : this.m.find(Source, { where: { id: In(ids) }, order: { title: 'ASC', id: 'ASC' } });
  }
  findSourceByKey(key: string) {
    return this.m.findOneBy(Source, { key });
  }
  saveSource(source: Source) {
    return this.m.save(Source, source);
  }

  addRevision(revision: AlloyRevision) {
    return this.m.save(AlloyRevision, revision);
  }
  revisionsFor(alloyId: string) {
    return this.m
      .createQueryBuilder(AlloyRevision, 'r')
      .where('r.alloy_id = :alloyId', { alloyId })
      .orderBy('r.at', 'DESC')
      .addOrderBy('r.rowid', 'DESC')
      .getMany();
  }

  saveDatasheet(sheet: Datasheet) {
    return this.m.save(Datasheet, sheet);
  }
  datasheetsFor(alloyId: string) {
    return this.m.find(Datasheet, { where: { alloyId }, order: { uploadedAt: 'DESC' } });
  }
  deleteDatasheet(id: string) {
    return this.m.delete(Datasheet, { id });
  }
  findDatasheet(id: string) {
    return this.m.findOneBy(Datasheet, { id });
  }

  create<T extends object>(entity: new () => T, fields: Partial<T>): T {
    return build(entity, fields);
  }
}

export class CatalogueStore extends Store<CatalogueRepository> {
  constructor(dataSource: DataSource) {
    super(dataSource, (m) => new CatalogueRepository(m));
  }

  /** Every catalogue write moves the catalogue's stamp in its own transaction, so no cache read under the old stamp outlives it. */
  override write<T>(work: (repo: CatalogueRepository) => Promise<T>): Promise<T> {
    return super.write(async (repo) => {
      const result = await work(repo);
      await repo.stamps.bump('catalogue');
      return result;
    });
  }
}
