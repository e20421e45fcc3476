import { Column, Entity, PrimaryColumn } from 'typeorm';
import { columnType } from '../db/column-types';

/** A message as the embedded SMTP server received it: what the outbox screen shows. */
@Entity({ name: 'mail_message' })
export class MailMessage {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar', { name: 'message_id', nullable: true }) messageId: string | null;
  @Column('varchar', { name: 'from_address' }) from: string;
  @Column('varchar', { name: 'to_addresses' }) to: string;
  @Column('varchar') subject: string;
  @Column('text') text: string;
  @Column('text') html: string;
  @Column('integer', { name: 'size_bytes' }) sizeBytes: number;
  @Column(columnType.time, { name: 'received_at' }) receivedAt: Date;
}
