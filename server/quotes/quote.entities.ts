import { Column, Entity, PrimaryColumn } from 'typeorm';
import { columnType } from '../db/column-types';
import type { QuotePricing, QuoteStatus } from '../../shared/schemas/quotes';

export interface StoredOption {
  label: string;
  alloyId: string;
  runAlloys?: Record<string, string>;
}

@Entity({ name: 'quote' })
export class Quote {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar', { unique: true }) number: string;
  @Column('varchar', { name: 'job_id' }) jobId: string;
  @Column('varchar', { name: 'customer_name' }) customerName: string;
  @Column('varchar', { name: 'customer_email' }) customerEmail: string;
  @Column('varchar', { name: 'customer_company', default: '' }) customerCompany: string;
  @Column('varchar', { name: 'valid_until' }) validUntil: string;
  @Column('text', { default: '' }) message: string;
  @Column('varchar') status: QuoteStatus;
  @Column('simple-json') options: StoredOption[];
  /** Frozen when sent; null while a draft (a draft is priced live). */
  @Column('simple-json', { nullable: true }) snapshot: QuotePricing | null;
  /** sha256 of the customer's link token; the token itself is never stored. */
  @Column('varchar', { name: 'token_hash', nullable: true, unique: true }) tokenHash: string | null;
  @Column('integer', { name: 'accepted_option_index', nullable: true }) acceptedOptionIndex: number | null;
  @Column('varchar', { name: 'decided_by', nullable: true }) decidedBy: string | null;
  @Column('varchar', { name: 'created_by', nullable: true }) createdBy: string | null;
  @Column(columnType.time, { name: 'created_at' }) createdAt: Date;
  @Column(columnType.time, { name: 'updated_at' }) updatedAt: Date;
  @Column(columnType.time, { name: 'sent_at', nullable: true }) sentAt: Date | null;
}

@Entity({ name: 'quote_event' })
export class QuoteEvent {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar', { name: 'quote_id' }) quoteId: string;
  @Column('varchar') status: QuoteStatus;
  @Column('varchar', { default: '' }) note: string;
  @Column('varchar', { nullable: true }) by: string | null;
  @Column(columnType.time) at: Date;
}

/** An engineer's or admin's reason for offering an option that runs over its temperature limit. */
@Entity({ name: 'quote_limit_override' })
export class QuoteLimitOverride {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar', { name: 'quote_id' }) quoteId: string;
  @Column('integer', { name: 'option_index' }) optionIndex: number;
  /** The option's alloys when the override was recorded (`optionKey`); a changed option needs a new one. */
  @Column('text', { name: 'option_key' }) optionKey: string;
  @Column('text') reason: string;
  @Column('varchar', { name: 'by_user_id', nullable: true }) byUserId: string | null;
  @Column('varchar', { name: 'by_name' }) byName: string;
  @Column({ type: columnType.time }) at: Date;
}
