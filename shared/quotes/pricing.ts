import { temperatureLimit } from '../engine/limits';
import { tubeMassKg } from '../engine/mass';
import type { Tube } from '../engine/types';
import type { AlloyFamily } from '../schemas/alloy';
import type { ShopSettings } from '../schemas/shop-settings';

/** What pricing needs of a run: its size and how hot it gets. */
export interface PricedRunInput {
  runId: string;
  name: string;
  lengthMm: number;
  tube: Tube;
  peakTempC: number;
}

/** What pricing needs of an alloy, frozen into a quote when it is sent. */
export interface PricedAlloy {
  alloyId: string;
  designation: string;
  uns: string;
  family: AlloyFamily;
  version: number;
  densityKgM3: number;
  pricePerKg: number;
  maxContinuousC: number;
  maxIntermittentC: number;
}

export interface OptionSpec {
  label: string;
  /** The alloy for every run… */
  alloyId: string;
  /** …unless a run is named here with its own. */
  runAlloys?: Record<string, string>;
}

export interface PricedRun {
  runId: string;
  name: string;
  alloyId: string;
  designation: string;
  massKg: number;
  materialCost: number;
  labourHours: number;
  labourCost: number;
  /** Governing service limit minus the run's peak temperature. */
  tempMarginC: number;
}

export interface PricedOption {
  label: string;
  runs: PricedRun[];
  massKg: number;
  /** Mass × price per kg, plus the scrap allowance. */
  materialCost: number;
  labourHours: number;
  labourCost: number;
  subtotal: number;
  margin: number;
  total: number;
  /** The smallest temperature margin over the runs: the run that limits the option. */
  tempMarginC: number;
}

export interface OptionComparison {
  costDifference: number;
  /** Against the first option's total; null when that total is zero. */
  costDifferencePct: number | null;
  massDifferenceKg: number;
  tempMarginGainedC: number;
}

export class PricingError extends Error {
  constructor(readonly alloyId: string) {
    super(`No alloy data for ${alloyId}`);
  }
}

export function priceOption(
  runs: PricedRunInput[],
  option: OptionSpec,
  alloys: ReadonlyMap<string, PricedAlloy>,
  settings: ShopSettings,
): PricedOption {
  const scrap = 1 + settings.scrapAllowancePct / 100;
  const priced = runs.map((run): PricedRun => {
    const alloyId = option.runAlloys?.[run.runId] ?? option.alloyId;
    const alloy = alloys.get(alloyId);
    if (!alloy) throw new PricingError(alloyId);
    const massKg = tubeMassKg(run.tube, run.lengthMm, alloy.densityKgM3);
    const labourHours = settings.hoursPerRun * settings.weldTimeFactors[alloy.family];
    return {
      runId: run.runId,
      name: run.name,
      alloyId,
      designation: alloy.designation,
      massKg,
      materialCost: massKg * alloy.pricePerKg * scrap,
      labourHours,
      labourCost: labourHours * settings.labourRatePerHour,
      tempMarginC: temperatureLimit(alloy, run.peakTempC).marginC,
    };
  });
  const sum = (pick: (r: PricedRun) => number) => priced.reduce((acc, r) => acc + pick(r), 0);
  const materialCost = sum((r) => r.materialCost);
  const labourCost = sum((r) => r.labourCost);
  const subtotal = materialCost + labourCost;
  const margin = subtotal * (settings.marginPct / 100);
  return {
    label: option.label,
    runs: priced,
    massKg: sum((r) => r.massKg),
    materialCost,
    labourHours: sum((r) => r.labourHours),
    labourCost,
    subtotal,
    margin,
    total: subtotal + margin,
    tempMarginC: priced.length > 0 ? Math.min(...priced.map((r) => r.tempMarginC)) : 0,
  };
}

/** Each option against the first: what the customer pays, carries and gains in heat capability. */
export function compareWithFirst(options: PricedOption[]): OptionComparison[] {
  const base = options[0];
  return options.map((o) => ({
    costDifference: o.total - base.total,
    costDifferencePct: base.total === 0 ? null : ((o.total - base.total) / base.total) * 100,
    massDifferenceKg: o.massKg - base.massKg,
    tempMarginGainedC: o.tempMarginC - base.tempMarginC,
  }));
}
