import { z } from 'zod';

/**
 * A deposit moves only forward: due (nothing started) → pending (a payment page is open) → paid → refunded.
 * failed goes back to pending when the customer tries again; nothing leaves paid except a refund.
 */
export const DEPOSIT_STATUSES = ['due', 'pending', 'failed', 'paid', 'refunded'] as const;
export type DepositStatus = (typeof DEPOSIT_STATUSES)[number];

export const DEPOSIT_STATUS_LABELS: Record<DepositStatus, string> = {
  due: 'Deposit due',
  pending: 'Deposit payment open',
  failed: 'Deposit payment failed',
  paid: 'Deposit paid',
  refunded: 'Deposit refunded',
};

export interface DepositView {
  status: DepositStatus;
  /** Whole percent of the accepted option's total. */
  sharePct: number;
  /** Integer minor units of `currency` (cents for EUR). */
  amountMinor: number;
  currency: string;
  attempts: number;
  /** Why the last attempt failed, in words for the customer. */
  failureMessage: string | null;
  paidAt: string | null;
  refundedAt: string | null;
  refundReason: string | null;
}

/** A deposit as the job sheet notes it. */
export interface JobDepositView extends DepositView {
  quoteId: string;
  quoteNumber: string;
}

export const refundDepositSchema = z.object({
  reason: z.string({ error: 'Give a reason for the refund' }).trim().min(3, { error: 'Give a reason for the refund' }).max(500, { error: 'At most 500 characters' }),
});
export type RefundDepositInput = z.infer<typeof refundDepositSchema>;
