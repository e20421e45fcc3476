import { z } from 'zod';
import { MIN_TEMP_C } from '../engine/expansion';
import type { RunInput } from '../engine/types';

const num = (error = 'Enter a number') => z.number({ error });
const positive = (what: string) => num().positive({ error: `${what} must be more than 0` });
const temperature = num().min(MIN_TEMP_C, { error: `Below ${MIN_TEMP_C} °C, the lowest temperature the calculator handles` });
const lengthMm = num().positive({ error: 'Length must be more than 0 mm' });

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
    modulus: z.array(modulusRow).min(1, { error: 'Give at least one modulus point' }).superRefine(strictlyRising),
    yield: z.array(yieldRow).min(1, { error: 'Give at least one yield point' }).superRefine(strictlyRising),
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

export const flexPartSchema = z.object({
  id: z.string().min(1),
  name: z.string().min(1),
  boreMm: positive('Bore'),
  liveLengthMm: positive('Live length'),
  ratedAxialCompressionMm: num().nonnegative({ error: 'Cannot be negative' }),
  ratedAxialExtensionMm: num().nonnegative({ error: 'Cannot be negative' }),
  lateralOffsetMm: num().nonnegative({ error: 'Cannot be negative' }),
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
    odMm: positive('Outside diameter'),
    wallMm: positive('Wall'),
  })
  .refine((t) => t.wallMm < t.odMm / 2, { path: ['wallMm'], error: 'Wall must be less than half the outside diameter' });

export const flexOptionsSchema = z.object({
  movementMargin: num().min(1, { error: 'Margin must be at least 1' }).optional(),
  parts: z.array(flexPartSchema).optional(),
  atMm: num().nonnegative({ error: 'Position cannot be negative' }).optional(),
});

const slipMemberSchema = z
  .object({
    alloyId: z.string().min(1, { error: 'Choose an alloy' }).optional(),
    alloy: alloyDataSchema.optional(),
    diameterMm: positive('Diameter').optional(),
    tempC: temperature,
  })
  .refine((m) => !(m.alloyId !== undefined && m.alloy !== undefined), {
    path: ['alloy'],
    error: 'Give either an alloy id or the alloy data, not both',
  });

export const slipOptionsSchema = z.object({
  inner: slipMemberSchema,
  outer: slipMemberSchema,
  coldClearanceMm: num().nonnegative({ error: 'Clearance cannot be negative' }),
  coldEngagementMm: positive('Engagement'),
  coldAxialGapMm: num().nonnegative({ error: 'Gap cannot be negative' }),
  minEngagementMm: positive('Minimum engagement').optional(),
});

/** Body of POST /api/calc/run. Exactly one of alloyId and alloy. */
export const calcRunRequestSchema = z
  .object({
    alloyId: z.string().min(1, { error: 'Choose an alloy' }).optional(),
    alloy: alloyDataSchema.optional(),
    tube: tubeSchema,
    installTempC: temperature,
    segments: z.array(segmentSchema, { error: 'Add at least one segment' }).min(1, { error: 'Add at least one segment' }),
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
