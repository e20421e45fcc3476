import { fixedPointLabel, type FixedPointId } from '../jobs/fixed-points';
import type { Joint } from '../schemas/jobs';

/** What a run tells the weld plan. */
export interface WeldRunInput {
  id: string;
  name: string;
  alloyId: string;
  tube: { odMm: number; wallMm: number };
  lengthMm: number;
  startFixing: FixedPointId;
  endFixing: FixedPointId;
  /** What each end's flange is made of; null = the run's own alloy. */
  startFlangeAlloyId: string | null;
  endFlangeAlloyId: string | null;
  joint: Joint;
  /** The fitted flex part's cuff UNS; null when the part does not state it, undefined when no part is fitted. */
  flexCuffUns?: string | null;
}

export type WeldKind = 'tube_to_flange' | 'tube_to_tube' | 'tube_to_flex' | 'tube_to_sleeve';

export const WELD_KIND_LABELS: Record<WeldKind, string> = {
  tube_to_flange: 'Tube to flange',
  tube_to_tube: 'Tube to tube',
  tube_to_flex: 'Tube to flex part cuff',
  tube_to_sleeve: 'Tube to slip sleeve',
};

/** A base metal as the run names it: a catalogue alloy, a bare UNS number, or why it is not known. */
export type MetalRef = { alloyId: string } | { uns: string } | { missing: string };

export interface WeldSite {
  runId: string;
  /** Stable within the job, e.g. `<runId>:start`. */
  key: string;
  kind: WeldKind;
  where: string;
  metals: [MetalRef, MetalRef];
}

/** Ends that carry a flange (or V-band ring) welded to the tube. */
const FLANGED: readonly FixedPointId[] = ['flange', 'manifold_flange', 'turbo_inlet', 'turbo_outlet', 'v_band', 'equipment_nozzle'];
/** Ends where the tube carries on into the next run through a support: a weld only where alloy or size changes. */
const THROUGH: readonly FixedPointId[] = ['anchor_bracket', 'sliding_bracket', 'isolator_hanger'];

export const isFlanged = (f: FixedPointId) => FLANGED.includes(f);

const sameSize = (a: WeldRunInput, b: WeldRunInput) => a.tube.odMm === b.tube.odMm && a.tube.wallMm === b.tube.wallMm;

function cuffRef(run: WeldRunInput): MetalRef {
  if (run.flexCuffUns === undefined) return { missing: 'No flex part is fitted yet, so its cuff alloy is not known' };
  if (run.flexCuffUns === null) return { missing: "The flex part does not state its cuff alloy: add the cuff's UNS number to the flex part" };
  return { uns: run.flexCuffUns };
}

/** The tube on each side of a run's flex part: the next or previous run's where the flex sits at a run end it shares. */
function flexSides(run: WeldRunInput, prev: WeldRunInput | undefined, next: WeldRunInput | undefined): [MetalRef, MetalRef] {
  const j = run.joint;
  const at = j.type === 'flex' ? j.atMm : undefined;
  const before = at !== undefined && at <= 0 && run.startFixing === 'flex_section' && prev ? prev.alloyId : run.alloyId;
  const after = at !== undefined && at >= run.lengthMm && run.endFixing === 'flex_section' && next ? next.alloyId : run.alloyId;
  return [{ alloyId: before }, { alloyId: after }];
}

/**
 * Every weld the runs need, in build order: the flange at each flanged end, the flex part's two
 * cuffs, the slip joint's sleeve, and a butt weld where the tube carries on into the next run in
 * another alloy or size.
 */
export function weldSites(runs: readonly WeldRunInput[]): WeldSite[] {
  const out: WeldSite[] = [];
  runs.forEach((run, i) => {
    const prev = runs[i - 1];
    const next = runs[i + 1];
    const tube: MetalRef = { alloyId: run.alloyId };
    if (prev && THROUGH.includes(prev.endFixing) && THROUGH.includes(run.startFixing) && (prev.alloyId !== run.alloyId || !sameSize(prev, run))) {
      out.push({ runId: run.id, key: `${run.id}:from-previous`, kind: 'tube_to_tube', where: `Start: butt weld to ${prev.name}${sameSize(prev, run) ? '' : ' (size change)'}`, metals: [{ alloyId: prev.alloyId }, tube] });
    }
    if (isFlanged(run.startFixing)) {
      out.push({ runId: run.id, key: `${run.id}:start`, kind: 'tube_to_flange', where: `Start: ${fixedPointLabel(run.startFixing)}`, metals: [tube, { alloyId: run.startFlangeAlloyId ?? run.alloyId }] });
    }
    if (run.joint.type === 'flex') {
      const [before, after] = flexSides(run, prev, next);
      const cuff = cuffRef(run);
      out.push({ runId: run.id, key: `${run.id}:flex-in`, kind: 'tube_to_flex', where: 'Flex part, inlet cuff', metals: [before, cuff] });
      out.push({ runId: run.id, key: `${run.id}:flex-out`, kind: 'tube_to_flex', where: 'Flex part, outlet cuff', metals: [cuff, after] });
    }
    if (run.joint.type === 'slip') {
      out.push({ runId: run.id, key: `${run.id}:sleeve`, kind: 'tube_to_sleeve', where: 'Slip joint sleeve', metals: [tube, { alloyId: run.joint.outer.alloyId ?? run.alloyId }] });
    }
    if (isFlanged(run.endFixing)) {
      out.push({ runId: run.id, key: `${run.id}:end`, kind: 'tube_to_flange', where: `End: ${fixedPointLabel(run.endFixing)}`, metals: [tube, { alloyId: run.endFlangeAlloyId ?? run.alloyId }] });
    }
  });
  return out;
}
