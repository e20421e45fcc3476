import { phrase, phraseOfText, quantity } from '../units';
import type { AlloyData, EngineWarning, LimitResult, LimitStatus, Segment } from './types';

/**
 * Within this many °C below the governing limit the status is "caution". Our own choice,
 * no published source: wall temperatures are usually estimated from gas temperatures, and
 * readings and estimates of that kind scatter by tens of degrees.
 */
export const CAUTION_MARGIN_C = 50;

export function peakTempC(segments: Segment[]): number {
  return Math.max(...segments.map((s) => Math.max(s.startTempC, s.endTempC)));
}

/**
 * Judged against the lower of the continuous and intermittent limits: exhaust service is
 * cyclic (for austenitic grades the intermittent limit is the lower, because thermal
 * cycling spalls scale), and long full-load runs are continuous service as well.
 */
export function temperatureLimit(
  alloy: Pick<AlloyData, 'maxContinuousC' | 'maxIntermittentC'>,
  peakC: number,
  cautionBandC: number = CAUTION_MARGIN_C,
): LimitResult {
  const governedBy = alloy.maxIntermittentC <= alloy.maxContinuousC ? 'intermittent' : 'continuous';
  const governingC = Math.min(alloy.maxContinuousC, alloy.maxIntermittentC);
  const marginC = governingC - peakC;
  const status: LimitStatus = marginC < 0 ? 'over' : marginC < cautionBandC ? 'caution' : 'ok';
  return {
    status,
    marginC,
    continuousC: alloy.maxContinuousC,
    intermittentC: alloy.maxIntermittentC,
    governingC,
    governedBy,
    cautionBandC,
  };
}

/** The alloy's own warning ranges that the run's operating temperatures (not the cold install) reach into. */
export function warningRangesHit(alloy: Pick<AlloyData, 'warningRanges'>, segments: Segment[]): EngineWarning[] {
  const hits: EngineWarning[] = [];
  for (const w of alloy.warningRanges ?? []) {
    const touched = segments.some((s) => Math.max(s.startTempC, s.endTempC) >= w.fromC && Math.min(s.startTempC, s.endTempC) <= w.toC);
    if (touched) hits.push({ code: w.code, message: phraseOfText(w.message) });
  }
  return hits;
}

export function limitWarnings(limit: LimitResult, peakC: number): EngineWarning[] {
  if (limit.status === 'over') {
    return [
      {
        code: 'TEMP_OVER_LIMIT',
        message: phrase`Peak ${temp(peakC)} is ${delta(-limit.marginC)} above the alloy's ${limit.governedBy} limit of ${temp(limit.governingC)}`,
      },
    ];
  }
  if (limit.status === 'caution') {
    return [
      {
        code: 'TEMP_NEAR_LIMIT',
        message: phrase`Peak ${temp(peakC)} is within ${delta(limit.cautionBandC)} of the alloy's ${limit.governedBy} limit of ${temp(limit.governingC)}`,
      },
    ];
  }
  return [];
}

const temp = (c: number) => quantity('temperature', c);
const delta = (c: number) => quantity('temperatureDelta', c);
