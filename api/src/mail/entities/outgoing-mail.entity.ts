import { Column, Entity, PrimaryColumn } from 'typeorm';

/**
 * Mail written in the same transaction as the event it reports and sent after commit. The unique
 * key (e.g. `lot-flagged:<lotId>`) is what makes an event mail out once, however often it recurs.
 */
@Entity('outgoing_mail')
export class OutgoingMail {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 120, unique: true })
  dedupeKey: string;

  @Column({ type: 'simple-json' })
  to: string[];

  @Column({ type: 'varchar', length: 200 })
  subject: string;

  @Column({ type: 'text' })
  text: string;

  @Column({ type: Date })
  createdAt: Date;

  @Column({ type: Date, nullable: true })
  sentAt: Date | null;

  @Column({ type: 'integer' })
  attempts: number;

  @Column({ type: 'varchar', length: 500, nullable: true })
  lastError: string | null;
}
