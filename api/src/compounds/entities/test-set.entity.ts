import { Column, Entity, ManyToOne, PrimaryColumn } from 'typeorm';
import type { Mode } from '../../engine.js';
import { Compound } from './compound.entity.js';

export interface StressPoint {
  stretch: number;
  stress: number;
}

/** One stress–strain test of a compound (uniaxial, equibiaxial or planar); never edited. */
@Entity('compound_test_sets')
export class TestSet {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 36 })
  compoundId: string;

  @ManyToOne(() => Compound)
  compound?: Compound;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 12 })
  mode: Mode;

  @Column({ type: 'double precision', nullable: true })
  temperatureC: number | null;

  @Column({ type: 'simple-json' })
  points: StressPoint[];

  @Column({ type: 'varchar', length: 36 })
  createdBy: string;

  @Column({ type: Date })
  createdAt: Date;
}
