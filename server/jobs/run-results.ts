import { calculateRun, isEngineInputError } from '../../shared/schemas/calc';
import type { AlloyData, DesignBasis, FlexPart, RunResult } from '../../shared/engine/types';
import { runFields, toCalcRequest } from '../../shared/jobs/run-input';
import type { AlloyUsed, JobTotals, RunFields, RunProblem } from '../../shared/schemas/jobs';
import { BoundedMap } from '../cache/bounded-map';
import type { CatalogueService, PublishedAlloy } from '../catalogue/catalogue.service';
import type { CurrencyRatesService } from '../currency/currency-rates.service';
import type { FlexPartsService } from '../flex-parts/flex-parts.service';
import { AppError } from '../http/app-error';
import type { ShopSettingsService } from '../settings/shop-settings.service';
import { designBasisOf, systemBasisOf, type ShopSettings } from '../../shared/schemas/shop-settings';
import type { SystemBasis } from '../../shared/jobs/system-basis';

/** What the catalogue says about an alloy id right now. */
export type AlloyLookup =
  | { state: 'published'; used: AlloyUsed; published: PublishedAlloy }
  | { state: 'retired'; used: AlloyUsed }
  | { state: 'missing' };

export interface Computed {
  alloy: AlloyUsed | null;
  result: RunResult | null;
  problem: RunProblem | null;
  currency: string | null;
}

const usedOf = (p: PublishedAlloy): AlloyUsed => ({ id: p.alloyId, designation: p.designation, uns: p.uns, version: p.version, status: 'published' });
const named = (a: AlloyUsed) => `${a.designation} (${a.uns})`;

/**
 * One request's view of the catalogue: each alloy and the flex parts are read once however many
 * runs use them, so every run of a job is computed against the same published data.
 */
export class ResultSession {
  private readonly alloys = new Map<string, Promise<AlloyLookup>>();
  private flexParts: Promise<{ stamp: number; parts: FlexPart[] }> | null = null;
  private design: Promise<DesignBasis> | null = null;
  private rates: ReturnType<CurrencyRatesService['converter']> | null = null;
  private shopSettings: Promise<ShopSettings> | null = null;
  private basis: Promise<string> | null = null;

  constructor(
    private readonly catalogue: CatalogueService,
    private readonly flex: FlexPartsService,
    private readonly settings: ShopSettingsService,
    private readonly currencyRates?: CurrencyRatesService,
    private readonly cache?: ResultCache,
  ) {}

  /** One read of the shop's settings per request. */
  private shop(): Promise<ShopSettings> {
    this.shopSettings ??= this.settings.get();
    return this.shopSettings;
  }

  private designBasis(): Promise<DesignBasis> {
    this.design ??= this.shop().then(designBasisOf);
    return this.design;
  }

  /**
   * What every result of this request rests on besides the run itself: the catalogue's and flex parts'
   * stamps and the shop's design basis. A cached result is good while this and the run's revision stand.
   */
  basisKey(): Promise<string> {
    this.basis ??= Promise.all([this.catalogue.stamp(), this.parts(), this.designBasis()]).then(
      ([catalogue, flex, design]) => `${catalogue}|${flex.stamp}|${JSON.stringify(design)}`,
    );
    return this.basis;
  }

  /**
   * What a whole job answer rests on besides the job itself: the results' basis, the currency rates'
   * stamp (material costs are converted after the result cache) and all the shop's settings (the
   * system check's rules, the shop's currency).
   */
  async answerBasis(): Promise<string> {
    const [basis, rates, shop] = await Promise.all([this.basisKey(), this.currencyRates?.stamp() ?? 0, this.shop()]);
    return `${basis}|${rates}|${JSON.stringify(shop)}`;
  }

  /** The shop's support and clearance rules for the system check. */
  async systemBasis(): Promise<SystemBasis> {
    return systemBasisOf(await this.shop());
  }

  /** The material cost in the shop's currency where a rate allows; otherwise left in the alloy's own currency. */
  private async inShopCurrency(result: RunResult, currency: string): Promise<{ result: RunResult; currency: string }> {
    if (!this.currencyRates) return { result, currency };
    this.rates ??= this.currencyRates.converter();
    const { shopCurrency, convert } = await this.rates;
    const converted = convert(result.materialCost, currency);
    return converted.ok ? { result: { ...result, materialCost: converted.amount }, currency: shopCurrency } : { result, currency };
  }

  alloy(id: string): Promise<AlloyLookup> {
    let found = this.alloys.get(id);
    if (!found) {
      found = this.lookUp(id);
      this.alloys.set(id, found);
    }
    return found;
  }

  private async lookUp(id: string): Promise<AlloyLookup> {
    try {
      const published = await this.catalogue.publishedAlloy(id);
      return { state: 'published', used: usedOf(published), published };
    } catch (err) {
      if (!(err instanceof AppError && err.status === 404)) throw err;
    }
    try {
      // A retired alloy keeps its last published version: name it so the shop knows what to replace.
      const detail = await this.catalogue.detail(id, null);
      const p = detail.published;
      if (p) return { state: 'retired', used: { id, designation: p.designation, uns: p.uns, version: p.version, status: 'retired' } };
    } catch (err) {
      if (!(err instanceof AppError && err.status === 404)) throw err;
    }
    return { state: 'missing' };
  }

  private parts(): Promise<{ stamp: number; parts: FlexPart[] }> {
    this.flexParts ??= this.flex.forSizingStamped();
    return this.flexParts;
  }

  /**
   * The run computed with `alloyId`'s latest published data (the run's own alloy unless a candidate is given).
   * With a `revision` (the stored run's id and last change), the result is kept for the same run revision,
   * alloy versions, flex parts and design basis.
   */
  async compute(run: RunFields, alloyId = run.alloyId, opts: { withJoint: boolean } = { withJoint: true }, revision?: string): Promise<Computed> {
    const main = await this.alloy(alloyId);
    if (main.state !== 'published') {
      return { alloy: main.state === 'retired' ? main.used : null, result: null, problem: unavailable(main, 'alloyId', 'this run'), currency: null };
    }
    const fields: RunFields = { ...run, alloyId, joint: opts.withJoint ? run.joint : { type: 'none' } };
    const slipAlloys: { inner?: AlloyData; outer?: AlloyData } = {};
    const slipVersions: string[] = [];
    if (fields.joint.type === 'slip') {
      for (const side of ['inner', 'outer'] as const) {
        const id = fields.joint[side].alloyId;
        if (!id) continue;
        const member = await this.alloy(id);
        if (member.state !== 'published') {
          return { alloy: main.used, result: null, problem: unavailable(member, `joint.${side}.alloyId`, `the slip joint's ${side} member`), currency: null };
        }
        slipAlloys[side] = member.published.data;
        slipVersions.push(`${side}:${member.published.versionId}`);
      }
    }
    const flex = fields.joint.type === 'flex' ? await this.parts() : undefined;
    const design = fields.joint.type === 'none' ? undefined : await this.designBasis();
    try {
      const calculate = () => calculateRun(toCalcRequest(fields), main.published.data, { flexParts: flex?.parts, slipAlloys, design });
      const key = revision && [revision, opts.withJoint, main.published.versionId, slipVersions.join(','), flex?.stamp, design && JSON.stringify(design)].join('|');
      const result = key && this.cache ? this.cache.get(key, calculate) : calculate();
      const priced = await this.inShopCurrency(result, main.published.currency);
      return { alloy: main.used, result: priced.result, problem: null, currency: priced.currency };
    } catch (err) {
      if (!isEngineInputError(err)) throw err;
      const mapped = runFields(err.fields);
      const first = Object.values(mapped)[0] ?? err.message;
      return {
        alloy: main.used,
        result: null,
        problem: {
          code: 'outside_data',
          message: `The published data of ${named(main.used)}, version ${main.used.version}, does not cover this run: ${first}.`,
          fields: mapped,
        },
        currency: main.published.currency,
      };
    }
  }
}

function unavailable(lookup: Exclude<AlloyLookup, { state: 'published' }>, field: string, what: string): RunProblem {
  if (lookup.state === 'retired') {
    return {
      code: 'alloy_retired',
      message: `${named(lookup.used)}, the alloy of ${what}, has been retired from the catalogue. Choose another alloy.`,
      fields: { [field]: 'This alloy has been retired' },
    };
  }
  return {
    code: 'alloy_unavailable',
    message: `The alloy of ${what} has no published data in the catalogue. Choose another alloy.`,
    fields: { [field]: 'No published alloy with this id' },
  };
}

/** Results of stored runs by key (run revision, alloy versions, flex parts stamp, design basis); the oldest go first. */
export class ResultCache {
  private readonly results = new BoundedMap<RunResult>(500);

  get(key: string, calculate: () => RunResult): RunResult {
    const found = this.results.get(key);
    if (found) return found;
    const result = calculate();
    this.results.set(key, result);
    return result;
  }
}

export class RunResults {
  private readonly cache = new ResultCache();
  /** Job list totals by job revision and `ResultSession.basisKey()`: a list page reads no runs for jobs already seen. */
  readonly jobTotals = new BoundedMap<JobTotals>(20_000);

  constructor(
    private readonly catalogue: CatalogueService,
    private readonly flexParts: FlexPartsService,
    private readonly settings: ShopSettingsService,
    private readonly currencyRates?: CurrencyRatesService,
  ) {}

  session(): ResultSession {
    return new ResultSession(this.catalogue, this.flexParts, this.settings, this.currencyRates, this.cache);
  }
}
