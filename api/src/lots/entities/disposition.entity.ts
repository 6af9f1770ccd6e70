import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { User } from '../../users/entities/user.entity.js';
import { Lot } from './lot.entity.js';

export const DISPOSITION_ACTIONS = ['release', 'hold', 'sort-all', 'rework', 'scrap'] as const;
export type DispositionAction = (typeof DISPOSITION_ACTIONS)[number];

@Entity('dispositions')
export class Disposition {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 36 })
  lotId: string;

  @ManyToOne(() => Lot)
  lot?: Lot;

  @Column({ type: 'varchar', length: 12 })
  action: DispositionAction;

  @Column({ type: 'varchar', length: 2000 })
  note: string;

  @Column({ type: 'varchar', length: 36 })
  decidedBy: string;

  @ManyToOne(() => User)
  @JoinColumn({ name: 'decidedBy' })
  decider?: User;

  @Column({ type: Date })
  decidedAt: Date;
}
