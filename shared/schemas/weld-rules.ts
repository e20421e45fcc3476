import { z } from 'zod';

/** A UNS number: one letter and five digits (S32100, G10200, N06625, R50400). */
export const unsSchema = z
  .string({ error: 'Enter a UNS number' })
  .trim()
  .toUpperCase()
  .regex(/^[A-Z]\d{5}$/, { error: 'Use a UNS number: a letter and five digits, e.g. S32100' });

export const unsList = (side: string) =>
  z
    .array(unsSchema, { error: `List the UNS numbers of ${side}` })
    .min(1, { error: `List at least one UNS number for ${side}` })
    .max(40, { error: 'Use at most 40 UNS numbers' })
    .refine((l) => new Set(l).size === l.length, { error: 'Name each UNS number once' });

const text = (what: string, max: number, min = 0) =>
  z
    .string({ error: `${what} must be text` })
    .trim()
    .min(min, { error: `Enter ${what.toLowerCase()}` })
    .max(max, { error: `Use at most ${max} characters` });

const ruleFields = {
  /** One side of the joint: any of these base metals… */
  sideA: unsList('the first base metal'),
  /** …welded to any of these (the rule holds either way round). */
  sideB: unsList('the second base metal'),
  /** AWS classification of the suggested filler, e.g. ER347. */
  filler: text('The filler', 40, 1),
  /** The specification the classification belongs to, e.g. AWS A5.9. */
  fillerSpec: text('The filler specification', 80, 1),
  /** Back-purge and shielding for the pair. */
  purge: text('The purge and shielding note', 600, 1),
  notes: text('Notes', 1000),
  /** The shop's own welding procedure (WPS) reference for the pair, if it has one. */
  procedureRef: text('The procedure reference', 80),
  /** Where the rule comes from: a named standard or producer's guide, or "common practice, no published source". */
  source: text('The source', 300, 1),
};

/** Body of POST /api/weld-rules. */
export const weldRuleInputSchema = z.object({ ...ruleFields, notes: ruleFields.notes.default(''), procedureRef: ruleFields.procedureRef.default('') });
export type WeldRuleInput = z.infer<typeof weldRuleInputSchema>;

/** Body of PATCH /api/weld-rules/:id. */
export const weldRulePatchSchema = z
  .object({ ...ruleFields, note: text('The note', 300) })
  .partial()
  .refine((v) => Object.keys(v).filter((k) => k !== 'note').length > 0, { error: 'Change at least one thing' });
export type WeldRulePatch = z.infer<typeof weldRulePatchSchema>;

export interface WeldRuleView extends WeldRuleInput {
  id: string;
  /** Stable handle of a seeded rule; null for rules the shop added. */
  key: string | null;
  /** 1 on creation, one more on every edit. */
  version: number;
  updatedBy: string | null;
  updatedAt: string;
}

export interface WeldRuleRevisionView {
  id: string;
  ruleId: string;
  version: number;
  action: 'created' | 'edited' | 'deleted';
  userName: string | null;
  note: string;
  diff: { path: string; before: unknown; after: unknown }[];
  at: string;
}

/** A list of UNS numbers typed as text ("S32100, S34700"), as the weld rules form takes it. */
export const unsListText = (side: string) =>
  z
    .string({ error: `List the UNS numbers of ${side}` })
    .transform((t) => t.split(/[\s,;]+/).filter((u) => u.length > 0))
    .pipe(unsList(side));

/** The weld rules form: the sides as text, the rest as the API takes it, and a note for the revision. */
export const weldRuleFormSchema = weldRuleInputSchema.extend({
  sideA: unsListText('the first base metal'),
  sideB: unsListText('the second base metal'),
  note: z.string().trim().max(300, { error: 'Use at most 300 characters' }).default(''),
});
