import type { AlloyDetail, ReviewQueueItem } from '../../shared/schemas/alloy';
import { AppError } from '../http/app-error';
import type { CatalogueStore } from './catalogue.repository';
import type { Actor, CatalogueService } from './catalogue.service';

/**
 * The review step between an editor's draft and an admin's publish: the editor submits the draft,
 * the admin sees it in the queue and publishes it or sends it back with a note. Each step is a revision.
 */
export class CatalogueReviewService {
  constructor(
    private readonly store: CatalogueStore,
    private readonly catalogue: CatalogueService,
  ) {}

  async submit(id: string, actor: Actor, note: string): Promise<AlloyDetail> {
    return this.store.write(async (repo) => {
      const alloy = await this.catalogue.visibleAlloy(repo, id, actor);
      if (!alloy.draftVersionId) throw AppError.conflict('no_draft', 'There is no draft to submit; edit the alloy first.');
      if (alloy.reviewStep === 'submitted') throw AppError.conflict('already_submitted', 'This draft is already waiting for review.');
      const draft = (await repo.findVersion(alloy.draftVersionId))!;
      Object.assign(alloy, { reviewStep: 'submitted', reviewNote: note, reviewBy: actor?.name ?? null, reviewAt: new Date() });
      await repo.saveAlloy(alloy);
      await this.catalogue.revision(repo, id, { action: 'submitted', version: draft.version, note, diff: [] }, actor);
      return this.catalogue.detailIn(repo, id, actor);
    });
  }

  async sendBack(id: string, actor: Actor, note: string): Promise<AlloyDetail> {
    return this.store.write(async (repo) => {
      const alloy = await this.catalogue.visibleAlloy(repo, id, actor);
      if (!alloy.draftVersionId) throw AppError.conflict('no_draft', 'There is no draft to send back.');
      if (alloy.reviewStep === 'sent_back') throw AppError.conflict('already_sent_back', 'This draft has already been sent back.');
      const draft = (await repo.findVersion(alloy.draftVersionId))!;
      Object.assign(alloy, { reviewStep: 'sent_back', reviewNote: note, reviewBy: actor?.name ?? null, reviewAt: new Date() });
      await repo.saveAlloy(alloy);
      await this.catalogue.revision(repo, id, { action: 'sent_back', version: draft.version, note, diff: [] }, actor);
      return this.catalogue.detailIn(repo, id, actor);
    });
  }

  /** Drafts submitted for review, oldest first: the admin's to-do list. */
  async queue(): Promise<ReviewQueueItem[]> {
    const repo = this.store.read();
    const waiting = (await repo.alloysInReview()).filter((a) => a.draftVersionId);
    const versions = new Map((await repo.findVersions(waiting.map((a) => a.draftVersionId!))).map((v) => [v.id, v]));
    return waiting
      .map((a) => {
        const v = versions.get(a.draftVersionId!)!;
        return {
          alloyId: a.id,
          designation: v.designation,
          uns: v.uns,
          version: v.version,
          isNew: !a.publishedVersionId,
          submittedBy: a.reviewBy,
          submittedAt: new Date(a.reviewAt ?? a.updatedAt).toISOString(),
          note: a.reviewNote,
        };
      })
      .sort((x, y) => x.submittedAt.localeCompare(y.submittedAt));
  }
}
