import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { Lot } from '../../lots/entities/lot.entity.js';
import { User } from '../../users/entities/user.entity.js';
import { Inspection } from './inspection.entity.js';

/** Trade vocabulary after MIL-STD-407 (REFERENCES §11). */
export const DEFECT_TYPES = [
  'flash',
  'off-register',
  'backrind',
  'non-fill',
  'flow-line',
  'knit-line',
  'void',
  'blister',
  'contamination',
  'mold-deposit',
  'trim-damage',
  'scorch',
  'under-cure',
  'over-cure',
  'bond-failure',
  'ozone-crack',
  'other',
] as const;
export const DEFECT_LOCATIONS = ['sealing', 'flexing', 'protecting', 'cosmetic'] as const;
export const DEFECT_SEVERITIES = ['critical', 'major', 'minor'] as const;

@Entity('defects')
@Index(['lotId'])
export class Defect {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 36 })
  lotId: string;

  @ManyToOne(() => Lot)
  lot?: Lot;

  @Column({ type: 'varchar', length: 36, nullable: true })
  inspectionId: string | null;

  @ManyToOne(() => Inspection, { nullable: true })
  inspection?: Inspection | null;

  @Column({ type: 'varchar', length: 20 })
  type: (typeof DEFECT_TYPES)[number];

  @Column({ type: 'varchar', length: 12 })
  location: (typeof DEFECT_LOCATIONS)[number];

  @Column({ type: 'varchar', length: 12 })
  severity: (typeof DEFECT_SEVERITIES)[number];

  @Column({ type: 'double precision', nullable: true })
  sizeMm: number | null;

  @Column({ type: 'varchar', length: 1000 })
  note: string;

  /** The photo may arrive after the record, so this is not a foreign key. */
  @Column({ type: 'varchar', length: 64, nullable: true })
  photoSha256: string | null;

  @Column({ type: 'varchar', length: 36 })
  authorId: string;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'authorId' })
  author?: User;

  @Column({ type: 'varchar', length: 36 })
  deviceId: string;

  @Column({ type: Date })
  recordedAt: Date;
}
