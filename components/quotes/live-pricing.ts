import { peakTempC } from '../../shared/engine/limits';
import { compareWithFirst, priceOption, type OptionComparison, type PricedAlloy, type PricedOption, type PricedRunInput } from '../../shared/quotes/pricing';
import type { AlloySummary } from '../../shared/schemas/alloy';
import type { JobDetail } from '../../shared/schemas/jobs';
import type { ShopSettings } from '../../shared/schemas/shop-settings';

export interface OptionDraft {
  label?: string;
  alloyId?: string;
  runAlloys?: Record<string, string>;
}

export interface LivePricing {
  currency: string;
  /** One entry per option; null while the option has no alloy yet. */
  options: (PricedOption | null)[];
  /** Against option 1; null entries where either side is not priced. */
  comparisons: (OptionComparison | null)[];
}

/** The job's runs as pricing sees them, the same way the server reads them. */
export function runsForPricing(job: JobDetail): PricedRunInput[] {
  return job.runs.map((r) => ({
    runId: r.id,
    name: r.name,
    lengthMm: r.segments.reduce((sum, s) => sum + s.lengthMm, 0),
    tube: { odMm: r.tube.odMm, wallMm: r.tube.wallMm },
    peakTempC: peakTempC(r.segments),
  }));
}

export function pricedAlloys(alloys: AlloySummary[]): Map<string, PricedAlloy> {
  const map = new Map<string, PricedAlloy>();
  for (const a of alloys) {
    if (a.status !== 'published' || a.version === null) continue;
    map.set(a.id, {
      alloyId: a.id,
      designation: a.designation,
      uns: a.uns,
      family: a.family,
      version: a.version,
      densityKgM3: a.densityKgM3,
      pricePerKg: a.pricePerKg,
      maxContinuousC: a.maxContinuousC,
      maxIntermittentC: a.maxIntermittentC,
    });
  }
  return map;
}

/**
 * Prices the options as the form stands, with the pure pricing the server uses, so totals move
 * while the user types; the server prices again on save and freezes its own figures on send.
 */
export function priceLive(runs: PricedRunInput[], alloys: ReadonlyMap<string, PricedAlloy>, settings: ShopSettings, drafts: OptionDraft[]): LivePricing {
  const options = drafts.map((d) => {
    if (!d.alloyId || !alloys.has(d.alloyId)) return null;
    const overrides = Object.fromEntries(Object.entries(d.runAlloys ?? {}).filter(([, id]) => alloys.has(id)));
    return priceOption(runs, { label: d.label ?? '', alloyId: d.alloyId, runAlloys: overrides }, alloys, settings);
  });
  const base = options[0];
  const comparisons = options.map((o) => (o && base ? compareWithFirst([base, o])[1] : null));
  return { currency: settings.currency, options, comparisons };
}
