import type { AlloyListQuery, AlloySummary } from '../../shared/schemas/alloy';
import { StampedCache } from '../cache/stamped-cache';
import { alloyListPage } from './alloy-list';
import type { AlloyListFilter, CtePoint } from './alloy-list.repository';
import type { CatalogueStore } from './catalogue.repository';
import { canEdit, type Actor } from './actor';

type Page = { items: AlloySummary[]; total: number };

/** The alloy list as each role sees it: pages, their counts and their JSON, cached while the catalogue's stamp stands. */
export class AlloyListing {
  /** Expansion tables by version id for the list's growth column; an edit of a draft's tables bumps the stamp. */
  private readonly cteTables = new StampedCache<CtePoint[]>(20_000);
  /** Whole list pages by query and role: a shop's people mostly ask for the same few pages. */
  private readonly pages = new StampedCache<Page>(500);
  /** The same pages as the API's JSON text, so a page asked for again is not serialised again. */
  private readonly answers = new StampedCache<string>(500);
  /** A filter's count holds for all its pages and page sizes ("Load more" asks for the next page of the same search). */
  private readonly counts = new StampedCache<number>(500);

  constructor(private readonly store: CatalogueStore) {}

  async list(query: AlloyListQuery, actor: Actor): Promise<Page> {
    return (await this.page(query, actor)).read();
  }

  /** `GET /api/alloys`'s answer as JSON text. */
  async listJson(query: AlloyListQuery, actor: Actor): Promise<string> {
    const { stamp, key, read } = await this.page(query, actor);
    return this.answers.get(stamp, key, async () => JSON.stringify(await read()));
  }

  private async page(query: AlloyListQuery, actor: Actor) {
    const editor = canEdit(actor);
    const filter: AlloyListFilter = {
      withDrafts: editor && query.includeDrafts,
      withRetired: editor && query.includeRetired,
      search: query.search,
      family: query.family,
      minServiceC: query.minServiceC,
    };
    const repo = this.store.read();
    const stamp = await repo.stamps.read('catalogue');
    const ctePoints = (ids: string[]) => this.cteTables.getMany(stamp, ids, (missing) => repo.list.ctePoints(missing));
    const count = (f: AlloyListFilter) => this.counts.get(stamp, JSON.stringify(f), () => repo.list.count(f));
    const key = JSON.stringify([query, filter, editor]);
    return { stamp, key, read: () => this.pages.get(stamp, key, () => alloyListPage(repo.list, ctePoints, count, query, filter, editor)) };
  }
}
