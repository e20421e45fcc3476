import { randomUUID } from 'node:crypto';
import { diffAlloy, stripMeta } from '../../shared/catalogue/alloy-diff';
import { designationKey, searchText } from '../../shared/catalogue/designation-key';
import { toAlloyData } from '../../shared/catalogue/to-alloy-data';
import type { AlloyData } from '../../shared/engine/types';
import {
  alloyInputSchema,
  type AlloyDetail,
  type AlloyFamily,
  type AlloyInput,
  type AlloyListQuery,
  type AlloyPatch,
  type AlloySummary,
  type AlloyVersionView,
  type RevisionView,
  type SourceInput,
  type SourceView,
} from '../../shared/schemas/alloy';
import { AppError } from '../http/app-error';
import { fieldsFromZod } from '../http/validate';
import { Alloy, AlloyRevision, AlloyVersion, PropertyPoint, Source, type PropertyKind } from './catalogue.entities';
import type { CatalogueRepository, CatalogueStore } from './catalogue.repository';
import { StampedCache } from '../cache/stamped-cache';
import { canEdit, type Actor } from './actor';
import { AlloyListing } from './alloy-listing';
import { citedSourceIds, datasheetView, revisionView, sourceView, versionView } from './catalogue.views';

export { canEdit, SEED_ACTOR, type Actor } from './actor';

/** The published data the calculator uses, with the version it came from. */
export interface PublishedAlloy {
  alloyId: string;
  designation: string;
  uns: string;
  family: AlloyFamily;
  version: number;
  versionId: string;
  data: AlloyData;
  currency: string;
}

const TABLE_VALUE: Record<PropertyKind, 'meanUmPerMK' | 'gpa' | 'mpa'> = { cte: 'meanUmPerMK', modulus: 'gpa', yield: 'mpa' };

export class CatalogueService {
  private readonly published = new StampedCache<PublishedAlloy | null>();
  /** The alloy list's pages, counts and answers, cached under the catalogue stamp. */
  readonly listing: AlloyListing;

  constructor(private readonly store: CatalogueStore) {
    this.listing = new AlloyListing(store);
  }

  // ---- reading ----

  async views(repo: CatalogueRepository, versionIds: (string | null)[]) {
    const ids = versionIds.filter((id): id is string => id !== null);
    const [versions, points] = await Promise.all([repo.findVersions(ids), repo.pointsFor(ids)]);
    return new Map(versions.map((v) => [v.id, versionView(v, points)]));
  }

  list(query: AlloyListQuery, actor: Actor): Promise<{ items: AlloySummary[]; total: number }> {
    return this.listing.list(query, actor);
  }

  async visibleAlloy(repo: CatalogueRepository, id: string, actor: Actor): Promise<Alloy> {
    const alloy = await repo.findAlloy(id);
    if (!alloy || (!alloy.publishedVersionId && !canEdit(actor))) throw AppError.notFound('There is no such alloy.');
    return alloy;
  }

  async detail(id: string, actor: Actor): Promise<AlloyDetail> {
    return this.detailIn(this.store.read(), id, actor);
  }

  async detailIn(repo: CatalogueRepository, id: string, actor: Actor): Promise<AlloyDetail> {
    const alloy = await this.visibleAlloy(repo, id, actor);
    const draftId = canEdit(actor) ? alloy.draftVersionId : null;
    const views = await this.views(repo, [alloy.publishedVersionId, draftId]);
    const published = alloy.publishedVersionId ? views.get(alloy.publishedVersionId) ?? null : null;
    const draft = draftId ? views.get(draftId) ?? null : null;
    const sourceIds = [...new Set([published, draft].flatMap((v) => (v ? citedSourceIds(v) : [])))];
    const [sources, sheets] = await Promise.all([repo.findSources(sourceIds), repo.datasheetsFor(alloy.id)]);
    return {
      id: alloy.id,
      status: alloy.status,
      published,
      draft,
      sources: sources.map(sourceView),
      datasheets: sheets.map(datasheetView),
      review: draft && alloy.reviewStep ? { step: alloy.reviewStep, note: alloy.reviewNote, by: alloy.reviewBy, at: new Date(alloy.reviewAt ?? alloy.updatedAt).toISOString() } : null,
    };
  }

  /** Any version by number: published and superseded ones for everyone, drafts for editors. */
  async version(id: string, version: number, actor: Actor): Promise<AlloyVersionView> {
    const repo = this.store.read();
    await this.visibleAlloy(repo, id, actor);
    const row = await repo.findVersionByNumber(id, version);
    if (!row || (row.state === 'draft' && !canEdit(actor))) throw AppError.notFound('There is no such version.');
    return versionView(row, await repo.pointsFor([row.id]));
  }

  /**
   * The alloy's history. Editors see every step; other roles only steps of versions that were
   * published (and those of no version: retiring, data sheets), never the edits of an open draft.
   */
  async revisions(id: string, actor: Actor): Promise<RevisionView[]> {
    const repo = this.store.read();
    await this.visibleAlloy(repo, id, actor);
    const all = await repo.revisionsFor(id);
    if (canEdit(actor)) return all.map(revisionView);
    const released = new Set((await repo.versionsOf(id)).filter((v) => v.state !== 'draft').map((v) => v.version));
    return all.filter((r) => r.version === null || released.has(r.version)).map(revisionView);
  }

  /** The change an admin reviews before publishing: the draft against the published version. */
  async review(id: string, actor: Actor) {
    const detail = await this.detail(id, actor);
    if (!detail.draft) throw AppError.conflict('no_draft', 'This alloy has no draft to review.');
    return { alloyId: id, published: detail.published, draft: detail.draft, diff: diffAlloy(stripMeta(detail.published), stripMeta(detail.draft)!) };
  }

  /** The id of the catalogue's alloy with this UNS number, retired ones included; null when there is none. */
  async alloyIdByUns(uns: string): Promise<string | null> {
    return (await this.store.read().findAlloyByUns(uns))?.id ?? null;
  }

  /** The catalogue's cache stamp: it moves on every publish, edit, retire or restore, on any instance. */
  stamp(): Promise<number> {
    return this.store.read().stamps.read('catalogue');
  }

  /** Cached while the catalogue's stamp stands; a publish, edit, retire or restore anywhere bumps it. */
  async publishedAlloy(id: string): Promise<PublishedAlloy> {
    const repo = this.store.read();
    const found = await this.published.get(await repo.stamps.read('catalogue'), id, () => this.readPublished(repo, id));
    if (!found) throw AppError.notFound('There is no published alloy with this id.');
    return found;
  }

  private async readPublished(repo: CatalogueRepository, id: string): Promise<PublishedAlloy | null> {
    const alloy = await repo.findAlloy(id);
    if (!alloy?.publishedVersionId || alloy.status === 'retired') return null;
    const v = (await this.views(repo, [alloy.publishedVersionId])).get(alloy.publishedVersionId)!;
    const sources = await repo.findSources([...new Set([...v.modulus, ...v.yield].map((p) => p.sourceId))]);
    return {
      alloyId: alloy.id,
      designation: v.designation,
      uns: v.uns,
      family: v.family,
      version: v.version,
      versionId: v.versionId,
      data: toAlloyData(v, sources),
      currency: v.currency,
    };
  }

  // ---- writing ----

  private async checkSources(repo: CatalogueRepository, input: AlloyInput) {
    const cited: [string, string][] = [
      ['densitySourceId', input.densitySourceId],
      ['limitsSourceId', input.limitsSourceId],
      ...(['cte', 'modulus', 'yield'] as const).flatMap((table) =>
        input[table].map((p, i) => [`${table}.${i}.sourceId`, p.sourceId] as [string, string]),
      ),
    ];
    const found = new Set((await repo.findSources([...new Set(cited.map(([, id]) => id))])).map((s) => s.id));
    const fields = Object.fromEntries(cited.filter(([, id]) => !found.has(id)).map(([path]) => [path, 'No such source']));
    if (Object.keys(fields).length > 0) throw AppError.badRequest('unknown_source', 'Some values cite a source that does not exist.', fields);
  }

  private async checkUnsFree(repo: CatalogueRepository, uns: string, alloyId: string | null) {
    const other = await repo.findAlloyByUns(uns);
    if (other && other.id !== alloyId) {
      throw AppError.conflict('uns_taken', `Another alloy already has UNS ${uns}.`, { uns: 'Another alloy already has this UNS number' });
    }
  }

  private async writeVersionData(repo: CatalogueRepository, version: AlloyVersion, input: AlloyInput) {
    Object.assign(version, versionFields(input));
    await repo.saveVersion(version);
    const rows = pointRows(repo, version.id, input);
    for (const kind of ['cte', 'modulus', 'yield'] as const) {
      await repo.replacePoints(version.id, kind, rows.filter((p) => p.kind === kind));
    }
  }

  private revisionRow(repo: CatalogueRepository, alloyId: string, fields: Pick<AlloyRevision, 'action' | 'version' | 'note' | 'diff'>, actor: Actor) {
    return repo.create(AlloyRevision, { id: randomUUID(), alloyId, userId: actor?.id ?? null, userName: actor?.name ?? 'Dilato seed', at: new Date(), ...fields });
  }

  revision(repo: CatalogueRepository, alloyId: string, fields: Pick<AlloyRevision, 'action' | 'version' | 'note' | 'diff'>, actor: Actor) {
    return repo.addRevision(this.revisionRow(repo, alloyId, fields, actor));
  }

  async create(input: AlloyInput, actor: Actor, note = ''): Promise<AlloyDetail> {
    return this.store.write(async (repo) => this.detailIn(repo, await this.createIn(repo, input, actor, note), actor));
  }

  /** Creates the alloy as draft v1 inside the caller's transaction; returns its id. Every check runs before the first write. */
  async createIn(repo: CatalogueRepository, input: AlloyInput, actor: Actor, note = ''): Promise<string> {
    await this.checkUnsFree(repo, input.uns, null);
    await this.checkSources(repo, input);
    const alloyId = randomUUID();
    const now = new Date();
    const version = repo.create(AlloyVersion, { id: randomUUID(), alloyId, version: 1, state: 'draft', createdBy: actor?.id ?? null, createdAt: now, publishedAt: null, publishedBy: null });
    await repo.insertNew(Alloy, [repo.create(Alloy, { id: alloyId, uns: input.uns, status: 'draft', publishedVersionId: null, draftVersionId: version.id, createdAt: now, updatedAt: now })]);
    Object.assign(version, versionFields(input));
    await repo.insertNew(AlloyVersion, [version]);
    await repo.insertNew(PropertyPoint, pointRows(repo, version.id, input));
    await repo.insertNew(AlloyRevision, [this.revisionRow(repo, alloyId, { action: 'created', version: 1, note, diff: diffAlloy(null, input) }, actor)]);
    return alloyId;
  }

  /** Edits the open draft; on a published alloy with no draft, opens one beside the published version. */
  async patch(id: string, patch: AlloyPatch, actor: Actor): Promise<AlloyDetail> {
    return this.store.write(async (repo) => {
      await this.patchIn(repo, id, patch, actor);
      return this.detailIn(repo, id, actor);
    });
  }

  /** The edit inside the caller's transaction; every check (and `no_change`) comes before the first write. */
  async patchIn(repo: CatalogueRepository, id: string, patch: AlloyPatch, actor: Actor): Promise<void> {
    const alloy = await this.visibleAlloy(repo, id, actor);
    const views = await this.views(repo, [alloy.draftVersionId, alloy.publishedVersionId]);
    const base = views.get(alloy.draftVersionId ?? '') ?? views.get(alloy.publishedVersionId ?? '');
    if (!base) throw AppError.notFound('There is no such alloy.');
    const { note, ...changes } = patch;
    const parsed = alloyInputSchema.safeParse({ ...stripMeta(base), ...changes });
    if (!parsed.success) throw AppError.badRequest('invalid_input', 'Some values need attention.', fieldsFromZod(parsed.error));
    const input = parsed.data;
    const diff = diffAlloy(stripMeta(base), input);
    if (diff.length === 0) throw AppError.badRequest('no_change', 'Nothing changed.');
    await this.checkUnsFree(repo, input.uns, alloy.id);
    await this.checkSources(repo, input);

    let draft = alloy.draftVersionId ? await repo.findVersion(alloy.draftVersionId) : null;
    if (!draft) {
      draft = repo.create(AlloyVersion, {
        id: randomUUID(),
        alloyId: alloy.id,
        version: (await repo.latestVersionNumber(alloy.id)) + 1,
        state: 'draft',
        createdBy: actor?.id ?? null,
        publishedAt: null,
        publishedBy: null,
      });
    }
    await this.writeVersionData(repo, draft, input);
    alloy.draftVersionId = draft.id;
    alloy.uns = input.uns;
    await repo.saveAlloy(alloy);
    await repo.stamps.bump('catalogue');
    await this.revision(repo, alloy.id, { action: 'edited', version: draft.version, note: note ?? '', diff }, actor);
  }

  async publish(id: string, actor: Actor, note = ''): Promise<AlloyDetail> {
    return this.store.write(async (repo) => {
      const alloy = await this.visibleAlloy(repo, id, actor);
      if (!alloy.draftVersionId) throw AppError.conflict('no_draft', 'There is no draft to publish.');
      const views = await this.views(repo, [alloy.draftVersionId, alloy.publishedVersionId]);
      const draftView = views.get(alloy.draftVersionId)!;
      const before = alloy.publishedVersionId ? views.get(alloy.publishedVersionId)! : null;

      if (alloy.publishedVersionId) {
        const old = (await repo.findVersion(alloy.publishedVersionId))!;
        old.state = 'superseded';
        await repo.saveVersion(old);
      }
      const draft = (await repo.findVersion(alloy.draftVersionId))!;
      Object.assign(draft, { state: 'published', publishedAt: new Date(), publishedBy: actor?.id ?? null });
      await repo.saveVersion(draft);
      Object.assign(alloy, { publishedVersionId: draft.id, draftVersionId: null, status: 'published', uns: draft.uns, reviewStep: null, reviewNote: '', reviewBy: null, reviewAt: null });
      await repo.saveAlloy(alloy);
      await repo.stamps.bump('catalogue');
      await this.revision(repo, alloy.id, { action: 'published', version: draft.version, note, diff: diffAlloy(stripMeta(before), stripMeta(draftView)!) }, actor);
      return this.detailIn(repo, alloy.id, actor);
    });
  }

  async setRetired(id: string, retired: boolean, actor: Actor, note = ''): Promise<AlloyDetail> {
    return this.store.write(async (repo) => {
      const alloy = await this.visibleAlloy(repo, id, actor);
      if (!alloy.publishedVersionId) throw AppError.conflict('never_published', 'Only a published alloy can be retired or restored.');
      const next = retired ? 'retired' : 'published';
      if (alloy.status === next) throw AppError.conflict('no_change', retired ? 'This alloy is already retired.' : 'This alloy is not retired.');
      const before = alloy.status;
      alloy.status = next;
      await repo.saveAlloy(alloy);
      await repo.stamps.bump('catalogue');
      await this.revision(repo, alloy.id, { action: retired ? 'retired' : 'restored', version: null, note, diff: [{ path: 'status', before, after: next }] }, actor);
      return this.detailIn(repo, alloy.id, actor);
    });
  }

  /** Gives versions from before the list's sort and search columns their values; nothing to do once done. */
  async fillListKeys(): Promise<number> {
    return this.store.write(async (repo) => {
      const rows = await repo.versionsWithoutListKeys();
      for (const row of rows) await repo.setListKeys(row.id, designationKey(row.designation), searchText(row.designation, row.uns));
      return rows.length;
    });
  }

  // ---- sources ----

  async sources(): Promise<SourceView[]> {
    return (await this.store.read().allSources()).map(sourceView);
  }

  async createSource(input: SourceInput, key: string | null = null): Promise<SourceView> {
    return this.store.write(async (repo) => {
      const source = repo.create(Source, { id: randomUUID(), key, kind: input.kind, title: input.title, issuer: input.issuer, edition: input.edition, url: input.url ?? null, note: input.note, datasheetId: null });
      return sourceView(await repo.saveSource(source));
    });
  }
}

function versionFields(input: AlloyInput): Partial<AlloyVersion> {
  return {
    designation: input.designation,
    designationKey: designationKey(input.designation),
    searchText: searchText(input.designation, input.uns),
    uns: input.uns,
    family: input.family,
    densityKgM3: input.densityKgM3,
    densitySourceId: input.densitySourceId,
    maxContinuousC: input.maxContinuousC,
    maxIntermittentC: input.maxIntermittentC,
    limitsSourceId: input.limitsSourceId,
    pricePerKg: input.pricePerKg,
    currency: input.currency,
    priceSetOn: input.priceSetOn,
    priceIsDemo: input.priceIsDemo,
    referenceTempC: input.referenceTempC,
    notes: input.notes,
    dataCautions: input.dataCautions,
    warningRanges: input.warningRanges,
  };
}

function pointRows(repo: CatalogueRepository, versionId: string, input: AlloyInput): PropertyPoint[] {
  return (['cte', 'modulus', 'yield'] as const).flatMap((kind) =>
    (input[kind] as { tempC: number; sourceId: string }[]).map((p) =>
      repo.create(PropertyPoint, {
        id: randomUUID(),
        versionId,
        kind,
        tempC: p.tempC,
        value: (p as unknown as Record<string, number>)[TABLE_VALUE[kind]],
        sourceId: p.sourceId,
      }),
    ),
  );
}
