import type { AlloyVersionSummary } from '../../shared/schemas/alloy';
import type { CatalogueStore } from './catalogue.repository';
import { canEdit, type Actor, type CatalogueService } from './catalogue.service';

/** An alloy's versions, newest first: the published one, the superseded ones, and for editors the open draft. */
export class CatalogueVersionsService {
  constructor(
    private readonly store: CatalogueStore,
    private readonly catalogue: CatalogueService,
  ) {}

  async list(id: string, actor: Actor): Promise<AlloyVersionSummary[]> {
    const repo = this.store.read();
    await this.catalogue.visibleAlloy(repo, id, actor);
    const rows = await repo.versionSummariesOf(id);
    return rows
      .filter((v) => v.state !== 'draft' || canEdit(actor))
      .sort((a, b) => b.version - a.version)
      .map((v) => ({ version: v.version, state: v.state, designation: v.designation, publishedAt: v.publishedAt ? new Date(v.publishedAt).toISOString() : null, createdAt: new Date(v.createdAt).toISOString() }));
  }
}
