import { Column, Entity, Index, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import type { MaterialModel, Mode } from '../../engine.js';
import { Compound } from './compound.entity.js';

export type FitStatus = 'draft' | 'published';

/** A fitted set of constants; immutable once made, so a released spec can point at it for good. */
@Entity('compound_fits')
@Index(['compoundId', 'version'], { unique: true })
export class CompoundFit {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 36 })
  compoundId: string;

  @ManyToOne(() => Compound)
  compound?: Relation<Compound>;

  @Column({ type: 'integer' })
  version: number;

  /** The engine's model shape with the fitted constants. */
  @Column({ type: 'simple-json' })
  model: MaterialModel;

  @Column({ type: 'varchar', length: 12 })
  objective: 'absolute' | 'relative';

  @Column({ type: 'simple-json' })
  testSetIds: string[];

  /** Weight of each mode's squared residuals as given to the engine; null: all weigh 1. */
  @Column({ type: 'simple-json', nullable: true })
  weights: Partial<Record<Mode, number>> | null;

  /** What the engine reported besides the model: RMS and R² per mode, iterations, stability. */
  @Column({ type: 'simple-json' })
  result: object;

  @Column({ type: 'varchar', length: 12 })
  status: FitStatus;

  @Column({ type: 'varchar', length: 36 })
  createdBy: string;

  @Column({ type: Date })
  createdAt: Date;

  @Column({ type: Date, nullable: true })
  publishedAt: Date | null;

  @Column({ type: 'varchar', length: 36, nullable: true })
  publishedBy: string | null;

  /** Why it was published, as the quality engineer wrote it. */
  @Column({ type: 'varchar', length: 1000, nullable: true })
  note: string | null;
}
