import { Column, Entity, PrimaryColumn } from 'typeorm';
import { columnType } from '../db/column-types';
import type { DepositStatus } from '../../shared/schemas/deposits';

/** One quote's deposit, from the first "Pay deposit" on; the amount is fixed then. */
@Entity({ name: 'quote_deposit' })
export class Deposit {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar', { name: 'quote_id', unique: true }) quoteId: string;
  @Column('varchar') status: Exclude<DepositStatus, 'due'>;
  @Column('integer', { name: 'share_pct' }) sharePct: number;
  /** Integer minor units of `currency`. */
  @Column('integer', { name: 'amount_minor' }) amountMinor: number;
  @Column('varchar') currency: string;
  /** Each failed payment lets the customer start a new attempt; the idempotency key carries its number. */
  @Column('integer') attempts: number;
  @Column('varchar', { name: 'checkout_session_id', nullable: true }) checkoutSessionId: string | null;
  @Column('varchar', { name: 'checkout_url', nullable: true }) checkoutUrl: string | null;
  @Column('varchar', { name: 'payment_intent_id', nullable: true }) paymentIntentId: string | null;
  @Column('varchar', { name: 'failure_message', nullable: true }) failureMessage: string | null;
  @Column('varchar', { name: 'refund_id', nullable: true }) refundId: string | null;
  @Column('varchar', { name: 'refund_reason', nullable: true }) refundReason: string | null;
  @Column(columnType.time, { name: 'paid_at', nullable: true }) paidAt: Date | null;
  @Column(columnType.time, { name: 'refunded_at', nullable: true }) refundedAt: Date | null;
  @Column(columnType.time, { name: 'created_at' }) createdAt: Date;
  @Column(columnType.time, { name: 'updated_at' }) updatedAt: Date;
}

/** Provider events already handled, so a replayed webhook changes nothing. */
@Entity({ name: 'payment_event' })
export class PaymentEventSeen {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar') type: string;
  @Column(columnType.time, { name: 'received_at' }) receivedAt: Date;
}
