import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

export const CHANGE_KINDS = ['press', 'compound', 'fit', 'spec', 'lot', 'disposition'] as const;
export type ChangeKind = (typeof CHANGE_KINDS)[number];

/**
 * The pull feed: one row per change to a server-owned row, holding the row as it was then.
 * `seq` only grows, and writers are serialised (see Transactions), so a change becomes visible
 * in seq order and a cursor never skips one.
 */
@Entity('change_log')
export class Change {
  @PrimaryGeneratedColumn('increment')
  seq: number;

  @Column({ type: 'varchar', length: 16 })
  kind: ChangeKind;

  @Column({ type: 'varchar', length: 36 })
  entityId: string;

  @Column({ type: 'simple-json' })
  data: object;

  @Column({ type: Date })
  at: Date;
}
