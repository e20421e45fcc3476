import type { RunResult } from '../engine/types';
import type { Joint } from '../schemas/jobs';
import { type Phrase, phrase, quantity } from '../units';

export interface CutList {
  /** Tube pieces to cut, in order along the run; null where the joint's place is not given. */
  pieces: number[] | null;
  /** Tube to cut in all. */
  totalMm: number;
  /** How the joint changes the tube against the run length. */
  note: Phrase | null;
}

/**
 * The tube a run needs, with its fitted joint taken into account. A flex part takes its
 * face-to-face length out of the run (its live length where the maker gives no other),
 * centred where the run places it. A slip joint's spigot and sleeve overlap by the cold
 * engagement, so the run needs that much more tube.
 */
export function cutLengths(runLengthMm: number, joint: Joint, result: RunResult | null): CutList {
  if (joint.type === 'flex') {
    const part = result?.flex?.chosen?.part;
    if (!part) return { pieces: null, totalMm: runLengthMm, note: ['No flex part fitted yet: cut lengths are the whole run'] };
    const out = part.overallLengthMm ?? part.liveLengthMm;
    const total = runLengthMm - out;
    const note = phrase`run ${len(runLengthMm)} less the ${len(out)} flex part`;
    if (joint.atMm === undefined) return { pieces: null, totalMm: total, note };
    const before = joint.atMm - out / 2;
    const after = runLengthMm - joint.atMm - out / 2;
    return { pieces: [before, after].filter((p) => p > 0), totalMm: Math.max(before, 0) + Math.max(after, 0), note };
  }
  if (joint.type === 'slip') {
    return { pieces: null, totalMm: runLengthMm + joint.coldEngagementMm, note: phrase`run ${len(runLengthMm)} plus the ${len(joint.coldEngagementMm)} the spigot engages` };
  }
  return { pieces: null, totalMm: runLengthMm, note: null };
}

const len = (mm: number) => quantity('length', mm);
