import { z } from 'zod';
import { unsSchema } from './weld-rules';
import { FLEX_PURPOSES } from '../engine/flex-purposes';

export const ALLOY_FAMILIES = [
  'austenitic_stainless',
  'ferritic_stainless',
  'nickel_chromium',
  'nickel_iron_chromium',
  'titanium',
  'carbon_steel',
] as const;
export const alloyFamilySchema = z.enum(ALLOY_FAMILIES, { error: 'Choose a family' });
export type AlloyFamily = z.infer<typeof alloyFamilySchema>;

export const FAMILY_LABELS: Record<AlloyFamily, string> = {
  austenitic_stainless: 'Austenitic stainless',
  ferritic_stainless: 'Ferritic stainless',
  nickel_chromium: 'Nickel-chromium alloy',
  nickel_iron_chromium: 'Nickel-iron-chromium alloy',
  titanium: 'Titanium',
  carbon_steel: 'Carbon steel',
};

export const ALLOY_STATUSES = ['draft', 'published', 'retired'] as const;
export type AlloyStatus = (typeof ALLOY_STATUSES)[number];

export const SOURCE_KINDS = ['standard', 'handbook', 'datasheet', 'memory'] as const;
export const SOURCE_KIND_LABELS: Record<(typeof SOURCE_KINDS)[number], string> = {
  standard: 'Standard',
  handbook: 'Handbook',
  datasheet: 'Data sheet',
  memory: 'From memory — to be verified',
};

/** UNS numbers: one letter for the metal group, then five digits (ASTM E527 / SAE J1086). */
export const UNS_PATTERN = /^[A-Z]\d{5}$/;

const finite = (what: string) => z.number({ error: `${what} must be a number` }).refine(Number.isFinite, { error: `${what} must be a number` });
const tempC = finite('Temperature').min(-273.15, { error: 'Below absolute zero' }).max(2000, { error: 'Above 2000 °C' });
const positive = (what: string) => finite(what).gt(0, { error: `${what} must be above zero` });
const sourceId = z.string({ error: 'Cite a source' }).min(1, { error: 'Cite a source' });

function ascending<T extends { tempC: number }>(rows: T[]) {
  return rows.every((row, i) => i === 0 || row.tempC > rows[i - 1].tempC);
}
const table = <S extends z.ZodType<{ tempC: number }>>(row: S, what: string) =>
  z.array(row).refine(ascending, { error: `${what} temperatures must rise from row to row, without repeats` });

export const ctePointSchema = z.object({ tempC, meanUmPerMK: positive('Mean coefficient').max(40, { error: 'Mean coefficient above 40 µm/m·K is not a metal' }), sourceId });
export const modulusPointSchema = z.object({ tempC, gpa: positive('Modulus').max(400, { error: 'Modulus above 400 GPa' }), sourceId });
export const yieldPointSchema = z.object({ tempC, mpa: positive('Yield strength').max(3000, { error: 'Yield above 3000 MPa' }), sourceId });

export const warningRangeSchema = z
  .object({
    fromC: tempC,
    toC: tempC,
    code: z.string().regex(/^[a-z][a-z0-9_]*$/, { error: 'Use a snake_case code' }),
    message: z.string().trim().min(1, { error: 'Say what the warning means' }).max(500),
  })
  .refine((w) => w.toC > w.fromC, { error: 'The range must end above where it starts', path: ['toC'] });

const alloyShape = {
    designation: z.string({ error: 'Enter a designation' }).trim().min(2, { error: 'Enter a designation' }).max(60),
    uns: z
      .string({ error: 'Enter the UNS number' })
      .trim()
      .toUpperCase()
      .regex(UNS_PATTERN, { error: 'A UNS number is a letter and five digits, e.g. S32100' }),
    family: alloyFamilySchema,
    densityKgM3: positive('Density').min(1000, { error: 'Density below 1000 kg/m³ is not a metal tube' }).max(25000),
    densitySourceId: sourceId,
    maxContinuousC: tempC,
    maxIntermittentC: tempC,
    limitsSourceId: sourceId,
    pricePerKg: finite('Price').min(0, { error: 'Price cannot be negative' }),
    currency: z.string().trim().toUpperCase().regex(/^[A-Z]{3}$/, { error: 'Use a three-letter currency code' }),
    priceSetOn: z.iso.date({ error: 'Use a date like 2026-11-01' }),
    priceIsDemo: z.boolean(),
    referenceTempC: finite('Reference temperature').min(-50).max(100, { error: 'A CTE reference above 100 °C is unusual; check the data sheet' }),
    notes: z.string().max(4000, { error: 'Use at most 4000 characters' }),
    /** What a user must know about this alloy's data: limits lowered to the data's reach, values still to be verified. */
    dataCautions: z.string().max(1000, { error: 'Use at most 1000 characters' }),
    warningRanges: z.array(warningRangeSchema),
    cte: table(ctePointSchema, 'Expansion').refine((rows) => rows.length >= 2, { error: 'Give at least two expansion points' }),
    // Either may be empty where nothing is published; restrained stress is then not judged.
    modulus: table(modulusPointSchema, 'Modulus'),
    yield: table(yieldPointSchema, 'Yield'),
};

export const alloyInputSchema = z.object({
  ...alloyShape,
  priceIsDemo: alloyShape.priceIsDemo.default(false),
  notes: alloyShape.notes.default(''),
  dataCautions: alloyShape.dataCautions.default(''),
  warningRanges: alloyShape.warningRanges.default([]),
});
export type AlloyInput = z.infer<typeof alloyInputSchema>;
export type AlloyInputDraft = z.input<typeof alloyInputSchema>;

/** An edit: any subset of fields (tables replace whole), with a note saying why. */
export const alloyPatchSchema = z.object(alloyShape).partial().extend({
  note: z.string().trim().max(500).optional(),
});
export type AlloyPatch = z.infer<typeof alloyPatchSchema>;

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, { error: `Use at most ${max} characters` })
    .nullish()
    .transform((v) => v ?? '');

export const sourceInputSchema = z.object({
  kind: z.enum(SOURCE_KINDS, { error: 'Choose the kind of source' }),
  title: z.string({ error: 'Enter a title' }).trim().min(3, { error: 'Enter a title' }).max(300),
  issuer: optionalText(200),
  edition: optionalText(60),
  url: z.url({ protocol: /^https?$/, error: 'Use an http(s) link' }).nullable().optional(),
  note: optionalText(1000),
});
export type SourceInput = z.infer<typeof sourceInputSchema>;

export const ALLOY_SORTS = ['designation', 'limit', 'expansion', 'price'] as const;
export const alloyListQuerySchema = z.object({
  search: z.string().trim().max(100).optional(),
  family: alloyFamilySchema.optional(),
  minServiceC: z.coerce.number({ error: 'must be a number' }).optional(),
  sort: z.enum(ALLOY_SORTS).default('designation'),
  atC: z.coerce.number({ error: 'must be a number' }).min(-50).max(1500).default(800),
  includeDrafts: z
    .enum(['true', 'false'])
    .transform((v) => v === 'true')
    .default(false),
  includeRetired: z
    .enum(['true', 'false'])
    .transform((v) => v === 'true')
    .default(false),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});
export type AlloyListQuery = z.infer<typeof alloyListQuerySchema>;

export const flexPartInputSchema = z.object({
  code: z.string({ error: 'Enter a part code' }).trim().min(2, { error: 'Enter a part code' }).max(40),
  name: z.string({ error: 'Enter a name' }).trim().min(2, { error: 'Enter a name' }).max(120),
  purpose: z.enum(FLEX_PURPOSES, { error: 'Say what the part is for' }).default('thermal_bellows'),
  boreMm: positive('Bore').max(1000),
  liveLengthMm: positive('Live length').max(2000),
  overallLengthMm: positive('Overall length').max(3000).nullable().default(null),
  meanDiameterMm: positive('Mean diameter').max(1200).nullable().default(null),
  ratedAxialCompressionMm: positive('Rated compression').max(500),
  ratedAxialExtensionMm: finite('Rated extension').min(0, { error: 'Rated extension cannot be negative' }).max(500),
  lateralOffsetMm: finite('Lateral offset').min(0, { error: 'Lateral offset cannot be negative' }).max(500),
  ratedAngularDeg: finite('Rated rotation').min(0, { error: 'Rated rotation cannot be negative' }).max(90, { error: 'At most 90°' }).default(0),
  ratedCycles: finite('Rated cycles').int({ error: 'Enter a whole number of cycles' }).min(1, { error: 'At least 1 cycle' }).max(1e9).nullable().default(null),
  maxTempC: tempC,
  price: finite('Price').min(0, { error: 'Price cannot be negative' }),
  currency: z.string().trim().toUpperCase().regex(/^[A-Z]{3}$/, { error: 'Use a three-letter currency code' }),
  /** UNS number of the weld cuffs, where the maker states it (the weld plan pairs the tube with it). */
  cuffUns: unsSchema.nullable().default(null),
  active: z.boolean().default(true),
});
export type FlexPartInput = z.infer<typeof flexPartInputSchema>;
export const flexPartPatchSchema = flexPartInputSchema.partial();

export const FLEX_PURPOSE_LABELS: Record<(typeof FLEX_PURPOSES)[number], string> = {
  thermal_bellows: 'Thermal bellows (takes growth)',
  vibration_decoupler: 'Vibration decoupler (not for growth)',
  braided_hose: 'Braided hose (not for growth)',
};

// ---- What the API answers ----

export interface SourceView {
  id: string;
  key: string | null;
  kind: (typeof SOURCE_KINDS)[number];
  title: string;
  issuer: string;
  edition: string;
  url: string | null;
  note: string;
  datasheetId: string | null;
}

export interface AlloySummary {
  id: string;
  designation: string;
  uns: string;
  family: AlloyFamily;
  status: AlloyStatus;
  version: number | null;
  hasDraft: boolean;
  densityKgM3: number;
  maxContinuousC: number;
  maxIntermittentC: number;
  pricePerKg: number;
  currency: string;
  priceIsDemo: boolean;
  maxDataC: number;
  /** Growth from 20 °C to the list's `atC`, mm per metre; null above the alloy's data. */
  growthAtMmPerM: number | null;
}

export interface AlloyVersionView extends AlloyInput {
  versionId: string;
  version: number;
  state: 'draft' | 'published' | 'superseded';
  createdAt: string;
  createdBy: string | null;
  publishedAt: string | null;
  publishedBy: string | null;
}

export interface DatasheetView {
  id: string;
  originalName: string;
  sizeBytes: number;
  sha256: string;
  uploadedBy: string | null;
  uploadedAt: string;
}

export interface AlloyDetail {
  id: string;
  status: AlloyStatus;
  /** The data everyone works from; null while the alloy has never been published. */
  published: AlloyVersionView | null;
  /** The open draft, for engineers and admins only. */
  draft: AlloyVersionView | null;
  sources: SourceView[];
  datasheets: DatasheetView[];
  /** Where the open draft stands in review; null without a draft or before it is submitted. */
  review: AlloyReviewState | null;
}

export type ReviewStep = 'submitted' | 'sent_back';

/** One line of an alloy's version list. */
export interface AlloyVersionSummary {
  version: number;
  state: 'draft' | 'published' | 'superseded';
  designation: string;
  publishedAt: string | null;
  createdAt: string;
}

export interface AlloyReviewState {
  step: ReviewStep;
  note: string;
  by: string | null;
  at: string;
}

/** One draft waiting for an admin. */
export interface ReviewQueueItem {
  alloyId: string;
  designation: string;
  uns: string;
  version: number;
  isNew: boolean;
  submittedBy: string | null;
  submittedAt: string;
  note: string;
}

export type RevisionAction = 'created' | 'edited' | 'published' | 'retired' | 'restored' | 'datasheet_added' | 'datasheet_removed' | 'submitted' | 'sent_back';

export interface RevisionView {
  id: string;
  action: RevisionAction;
  version: number | null;
  at: string;
  by: string | null;
  note: string;
  diff: { path: string; before: unknown; after: unknown }[];
}

export interface FlexPartView extends FlexPartInput {
  id: string;
  isDemo: boolean;
}

/** The note beside a review step: needed to publish or send back, optional when submitting. */
export function reviewNoteSchema(required: boolean) {
  const text = z.string({ error: 'Write a note' }).trim().max(500, { error: 'Use at most 500 characters' });
  return z.object({ note: required ? text.min(1, { error: 'Write a note for the history' }) : text });
}
export type ReviewNote = z.infer<ReturnType<typeof reviewNoteSchema>>;
