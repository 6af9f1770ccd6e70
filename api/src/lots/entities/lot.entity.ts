import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import type { SamplingPlan } from '../../engine.js';
import { Spec } from '../../specs/entities/spec.entity.js';
import { Press } from '../../presses/entities/press.entity.js';
import { SpecRevision } from '../../specs/entities/spec-revision.entity.js';
import { User } from '../../users/entities/user.entity.js';

export type LotStatus = 'open' | 'submitted';
export type LotVerdict = 'pending' | 'pass' | 'flagged';

@Entity('lots')
@Index(['openedAt'])
export class Lot {
  /** Made on the tablet, so a lot opened offline keeps its identity. */
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 40, unique: true })
  lotNumber: string;

  @Column({ type: 'varchar', length: 36 })
  specId: string;

  @ManyToOne(() => Spec)
  spec?: Spec;

  @Column({ type: 'varchar', length: 36 })
  specRevisionId: string;

  @ManyToOne(() => SpecRevision)
  specRevision?: SpecRevision;

  @Column({ type: 'varchar', length: 36 })
  pressId: string;

  @ManyToOne(() => Press)
  press?: Press;

  @Column({ type: 'integer' })
  cavity: number;

  @Column({ type: 'integer' })
  lotSize: number;

  @Column({ type: Date })
  moldedAt: Date;

  @Column({ type: 'varchar', length: 36 })
  openedBy: string;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'openedBy' })
  opener?: User;

  @Column({ type: Date })
  openedAt: Date;

  @Column({ type: 'varchar', length: 36 })
  deviceId: string;

  @Column({ type: 'varchar', length: 12 })
  status: LotStatus;

  /** The sampling plan for this lot size, fixed when the lot is opened. */
  @Column({ type: 'simple-json' })
  plan: SamplingPlan;

  @Column({ type: 'integer' })
  inspected: number;

  @Column({ type: 'integer' })
  nonconforming: number;

  @Column({ type: 'varchar', length: 12 })
  serverVerdict: LotVerdict;

  /** The engine's lot verdict in words, e.g. "2 of 13 inspected parts nonconforming …". */
  @Column({ type: 'varchar', length: 500 })
  verdictReason: string;

  @Column({ type: 'simple-json', nullable: true })
  deviceVerdict: { verdict: 'pass' | 'flagged'; nonconforming: number } | null;

  @Column({ type: Date, nullable: true })
  submittedAt: Date | null;

  @Column({ type: Date, nullable: true })
  flaggedAt: Date | null;

  /** The latest disposition's action, kept here so the review queue is one query. */
  @Column({ type: 'varchar', length: 12, nullable: true })
  dispositionAction: string | null;
}
