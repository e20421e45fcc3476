import { z } from 'zod';
import type { ShopSettings } from './shop-settings';
import type { OptionComparison, PricedAlloy, PricedOption, PricedRunInput } from '../quotes/pricing';
import { emailSchema } from './auth';
import type { OptionLimitState } from '../quotes/limit-cautions';
import type { DepositView } from './deposits';
import type { Phrase, UnitSystem } from '../units';

export const QUOTE_STATUSES = ['draft', 'sent', 'viewed', 'accepted', 'declined', 'expired'] as const;
export type QuoteStatus = (typeof QUOTE_STATUSES)[number];

export const QUOTE_STATUS_LABELS: Record<QuoteStatus, string> = {
  draft: 'Draft',
  sent: 'Sent',
  viewed: 'Viewed by the customer',
  accepted: 'Accepted',
  declined: 'Declined',
  expired: 'Expired',
};

export const quoteOptionSchema = z.object({
  label: z.string({ error: 'Name the option' }).trim().min(1, { error: 'Name the option' }).max(80),
  alloyId: z.string({ error: 'Choose an alloy' }).min(1, { error: 'Choose an alloy' }),
  /** Run id → alloy id, for the runs the customer wants in another alloy. */
  runAlloys: z.record(z.string(), z.string().min(1)).optional(),
});

export const quoteInputSchema = z.object({
  jobId: z.string({ error: 'Choose a job' }).min(1, { error: 'Choose a job' }),
  customerName: z.string({ error: 'Enter the customer’s name' }).trim().min(1, { error: 'Enter the customer’s name' }).max(120),
  customerEmail: emailSchema,
  customerCompany: z.string().trim().max(120).default(''),
  validUntil: z.iso.date({ error: 'Use a date like 2026-12-31' }),
  message: z.string().trim().max(2000).default(''),
  options: z
    .array(quoteOptionSchema)
    .min(2, { error: 'Give at least two options' })
    .max(4, { error: 'Give at most four options' }),
});
export type QuoteInput = z.infer<typeof quoteInputSchema>;
export type QuoteInputDraft = z.input<typeof quoteInputSchema>;

export const quotePatchSchema = quoteInputSchema.partial();

export const acceptQuoteSchema = z.object({
  optionIndex: z.number({ error: 'Choose an option' }).int().min(0),
  name: z.string({ error: 'Enter your name' }).trim().min(1, { error: 'Enter your name' }).max(120),
});

export const declineQuoteSchema = z.object({
  name: z.string({ error: 'Enter your name' }).trim().min(1, { error: 'Enter your name' }).max(120),
  reason: z.string().trim().max(1000).default(''),
});

/** An engineer's or admin's reason for offering an option that runs over its temperature limit. */
export const limitOverrideSchema = z.object({
  optionIndex: z.number({ error: 'Choose an option' }).int().min(0).max(3),
  reason: z
    .string({ error: 'Give the reason' })
    .trim()
    .min(10, { error: 'Say why in a sentence (at least 10 characters)' })
    .max(500, { error: 'Use at most 500 characters' }),
});
export type LimitOverrideInput = z.infer<typeof limitOverrideSchema>;

export interface LimitOverrideView {
  optionIndex: number;
  reason: string;
  by: string;
  at: string;
}

/** Prices, alloys and runs as they stood when the quote was sent (or as they stand now, for a draft). */
export interface QuotePricing {
  currency: string;
  settings: ShopSettings;
  runs: PricedRunInput[];
  alloys: PricedAlloy[];
  options: PricedOption[];
  comparisons: OptionComparison[];
  pricedAt: string;
  frozen: boolean;
  /** The limit overrides in force when the quote was sent (absent on quotes sent before overrides existed). */
  limitOverrides?: LimitOverrideView[];
}

export interface QuoteEventView {
  at: string;
  status: QuoteStatus;
  note: string;
  by: string | null;
}

export interface QuoteView {
  id: string;
  number: string;
  jobId: string;
  jobName: string;
  customerName: string;
  customerEmail: string;
  customerCompany: string;
  validUntil: string;
  message: string;
  status: QuoteStatus;
  options: z.infer<typeof quoteOptionSchema>[];
  pricing: QuotePricing | null;
  /** Why the quote cannot be priced right now (for a draft whose data is missing). */
  pricingProblem: string | null;
  acceptedOptionIndex: number | null;
  decidedBy: string | null;
  createdBy: string | null;
  createdAt: string;
  sentAt: string | null;
  events: QuoteEventView[];
  /** Overrides for options over their temperature limit: those still matching a draft's options, or those frozen at sending. */
  limitOverrides: LimitOverrideView[];
  /** The deposit asked for on acceptance; null when none is asked. */
  deposit?: DepositView | null;
}

export interface QuoteSummary {
  id: string;
  number: string;
  jobName: string;
  customerName: string;
  customerCompany: string;
  status: QuoteStatus;
  validUntil: string;
  currency: string;
  /** The lowest and highest option totals. */
  totalFrom: number | null;
  totalTo: number | null;
  updatedAt: string;
  deposit?: DepositView | null;
}

/** What the customer sees through the private link: the options and nothing else of the shop. */
export interface PublicQuoteView {
  number: string;
  shopName: string;
  customerName: string;
  customerCompany: string;
  jobName: string;
  validUntil: string;
  message: string;
  status: QuoteStatus;
  currency: string;
  acceptedOptionIndex: number | null;
  /** The units of the person who prepared the quote: what the customer reads until they choose. */
  units: UnitSystem;
  deposit?: DepositView | null;
  options: {
    label: string;
    total: number;
    costDifference: number;
    costDifferencePct: number | null;
    massKg: number;
    massDifferenceKg: number;
    tempMarginC: number;
    tempMarginGainedC: number;
    limitState: OptionLimitState;
    /** The temperature caution in plain words, for an option over or near its limit. */
    limitCaution: Phrase | null;
    /** False for an option over its limit that nobody at the shop has vouched for. */
    acceptable: boolean;
    alloys: { designation: string; uns: string; familyLabel: string; serviceLimitC: number; plainWords: Phrase }[];
  }[];
}
