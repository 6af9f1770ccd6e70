import { Column, Entity, PrimaryColumn } from 'typeorm';

export const PRESS_KINDS = ['compression', 'transfer', 'injection'] as const;
export type PressKind = (typeof PRESS_KINDS)[number];

@Entity('presses')
export class Press {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 32, unique: true })
  code: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 16 })
  kind: PressKind;

  @Column({ type: 'double precision', nullable: true })
  clampForceKn: number | null;

  @Column({ type: 'boolean' })
  active: boolean;
}
