import {
  Column,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryColumn,
  type Relation,
} from 'typeorm';
import { Compound } from '../../compounds/entities/compound.entity.js';
import { CompoundFit } from '../../compounds/entities/compound-fit.entity.js';
import type { PartSpec } from '../../engine.js';
import type { SpecBody } from '../dto/spec-body.dto.js';
import type { SpecDerived } from '../engine-spec.js';
import { Spec } from './spec.entity.js';

export type RevisionStatus = 'draft' | 'released';

/**
 * A numbered revision of a part spec. Released revisions are frozen together with the fit they
 * were released against, so every lot is re-checked against exactly what the inspector saw.
 */
@Entity('part_spec_revisions')
@Index(['specId', 'revision'], { unique: true })
export class SpecRevision {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 36 })
  specId: string;

  @ManyToOne(() => Spec)
  spec?: Relation<Spec>;

  @Column({ type: 'integer' })
  revision: number;

  @Column({ type: 'varchar', length: 12 })
  status: RevisionStatus;

  @Column({ type: 'simple-json' })
  body: SpecBody;

  @Column({ type: 'varchar', length: 36 })
  compoundId: string;

  @ManyToOne(() => Compound)
  compound?: Relation<Compound>;

  @Column({ type: 'varchar', length: 36, nullable: true })
  fitId: string | null;

  @ManyToOne(() => CompoundFit, { nullable: true })
  @JoinColumn({ name: 'fitId' })
  fit?: Relation<CompoundFit> | null;

  /** Frozen at release: the spec with the fit's constants, as the engine judges parts by it. */
  @Column({ type: 'simple-json', nullable: true })
  partSpec: PartSpec | null;

  /** The engine's expected load and acceptance windows, worked out once at release. */
  @Column({ type: 'simple-json', nullable: true })
  derived: SpecDerived | null;

  @Column({ type: Date })
  createdAt: Date;

  @Column({ type: Date, nullable: true })
  releasedAt: Date | null;

  @Column({ type: 'varchar', length: 36, nullable: true })
  releasedBy: string | null;
}
