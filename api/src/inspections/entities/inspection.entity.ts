import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { Lot } from '../../lots/entities/lot.entity.js';
import { User } from '../../users/entities/user.entity.js';
import type { PartVerdict } from '../../engine.js';
import type { DeviceVerdictDto } from '../../sync/dto/operations.dto.js';
import type { Measurements } from '../dto/measurements.dto.js';

/**
 * One sampled part as recorded at the press. Never updated: a correction is a new row whose
 * `supersedesId` names the row it replaces (unique, so a record is corrected at most once and the
 * revisions form a chain).
 */
@Entity('inspections')
@Index(['lotId'])
export class Inspection {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 36 })
  lotId: string;

  @ManyToOne(() => Lot)
  lot?: Lot;

  @Column({ type: 'integer' })
  sampleIndex: number;

  @Column({ type: 'varchar', length: 36, nullable: true, unique: true })
  supersedesId: string | null;

  @ManyToOne(() => Inspection, { nullable: true })
  @JoinColumn({ name: 'supersedesId' })
  supersedes?: Inspection | null;

  @Column({ type: 'simple-json' })
  measurements: Measurements;

  /** What the tablet showed, kept as sent. */
  @Column({ type: 'simple-json' })
  deviceVerdict: DeviceVerdictDto;

  /** The engine's verdict of these measurements, worked out on the server: the one of record. */
  @Column({ type: 'simple-json' })
  serverVerdict: PartVerdict;

  @Column({ type: 'boolean' })
  conforming: boolean;

  @Column({ type: 'varchar', length: 36 })
  authorId: string;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'authorId' })
  author?: User;

  @Column({ type: 'varchar', length: 36 })
  deviceId: string;

  @Column({ type: Date })
  recordedAt: Date;

  @Column({ type: Date })
  receivedAt: Date;
}
