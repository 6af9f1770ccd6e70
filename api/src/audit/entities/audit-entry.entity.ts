import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity('audit_log')
@Index(['entity', 'entityId'])
export class AuditEntry {
  @PrimaryGeneratedColumn('increment')
  id: number;

  @Column({ type: Date })
  at: Date;

  /** Null for what the server does by itself (flagging a lot, the demo seed). */
  @Column({ type: 'varchar', length: 36, nullable: true })
  actorId: string | null;

  @Column({ type: 'varchar', length: 40 })
  action: string;

  @Column({ type: 'varchar', length: 40 })
  entity: string;

  @Column({ type: 'varchar', length: 64 })
  entityId: string;

  @Column({ type: 'simple-json', nullable: true })
  before: object | null;

  @Column({ type: 'simple-json', nullable: true })
  after: object | null;
}
