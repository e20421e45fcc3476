import { CAUTIONS } from './cautions';
import { EngineInputError } from './errors';
import { prepareStrainCurve, type StrainCurve, strainChange } from './expansion';
import { designBasis } from './design-basis';
import { sizeFlex } from './flex';
import { flexDuty } from './flex-duty';
import { inputWarnings } from './input-warnings';
import { peakTempC, limitWarnings, temperatureLimit, warningRangesHit } from './limits';
import { materialCost, tubeMassKg } from './mass';
import { prepareStrengthTables, restraint, type StrengthTables } from './restraint';
import { growthPerMetreCurve, runGrowthCurve, totalLengthMm } from './run-growth';
import { sizeSlip, slipTolerance } from './slip';
import type { AlloyData, DesignBasis, FlexPart, RunInput, RunResult, SlipMemberInput } from './types';

export { CAUTIONS };

export interface CalculateRunOptions {
  /** Catalogue flex parts, used when the request gives no inline parts. */
  flexParts?: FlexPart[];
  /** Alloys the caller resolved from slip.inner.alloyId / slip.outer.alloyId. */
  slipAlloys?: { inner?: AlloyData; outer?: AlloyData };
  /** The shop's travel share and coldest start; defaults from DEFAULT_DESIGN_BASIS. */
  design?: Partial<DesignBasis>;
}

function prepare<T>(field: string, make: () => T): T {
  try {
    return make();
  } catch (e) {
    if (e instanceof EngineInputError) throw e;
    throw new EngineInputError({ [field]: e instanceof Error ? e.message : String(e) });
  }
}

function rangeMessage(c: StrainCurve, t: number): string | null {
  if (!Number.isFinite(t)) return 'Enter a number';
  if (t > c.maxC) return `Above the alloy's data (max ${c.maxC} °C)`;
  if (t < c.minC) return `Below ${c.minC} °C, the lowest temperature the calculator handles`;
  return null;
}

function checkInput(input: RunInput, c: StrainCurve): void {
  const fields: Record<string, string> = {};
  const put = (path: string, message: string | null) => {
    if (message && !(path in fields)) fields[path] = message;
  };
  const { odMm, wallMm } = input.tube;
  if (!(odMm > 0)) put('tube.odMm', 'Outside diameter must be more than 0 mm');
  if (!(wallMm > 0)) put('tube.wallMm', 'Wall must be more than 0 mm');
  else if (!(wallMm < odMm / 2)) put('tube.wallMm', 'Wall must be less than half the outside diameter');
  if (input.segments.length === 0) put('segments', 'Add at least one segment');
  put('installTempC', rangeMessage(c, input.installTempC));
  input.segments.forEach((s, i) => {
    if (!(s.lengthMm > 0) || !Number.isFinite(s.lengthMm)) put(`segments.${i}.lengthMm`, 'Length must be more than 0 mm');
    put(`segments.${i}.startTempC`, rangeMessage(c, s.startTempC));
    put(`segments.${i}.endTempC`, rangeMessage(c, s.endTempC));
  });
  const atMm = input.flex?.atMm;
  if (atMm !== undefined && !(atMm >= 0 && atMm <= totalLengthMm(input.segments))) {
    put('flex.atMm', 'Position must lie within the run');
  }
  const leg = input.flex?.perpendicularLeg;
  if (leg) put('flex.perpendicularLeg.tempC', rangeMessage(c, leg.tempC));
  if (Object.keys(fields).length > 0) throw new EngineInputError(fields);
}

function slipCurve(
  side: 'inner' | 'outer',
  member: SlipMemberInput,
  runCurve: StrainCurve,
  installTempC: number,
  resolved?: AlloyData,
): StrainCurve {
  let c = runCurve;
  if (member.alloy) c = prepare(`slip.${side}.alloy.cte`, () => prepareStrainCurve(member.alloy as AlloyData));
  else if (member.alloyId !== undefined) {
    if (!resolved) throw new EngineInputError({ [`slip.${side}.alloyId`]: 'Alloy not found' });
    c = prepare(`slip.${side}.alloyId`, () => prepareStrainCurve(resolved));
  }
  const fields: Record<string, string> = {};
  const temp = rangeMessage(c, member.tempC);
  if (temp) fields[`slip.${side}.tempC`] = temp;
  const install = rangeMessage(c, installTempC);
  if (install) fields.installTempC = install;
  if (Object.keys(fields).length > 0) throw new EngineInputError(fields);
  return c;
}

function checkColdest(c: StrainCurve, coldestC: number, field: string): void {
  const message = rangeMessage(c, coldestC);
  if (message) throw new EngineInputError({ [field]: `The shop's coldest start (${coldestC} °C): ${message}` });
}

/** The whole calculation for one run. Throws EngineInputError with request paths for inputs the alloy's data cannot answer. */
export function calculateRun(input: RunInput, alloy: AlloyData, opts: CalculateRunOptions = {}): RunResult {
  const curve = prepare('alloy.cte', () => prepareStrainCurve(alloy));
  checkInput(input, curve);
  const strength: StrengthTables = prepare('alloy', () => prepareStrengthTables(alloy));
  const { segments, installTempC, tube } = input;
  const design = designBasis(opts.design);

  const growth = runGrowthCurve(curve, segments, installTempC);
  const peakC = peakTempC(segments);
  const stress = restraint(curve, strength, segments, installTempC, alloy);
  const limit = temperatureLimit(alloy, peakC);
  const lengthMm = totalLengthMm(segments);
  const massKg = tubeMassKg(tube, lengthMm, alloy.densityKgM3);

  const result: RunResult = {
    growthMm: growth.growthMm,
    curve: growth.curve,
    growthPerMetreCurve: growthPerMetreCurve(curve, installTempC),
    totalLengthMm: lengthMm,
    peakTempC: peakC,
    restraint: stress,
    limit,
    massKg,
    materialCost: materialCost(massKg, alloy.pricePerKg),
    warnings: [
      ...inputWarnings(segments, installTempC, growth.growthMm),
      ...limitWarnings(limit, peakC),
      ...warningRangesHit(alloy, segments),
      ...stress.warnings,
    ],
  };

  if (input.flex || input.slip) checkColdest(curve, design.coldestAmbientC, input.flex ? 'flex' : 'slip');
  if (input.flex) {
    const duty = flexDuty({ curve, segments, installTempC, hotGrowthMm: growth.growthMm, peakC, odMm: tube.odMm, options: input.flex, design });
    result.flex = sizeFlex(duty, input.flex.parts ?? opts.flexParts ?? [], input.flex.partId);
    if (result.flex.chosen) result.warnings.push(...result.flex.chosen.warnings);
  }
  if (input.slip) {
    const slip = input.slip;
    const inner = slipCurve('inner', slip.inner, curve, installTempC, opts.slipAlloys?.inner);
    const outer = slipCurve('outer', slip.outer, curve, installTempC, opts.slipAlloys?.outer);
    checkColdest(inner, design.coldestAmbientC, 'slip.inner.alloyId');
    checkColdest(outer, design.coldestAmbientC, 'slip.outer.alloyId');
    const spigotOd = slip.inner.diameterMm ?? tube.odMm;
    const tolerance = slipTolerance(slip, spigotOd);
    if (tolerance === null) throw new EngineInputError({ 'slip.toleranceMm': 'Enter the tolerance: the tube standard’s table stops at 14 in OD' });
    const coldGrowthMm = lengthMm * strainChange(curve, design.coldestAmbientC, installTempC);
    result.slip = sizeSlip(slip, { inner, outer }, { hotGrowthMm: growth.growthMm, coldGrowthMm, installTempC, design }, tube.odMm, tolerance);
  }
  return result;
}
