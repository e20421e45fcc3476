import { z } from 'zod';
import { FIXED_POINT_IDS } from '../jobs/fixed-points';
import { NEARBY_KINDS } from '../jobs/nearby';
import { BOUNDS } from './bounds';
import { runFieldPath, toCalcRequest } from '../jobs/run-input';
import type { LimitStatus, RunResult } from '../engine/types';
import type { StressFigure } from '../jobs/stress-figure';
import type { SystemCheck } from '../jobs/system-check';
import { calcRunRequestSchema, flexOptionsSchema, resultDetailQuerySchema, segmentSchema, slipOptionsSchema, tubeSchema } from './calc';

const text = (what: string, max: number) =>
  z
    .string({ error: `Enter ${what}` })
    .trim()
    .min(1, { error: `Enter ${what}` })
    .max(max, { error: `Use at most ${max} characters` });
const notes = z.string({ error: 'Notes must be text' }).trim().max(4000, { error: 'Use at most 4000 characters' });

// ---- jobs ----

export const JOB_STATUSES = ['active', 'archived'] as const;
export const jobStatusSchema = z.enum(JOB_STATUSES, { error: 'Choose active or archived' });
export type JobStatus = z.infer<typeof jobStatusSchema>;

const jobFields = {
  name: text('a job name', 120),
  customer: text('the customer', 120),
  application: text('the application', 200),
  notes,
};

/** Body of POST /api/jobs. */
export const jobCreateSchema = z.object({ ...jobFields, notes: notes.default('') });
export type JobCreateInput = z.infer<typeof jobCreateSchema>;

/** Body of PATCH /api/jobs/:id: any of the fields, and the status (archive / unarchive). */
export const jobPatchSchema = z
  .object({ ...jobFields, status: jobStatusSchema })
  .partial()
  .refine((v) => Object.keys(v).length > 0, { error: 'Change at least one thing' });
export type JobPatchInput = z.infer<typeof jobPatchSchema>;

/** Query of GET /api/jobs. The default list hides archived jobs; newest change first, one page at a time. */
export const jobListQuerySchema = z.object({
  search: z.string().trim().max(100).optional(),
  status: z.enum(['active', 'archived', 'all'], { error: 'Use active, archived or all' }).default('active'),
  page: z.coerce.number({ error: 'Enter a whole number' }).int({ error: 'Enter a whole number' }).min(1, { error: 'Pages start at 1' }).default(1),
  pageSize: z.coerce.number({ error: 'Enter a whole number' }).int({ error: 'Enter a whole number' }).min(1, { error: 'At least 1' }).max(100, { error: 'At most 100' }).default(25),
});

/** Query of GET /api/jobs/:id: results carry the chart curves and every flex candidate only when asked. */
export const jobDetailQuerySchema = resultDetailQuerySchema;
export type JobListQuery = z.infer<typeof jobListQuerySchema>;

// ---- runs ----

export const fixedPointSchema = z.enum(FIXED_POINT_IDS, { error: 'Choose what holds this end' });

const calcSlipMember = slipOptionsSchema.shape.inner.shape;
/** A slip member names a published alloy (absent = the run's own alloy); runs keep no inline alloy data. */
const slipMember = z.object({
  alloyId: calcSlipMember.alloyId,
  diameterMm: calcSlipMember.diameterMm,
  tempC: calcSlipMember.tempC,
});

/** The joint fitted in the run and its settings: none, a flex section, or a slip joint (slip inputs of the calculator). */
export const jointSchema = z.discriminatedUnion(
  'type',
  [
    z.object({ type: z.literal('none') }),
    flexOptionsSchema.omit({ parts: true }).extend({ type: z.literal('flex') }),
    slipOptionsSchema.extend({
      type: z.literal('slip'),
      inner: slipMember,
      outer: slipMember,
      /** Where the joint sits along the run; absent = the end held by the slip joint, else the run's end. */
      atMm: z.number({ error: 'Enter a number' }).nonnegative({ error: 'Position cannot be negative' }).optional(),
    }),
  ],
  { error: 'Choose none, flex or slip' },
);
export type Joint = z.infer<typeof jointSchema>;
export type JointType = Joint['type'];

const position = z.number({ error: 'Enter a number' }).nonnegative({ error: 'Position cannot be negative' }).max(BOUNDS.maxSegmentMm * 50, { error: 'Position must lie within the run' });

/** A support part-way along the run; anchors are run ends (end the run there and start a new one). */
export const SUPPORT_KINDS = ['sliding', 'hanger'] as const;
export const SUPPORT_LABELS: Record<(typeof SUPPORT_KINDS)[number], string> = { sliding: 'Sliding support', hanger: 'Hanger' };
export const supportSchema = z.object({
  kind: z.enum(SUPPORT_KINDS, { error: 'Choose a sliding support or a hanger' }),
  atMm: position,
});
export type Support = z.infer<typeof supportSchema>;

/** Something near the hot pipe: what it is, where along the run, and the gap to it cold. */
export const nearbyItemSchema = z.object({
  kind: z.enum(NEARBY_KINDS, { error: 'Choose what it is' }),
  label: z.string({ error: 'Name it' }).trim().max(80, { error: 'Use at most 80 characters' }),
  atMm: position,
  coldGapMm: z.number({ error: 'Enter a number' }).nonnegative({ error: 'Gap cannot be negative' }).max(2000, { error: 'At most 2000 mm' }),
  /** Beside the pipe (the gap closes by the pipe's swelling and sideways movement) or in line with it (by its movement along its length). */
  direction: z.enum(['beside', 'in_line'], { error: 'Choose beside or in line' }),
});
export type NearbyItem = z.infer<typeof nearbyItemSchema>;

const flangeAlloy = z.string({ error: 'Choose an alloy' }).min(1, { error: 'Choose an alloy' }).nullable();

const runFieldsShape = {
  name: text('a run name', 120),
  alloyId: z.string({ error: 'Choose an alloy' }).min(1, { error: 'Choose an alloy' }),
  tube: tubeSchema,
  installTempC: segmentSchema.shape.startTempC,
  segments: z
    .array(segmentSchema, { error: 'Add at least one segment' })
    .min(1, { error: 'Add at least one segment' })
    .max(50, { error: 'Use at most 50 segments' }),
  startFixing: fixedPointSchema,
  endFixing: fixedPointSchema,
  /** What the flange at a flanged end is made of (the weld plan pairs it with the tube); null = the run's own alloy. */
  startFlangeAlloyId: flangeAlloy,
  endFlangeAlloyId: flangeAlloy,
  joint: jointSchema,
  supports: z.array(supportSchema).max(50, { error: 'Use at most 50 supports' }),
  nearby: z.array(nearbyItemSchema).max(50, { error: 'Use at most 50 nearby items' }),
  notes,
};

const runFieldsObject = z.object(runFieldsShape);
export type RunFields = z.infer<typeof runFieldsObject>;

/** The checks that span fields (flex position within the run, sleeve bore), as the calculator makes them. */
function crossChecks(run: RunFields, ctx: z.RefinementCtx): void {
  const length = run.segments.reduce((sum, s) => sum + s.lengthMm, 0);
  const within = (atMm: number, path: (string | number)[]) => {
    if (atMm > length) ctx.addIssue({ code: 'custom', path, message: 'Position must lie within the run' });
  };
  run.supports.forEach((s, i) => within(s.atMm, ['supports', i, 'atMm']));
  run.nearby.forEach((n, i) => within(n.atMm, ['nearby', i, 'atMm']));
  if (run.joint.type === 'slip' && run.joint.atMm !== undefined) within(run.joint.atMm, ['joint', 'atMm']);
  const parsed = calcRunRequestSchema.safeParse(toCalcRequest(run));
  if (parsed.success) return;
  for (const issue of parsed.error.issues) {
    ctx.addIssue({ code: 'custom', path: runFieldPath(issue.path.map(String).join('.')).split('.'), message: issue.message });
  }
}

/** A whole run's inputs: what PATCH merges into and validates again. */
export const runFieldsSchema = runFieldsObject.superRefine(crossChecks);

/** Body of POST /api/jobs/:id/runs. Appended at the end unless `position` (1-based) is given. */
export const runCreateSchema = z
  .object({
    ...runFieldsShape,
    installTempC: runFieldsShape.installTempC.default(20),
    startFixing: fixedPointSchema.default('flange'),
    endFixing: fixedPointSchema.default('flange'),
    startFlangeAlloyId: flangeAlloy.default(null),
    endFlangeAlloyId: flangeAlloy.default(null),
    joint: jointSchema.default({ type: 'none' }),
    supports: runFieldsShape.supports.default([]),
    nearby: runFieldsShape.nearby.default([]),
    notes: notes.default(''),
    position: z.number({ error: 'Enter a whole number' }).int({ error: 'Enter a whole number' }).min(1, { error: 'Positions start at 1' }).optional(),
  })
  .superRefine(crossChecks);
export type RunCreateInput = z.infer<typeof runCreateSchema>;

/** Body of PATCH /api/runs/:id: any inputs; tube, segments and joint are replaced whole. */
export const runPatchSchema = runFieldsObject
  .partial()
  .refine((v) => Object.keys(v).length > 0, { error: 'Change at least one thing' });
export type RunPatchInput = z.infer<typeof runPatchSchema>;

/** Body of PUT /api/jobs/:id/runs/order: every run of the job, once each, in the new order. */
export const runOrderSchema = z.object({
  runIds: z.array(z.string().min(1), { error: 'List the runs in their new order' }).min(1, { error: 'List the runs in their new order' }),
});
export type RunOrderInput = z.infer<typeof runOrderSchema>;

export const COMPARE_MIN = 2;
export const COMPARE_MAX = 4;

/** Query of GET /api/runs/:id/compare: alloyIds=a,b,c (2–4 distinct published alloys). */
export const compareQuerySchema = z.object({
  alloyIds: z
    .string({ error: `Choose ${COMPARE_MIN} to ${COMPARE_MAX} alloys` })
    .transform((s) => s.split(',').map((id) => id.trim()).filter((id) => id.length > 0))
    .pipe(
      z
        .array(z.string())
        .min(COMPARE_MIN, { error: `Choose ${COMPARE_MIN} to ${COMPARE_MAX} alloys` })
        .max(COMPARE_MAX, { error: `Choose ${COMPARE_MIN} to ${COMPARE_MAX} alloys` })
        .refine((ids) => new Set(ids).size === ids.length, { error: 'Choose each alloy once' }),
    ),
});
export type CompareQuery = z.infer<typeof compareQuerySchema>;

// ---- what the API answers ----

/** The alloy data a result was computed with. `status` is 'retired' when the alloy left the catalogue. */
export interface AlloyUsed {
  id: string;
  designation: string;
  uns: string;
  version: number;
  status: 'published' | 'retired';
}

/** Why a run has no result: its alloy is gone, or its data does not cover the run. `fields` use run paths. */
export interface RunProblem {
  code: 'alloy_retired' | 'alloy_unavailable' | 'outside_data';
  message: string;
  fields?: Record<string, string>;
}

export interface RunView extends RunFields {
  id: string;
  jobId: string;
  position: number;
  /** null only when the alloy id is not in the catalogue at all. */
  alloy: AlloyUsed | null;
  /** Computed on every read from the latest published data of the alloy; null when `problem` is set. */
  result: RunResult | null;
  problem: RunProblem | null;
  /** Currency of materialCost: the shop's, or the alloy's price currency when no rate converts it. */
  currency: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface JobTotals {
  /** Sums over the runs that have a result; a run without one is left out of every figure. */
  growthMm: number;
  massKg: number;
  /** null when the runs' prices are in different currencies. */
  materialCost: number | null;
  currency: string | null;
  /** Why there is no material cost total: the runs' costs are in different currencies (no rate set to convert them). */
  costNote: string | null;
  /** Sum of the segment lengths of the runs with a result. */
  lengthMm: number;
  /** Highest temperature of any run with a result; null when none has one. */
  peakTempC: number | null;
  runCount: number;
  /** Runs left out of the growth, mass and cost sums because they have a problem. */
  runsWithProblems: number;
}

export interface JobView {
  id: string;
  name: string;
  customer: string;
  application: string;
  status: JobStatus;
  notes: string;
  createdBy: { id: string; name: string } | null;
  createdAt: string;
  updatedAt: string;
}

export interface JobDetail extends JobView {
  runs: RunView[];
  totals: JobTotals;
  /** Supports, clearances and what is wrong with the job as a system (shared/jobs/system-check.ts). */
  system: SystemCheck;
  /**
   * 'brief' (the default answer): each result's growth curve at the drawing's resolution, without its
   * growth-per-metre curve and flex candidates (the chosen part stays); 'full' with `?include=curves`.
   */
  resultDetail: 'brief' | 'full';
}

export interface JobSummary {
  id: string;
  name: string;
  customer: string;
  application: string;
  status: JobStatus;
  runCount: number;
  totalGrowthMm: number;
  totalMassKg: number;
  peakTempC: number | null;
  runsWithProblems: number;
  updatedAt: string;
}

export interface CompareFigures {
  growthMm: number;
  limitStatus: LimitStatus;
  marginC: number;
  /** The same restrained-stress figure the run page shows (stressFigure). */
  stress: StressFigure;
  jointNeeded: boolean | null;
  massKg: number;
  materialCost: number;
  currency: string;
}

export interface CompareDifference {
  growthMm: number;
  marginC: number;
  massKg: number;
  /** null when the two prices are in different currencies. */
  materialCost: number | null;
}

export interface CompareRow {
  alloy: AlloyUsed | null;
  figures: CompareFigures | null;
  problem: RunProblem | null;
  /** This row minus the run's current alloy; null for the current row and where either has no figures. */
  difference: CompareDifference | null;
}

export interface CompareView {
  runId: string;
  current: CompareRow;
  candidates: CompareRow[];
}
