import { Column, Entity, PrimaryColumn } from 'typeorm';

/** Every operation ever applied, so a retried opId is answered 'duplicate' instead of applied again. */
@Entity('applied_ops')
export class AppliedOp {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  opId: string;

  @Column({ type: 'varchar', length: 36 })
  deviceId: string;

  @Column({ type: 'varchar', length: 24 })
  type: string;

  @Column({ type: 'varchar', length: 36 })
  authorId: string;

  @Column({ type: Date })
  appliedAt: Date;
}
