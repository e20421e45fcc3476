import { calculateRun, isEngineInputError, type CalcRunRequest, type RunResult } from '../../shared/schemas/calc';
import type { AlloyData } from '../../shared/engine/types';
import { AppError } from '../http/app-error';
import { briefResult } from '../jobs/brief-results';
import type { CatalogueService } from '../catalogue/catalogue.service';
import type { FlexPartsService } from '../flex-parts/flex-parts.service';
import type { ShopSettingsService } from '../settings/shop-settings.service';
import { designBasisOf } from '../../shared/schemas/shop-settings';

export interface AlloyUsed {
  id: string;
  designation: string;
  uns: string;
  version: number;
}

export type CalcResponse = RunResult & { alloy: AlloyUsed | null };

export class CalcService {
  constructor(
    private readonly catalogue: CatalogueService,
    private readonly flexParts: FlexPartsService,
    private readonly settings: ShopSettingsService,
  ) {}

  /** Published catalogue data for an id, or a 400 naming the field that asked for it. */
  private async published(alloyId: string, field: string) {
    try {
      return await this.catalogue.publishedAlloy(alloyId);
    } catch (err) {
      if (err instanceof AppError && err.status === 404) {
        throw AppError.badRequest('invalid_input', 'Some values need attention.', { [field]: 'No published alloy with this id' });
      }
      throw err;
    }
  }

  /** The run's result; unless `full`, at a drawing's resolution without the growth-per-metre curve or flex candidates. */
  async run(body: CalcRunRequest, full = false): Promise<CalcResponse> {
    let alloy: AlloyData;
    let used: AlloyUsed | null = null;
    if (body.alloyId) {
      const p = await this.published(body.alloyId, 'alloyId');
      alloy = p.data;
      used = { id: p.alloyId, designation: p.designation, uns: p.uns, version: p.version };
    } else {
      alloy = body.alloy!;
    }
    const slipAlloys: { inner?: AlloyData; outer?: AlloyData } = {};
    for (const side of ['inner', 'outer'] as const) {
      const id = body.slip?.[side].alloyId;
      if (id) slipAlloys[side] = (await this.published(id, `slip.${side}.alloyId`)).data;
    }
    const flexParts = body.flex && !body.flex.parts ? await this.flexParts.forSizing() : undefined;
    const design = designBasisOf(await this.settings.get());
    try {
      const result = calculateRun(body, alloy, { flexParts, slipAlloys, design });
      return { ...(full ? result : briefResult(result)), alloy: used };
    } catch (err) {
      if (isEngineInputError(err)) throw AppError.badRequest('invalid_input', 'Some values are outside what the data covers.', err.fields);
      throw err;
    }
  }
}
