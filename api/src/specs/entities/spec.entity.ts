import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { SpecRevision } from './spec-revision.entity.js';

@Entity('part_specs')
export class Spec {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 40, unique: true })
  partNumber: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 1000 })
  description: string;

  /** The latest released revision: the one new lots are opened against. */
  @Column({ type: 'varchar', length: 36, nullable: true })
  currentRevisionId: string | null;

  @ManyToOne(() => SpecRevision, { nullable: true })
  @JoinColumn({ name: 'currentRevisionId' })
  currentRevision?: Relation<SpecRevision> | null;

  @Column({ type: Date })
  createdAt: Date;
}
