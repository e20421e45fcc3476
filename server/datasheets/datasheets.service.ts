import { randomUUID } from 'node:crypto';
import type { Readable } from 'node:stream';
import type { DatasheetView } from '../../shared/schemas/alloy';
import { Datasheet, AlloyRevision } from '../catalogue/catalogue.entities';
import type { CatalogueStore } from '../catalogue/catalogue.repository';
import { canEdit, type Actor } from '../catalogue/catalogue.service';
import { datasheetView } from '../catalogue/catalogue.views';
import { AppError } from '../http/app-error';
import type { ObjectStore } from '../storage/object-store';
import type { StoredFile } from './pdf-storage';

/**
 * Keeps what a person typed as a file name only as display text: no paths, no control or
 * format characters (U+202E and the other bidirectional overrides could make "fdp.exe" read as "exe.pdf"),
 * and always a .pdf name, because the file is always served as a PDF.
 */
export function cleanOriginalName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? '';
  const cleaned = base.replace(/[\p{Cc}\p{Cf}\u2028\u2029]/gu, '').trim();
  const stem = cleaned.replace(/\.[^.]*$/, '').trim().slice(0, 196) || 'datasheet';
  return `${stem}.pdf`;
}

export class DatasheetsService {
  constructor(
    private readonly store: CatalogueStore,
    private readonly files: ObjectStore,
  ) {}

  async attach(alloyId: string, file: StoredFile & { originalName: string }, actor: Actor): Promise<DatasheetView> {
    try {
      return await this.store.write(async (repo) => {
        const alloy = await repo.findAlloy(alloyId);
        if (!alloy) throw AppError.notFound('There is no such alloy.');
        const sheet = await repo.saveDatasheet(
          repo.create(Datasheet, {
            id: randomUUID(),
            alloyId,
            originalName: cleanOriginalName(file.originalName),
            storedName: file.storedName,
            sizeBytes: file.sizeBytes,
            sha256: file.sha256,
            uploadedBy: actor?.name ?? null,
            uploadedAt: new Date(),
          }),
        );
        await repo.addRevision(
          repo.create(AlloyRevision, {
            id: randomUUID(),
            alloyId,
            version: null,
            action: 'datasheet_added',
            userId: actor?.id ?? null,
            userName: actor?.name ?? null,
            note: sheet.originalName,
            diff: [{ path: 'datasheets', before: null, after: { name: sheet.originalName, sha256: sheet.sha256 } }],
            at: new Date(),
          }),
        );
        return datasheetView(sheet);
      });
    } catch (err) {
      await this.discard(file.storedName);
      throw err;
    }
  }

  /** Removes a data sheet: the row and a revision entry in one transaction, then the file from storage. */
  async remove(id: string, actor: Actor): Promise<void> {
    const storedName = await this.store.write(async (repo) => {
      const sheet = await repo.findDatasheet(id);
      const alloy = sheet ? await repo.findAlloy(sheet.alloyId) : null;
      if (!sheet || !alloy) throw AppError.notFound('There is no such data sheet.');
      await repo.deleteDatasheet(id);
      await repo.addRevision(
        repo.create(AlloyRevision, {
          id: randomUUID(),
          alloyId: sheet.alloyId,
          version: null,
          action: 'datasheet_removed',
          userId: actor?.id ?? null,
          userName: actor?.name ?? null,
          note: sheet.originalName,
          diff: [{ path: 'datasheets', before: { name: sheet.originalName, sha256: sheet.sha256 }, after: null }],
          at: new Date(),
        }),
      );
      return sheet.storedName;
    });
    // After the commit: a failed delete leaves the file behind, never a row pointing at nothing.
    await this.discard(storedName);
  }

  private async discard(storedName: string) {
    await this.files.remove(storedName).catch((err) => console.error(`[dilato] could not delete the data sheet file ${storedName}:`, err));
  }

  /** The file behind a download link: any signed-in person for a published alloy, editors for drafts. */
  async forDownload(id: string, actor: Actor): Promise<{ body: Readable; originalName: string; sizeBytes: number }> {
    const repo = this.store.read();
    const sheet = await repo.findDatasheet(id);
    const alloy = sheet ? await repo.findAlloy(sheet.alloyId) : null;
    if (!sheet || !alloy || (!alloy.publishedVersionId && !canEdit(actor))) throw AppError.notFound('There is no such data sheet.');
    const file = await this.files.get(sheet.storedName);
    if (!file) throw AppError.notFound('The data sheet file is missing from storage.');
    return { body: file.body, originalName: cleanOriginalName(sheet.originalName), sizeBytes: file.sizeBytes };
  }
}
