import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { CompoundFit } from './compound-fit.entity.js';

export const POLYMERS = ['NR', 'EPDM', 'NBR', 'CR', 'FKM', 'VMQ', 'SBR', 'other'] as const;
export type Polymer = (typeof POLYMERS)[number];

@Entity('compounds')
export class Compound {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 32, unique: true })
  code: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 8 })
  polymer: Polymer;

  @Column({ type: 'double precision' })
  hardnessShoreA: number;

  /** Bulk modulus K, MPa, where the lab measured it; the engine's default otherwise. */
  @Column({ type: 'double precision', nullable: true })
  bulkModulusMPa: number | null;

  /** The quality engineer's free text about the compound. */
  @Column({ type: 'varchar', length: 2000, default: '' })
  notes: string;

  /** The published fit whose constants part specs pick up when they are released. */
  @Column({ type: 'varchar', length: 36, nullable: true })
  currentFitId: string | null;

  // Relation<> keeps the emitted design type a plain Object: the two entity files import each
  // other, and a class reference would be read before its module has run.
  @ManyToOne(() => CompoundFit, { nullable: true })
  @JoinColumn({ name: 'currentFitId' })
  currentFit?: Relation<CompoundFit> | null;

  @Column({ type: Date })
  createdAt: Date;
}
