import { z } from 'zod';
import { FLEX_PURPOSES } from '../engine/flex-purposes';
import type { RunInput } from '../engine/types';
import { BOUNDS } from './bounds';

const num = (error = 'Enter a number') => z.number({ error });
const positive = (what: string) => num().positive({ error: `${what} must be more than 0` });
const atMost = (schema: z.ZodNumber, max: number, what: string, unit: string) => schema.max(max, { error: `${what} must be at most ${max} ${unit}` });
const temperature = num()
  .min(BOUNDS.minRunTempC, { error: `Below ${BOUNDS.minRunTempC} °C, the lowest temperature the calculator handles` })
  .max(BOUNDS.maxRunTempC, { error: `Above ${BOUNDS.maxRunTempC} °C: no alloy for pipework holds together there` });
const lengthMm = atMost(num().positive({ error: 'Length must be more than 0 mm' }), BOUNDS.maxSegmentMm, 'A segment', 'mm');

function strictlyRising(points: { tempC: number }[], ctx: z.RefinementCtx): void {
  for (let i = 1; i < points.length; i++) {
    if (!(points[i].tempC > points[i - 1].tempC)) {
      ctx.addIssue({ code: 'custom', path: [i, 'tempC'], message: 'Temperatures must rise from one row to the next' });
    }
  }
}

const cteRow = z.object({ tempC: num(), meanUmPerMK: positive('Mean coefficient') });
const modulusRow = z.object({ tempC: num(), gpa: positive('Modulus') });
const yieldRow = z.object({ tempC: num(), mpa: positive('Yield strength') });

/** An alloy's data given inline, in the shape the catalogue produces. */
export const alloyDataSchema = z.object({
    referenceTempC: num(),
    cte: z.array(cteRow).min(1, { error: 'Give at least one expansion point' }).superRefine(strictlyRising),
    // Either may be empty: growth and joints still come out, the stress check says it is not in the data.
    modulus: z.array(modulusRow).superRefine(strictlyRising),
    yield: z.array(yieldRow).superRefine(strictlyRising),
    densityKgM3: positive('Density'),
    maxContinuousC: num(),
    maxIntermittentC: num(),
    pricePerKg: num().nonnegative({ error: 'Price cannot be negative' }),
    warningRanges: z
      .array(
        z
          .object({ fromC: num(), toC: num(), code: z.string().min(1), message: z.string().min(1) })
          .refine((w) => w.toC >= w.fromC, { path: ['toC'], error: 'The range must end at or above its start' }),
      )
      .optional(),
});

const nonNegative = () => num().nonnegative({ error: 'Cannot be negative' });

export const flexPartSchema = z.object({
  id: z.string().min(1),
  name: z.string().min(1),
  purpose: z.enum(FLEX_PURPOSES, { error: 'Say what the part is for' }),
  boreMm: atMost(positive('Bore'), BOUNDS.maxOdMm, 'Bore', 'mm'),
  liveLengthMm: atMost(positive('Live length'), BOUNDS.maxSegmentMm, 'Live length', 'mm'),
  overallLengthMm: positive('Overall length').nullable().optional(),
  meanDiameterMm: positive('Mean diameter').nullable().optional(),
  ratedAxialCompressionMm: nonNegative(),
  ratedAxialExtensionMm: nonNegative(),
  lateralOffsetMm: nonNegative(),
  ratedAngularDeg: nonNegative().max(90, { error: 'At most 90°' }),
  ratedCycles: nonNegative().int({ error: 'Enter a whole number' }).nullable(),
  maxTempC: num(),
  price: num().nonnegative({ error: 'Price cannot be negative' }),
});

export const segmentSchema = z.object({
  lengthMm,
  startTempC: temperature,
  endTempC: temperature,
});

export const tubeSchema = z
  .object({
    odMm: atMost(positive('Outside diameter'), BOUNDS.maxOdMm, 'Outside diameter', 'mm'),
    wallMm: atMost(positive('Wall'), BOUNDS.maxWallMm, 'Wall', 'mm'),
  })
  .refine((t) => t.wallMm < t.odMm / 2, { path: ['wallMm'], error: 'Wall must be less than half the outside diameter' });

export const flexOptionsSchema = z.object({
  partId: z.string().min(1, { error: 'Choose a part' }).optional(),
  parts: z.array(flexPartSchema).max(200, { error: 'At most 200 parts' }).optional(),
  atMm: num().nonnegative({ error: 'Position cannot be negative' }).optional(),
  lateralOffsetMm: atMost(nonNegative(), BOUNDS.maxLateralMm, 'Lateral offset', 'mm').optional(),
  rotationDeg: atMost(nonNegative(), BOUNDS.maxRotationDeg, 'Rotation', '°').optional(),
  perpendicularLeg: z.object({ lengthMm, tempC: temperature }).optional(),
  heatCycles: atMost(nonNegative().int({ error: 'Enter a whole number' }), BOUNDS.maxHeatCycles, 'Heat cycles', 'cycles').optional(),
});

const slipMemberSchema = z
  .object({
    alloyId: z.string().min(1, { error: 'Choose an alloy' }).optional(),
    alloy: alloyDataSchema.optional(),
    diameterMm: atMost(positive('Diameter'), BOUNDS.maxOdMm, 'Diameter', 'mm').optional(),
    tempC: temperature,
  })
  .refine((m) => !(m.alloyId !== undefined && m.alloy !== undefined), {
    path: ['alloy'],
    error: 'Give either an alloy id or the alloy data, not both',
  });

export const slipOptionsSchema = z.object({
  inner: slipMemberSchema,
  outer: slipMemberSchema,
  coldClearanceMm: atMost(num().nonnegative({ error: 'Clearance cannot be negative' }), BOUNDS.maxClearanceMm, 'Clearance', 'mm'),
  coldEngagementMm: atMost(positive('Engagement'), BOUNDS.maxEngagementMm, 'Engagement', 'mm'),
  coldAxialGapMm: atMost(num().nonnegative({ error: 'Gap cannot be negative' }), BOUNDS.maxGapMm, 'Gap', 'mm'),
  minEngagementMm: atMost(positive('Minimum engagement'), BOUNDS.maxEngagementMm, 'Minimum engagement', 'mm').optional(),
  toleranceMm: atMost(nonNegative(), BOUNDS.maxToleranceMm, 'Tolerance', 'mm').optional(),
  scalePerSurfaceMm: atMost(nonNegative(), BOUNDS.maxScaleMm, 'Scale allowance', 'mm').optional(),
  minRadialClearanceMm: atMost(nonNegative(), BOUNDS.maxRadialClearanceMm, 'Minimum clearance', 'mm').optional(),
  maxRadialClearanceMm: atMost(positive('Maximum clearance'), BOUNDS.maxRadialClearanceMm, 'Maximum clearance', 'mm').optional(),
});

/** Body of POST /api/calc/run. Exactly one of alloyId and alloy. */
export const calcRunRequestSchema = z
  .object({
    alloyId: z.string().min(1, { error: 'Choose an alloy' }).optional(),
    alloy: alloyDataSchema.optional(),
    tube: tubeSchema,
    installTempC: temperature,
    segments: z
      .array(segmentSchema, { error: 'Add at least one segment' })
      .min(1, { error: 'Add at least one segment' })
      .max(50, { error: 'Use at most 50 segments' }),
    flex: flexOptionsSchema.optional(),
    slip: slipOptionsSchema.optional(),
  })
  .superRefine((body, ctx) => {
    if (body.alloyId === undefined && body.alloy === undefined) {
      ctx.addIssue({ code: 'custom', path: ['alloyId'], message: 'Choose an alloy or give its data' });
    }
    if (body.alloyId !== undefined && body.alloy !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['alloy'], message: 'Give either an alloy id or the alloy data, not both' });
    }
    const total = body.segments.reduce((sum, s) => sum + s.lengthMm, 0);
    if (body.flex?.atMm !== undefined && body.flex.atMm > total) {
      ctx.addIssue({ code: 'custom', path: ['flex', 'atMm'], message: 'Position must lie within the run' });
    }
    const slip = body.slip;
    if (slip?.minRadialClearanceMm !== undefined && slip.maxRadialClearanceMm !== undefined && slip.maxRadialClearanceMm <= slip.minRadialClearanceMm) {
      ctx.addIssue({ code: 'custom', path: ['slip', 'maxRadialClearanceMm'], message: 'The maximum must be above the minimum' });
    }
    if (slip?.outer.diameterMm !== undefined) {
      const inner = slip.inner.diameterMm ?? body.tube.odMm;
      if (Math.abs(slip.outer.diameterMm - inner - slip.coldClearanceMm) > 0.005) {
        ctx.addIssue({
          code: 'custom',
          path: ['slip', 'outer', 'diameterMm'],
          message: 'Sleeve bore must equal the tube diameter plus the cold clearance',
        });
      }
    }
  });

export type AlloyDataInput = z.infer<typeof alloyDataSchema>;
export type FlexPartInput = z.infer<typeof flexPartSchema>;
export type SegmentInput = z.infer<typeof segmentSchema>;
export type CalcRunRequest = z.infer<typeof calcRunRequestSchema>;

/** A parsed request is a valid engine input as it stands. */
export function toRunInput(body: CalcRunRequest): RunInput {
  return body;
}

export { fieldsFromZodError } from './field-errors';
export { calculateRun, CAUTIONS, type CalculateRunOptions } from '../engine/calculate-run';
export { EngineInputError, isEngineInputError } from '../engine/errors';
export type { RunResult } from '../engine/types';

/** Query of answers that carry run results: the full curves and every flex candidate only with include=curves. */
export const resultDetailQuerySchema = z.object({
  include: z.enum(['curves'], { error: 'Use include=curves' }).optional(),
});
