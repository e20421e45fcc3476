import type { CalcRunRequest } from '../schemas/calc';
import type { RunInput } from '../engine/types';
import type { RunFields } from '../schemas/jobs';

/** A saved run's inputs as the calculator takes them (the same request POST /api/calc/run accepts). */
export function toCalcRequest(run: RunFields): CalcRunRequest & RunInput {
  const request: CalcRunRequest & RunInput = {
    alloyId: run.alloyId,
    tube: run.tube,
    installTempC: run.installTempC,
    segments: run.segments,
  };
  const joint = run.joint;
  if (joint.type === 'flex') {
    const { type: _type, ...flex } = joint;
    request.flex = flex;
  } else if (joint.type === 'slip') {
    const { type: _type, atMm: _atMm, ...slip } = joint;
    request.slip = slip;
  }
  return request;
}

/**
 * A calculator field path ("slip.inner.tempC", "flex.atMm", "alloy.cte") as the same field of a run
 * ("joint.inner.tempC", "joint.atMm", "alloyId"), so that errors land under the run editor's inputs.
 */
export function runFieldPath(calcPath: string): string {
  if (calcPath.startsWith('flex.')) return `joint.${calcPath.slice(5)}`;
  if (calcPath.startsWith('slip.')) return `joint.${calcPath.slice(5)}`;
  if (calcPath === 'alloy' || calcPath.startsWith('alloy.')) return 'alloyId';
  return calcPath;
}

export function runFields(calcFields: Record<string, string>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [path, message] of Object.entries(calcFields)) {
    const mapped = runFieldPath(path);
    if (!(mapped in out)) out[mapped] = message;
  }
  return out;
}
