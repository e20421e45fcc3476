import { phrase, quantity } from '../units';
import type { EngineWarning, Segment } from './types';

/** A jump larger than this between one segment's end and the next one's start is worth a word. */
export const TEMPERATURE_STEP_WARN_C = 1;

const temp = (c: number) => quantity('temperature', c);

/** Inputs that compute but are likely mistakes, or change what the figures mean. */
export function inputWarnings(segments: Segment[], installTempC: number, growthMm: number): EngineWarning[] {
  const warnings: EngineWarning[] = [];
  let coldest = Infinity;
  for (const s of segments) coldest = Math.min(coldest, s.startTempC, s.endTempC);
  if (coldest < installTempC) {
    warnings.push({
      code: growthMm < 0 ? 'RUN_SHRINKS' : 'COLDER_THAN_INSTALL',
      message:
        growthMm < 0
          ? phrase`The run runs colder than its ${temp(installTempC)} install temperature, so it shrinks: the growth is negative (${quantity('smallLength', growthMm)}). Check the install and running temperatures`
          : phrase`Part of the run (down to ${temp(coldest)}) is colder than its ${temp(installTempC)} install temperature and shrinks there; the growth is the net of both`,
    });
  }
  for (let i = 1; i < segments.length; i++) {
    const step = segments[i].startTempC - segments[i - 1].endTempC;
    if (Math.abs(step) > TEMPERATURE_STEP_WARN_C) {
      warnings.push({
        code: 'TEMPERATURE_STEP',
        message: phrase`Segment ${i} ends at ${temp(segments[i - 1].endTempC)} and segment ${i + 1} starts at ${temp(segments[i].startTempC)}, a step of ${quantity('temperatureDelta', Math.abs(step))}: temperature along one tube does not jump, so check both values`,
      });
    }
  }
  return warnings;
}
