import { Column, Entity, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import type { AgingPoint } from '../../engine.js';
import { Compound } from './compound.entity.js';

/** Compression-set aging of a compound: hours to reach the threshold set at each temperature. */
@Entity('compound_aging_sets')
export class AgingSet {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 36 })
  compoundId: string;

  @ManyToOne(() => Compound)
  compound?: Relation<Compound>;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  /** The compression set, %, that ends the part's life. */
  @Column({ type: 'double precision' })
  thresholdPercent: number;

  @Column({ type: 'simple-json' })
  points: AgingPoint[];

  @Column({ type: 'varchar', length: 36 })
  createdBy: string;

  @Column({ type: Date })
  createdAt: Date;
}
