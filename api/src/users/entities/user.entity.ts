import { Column, Entity, PrimaryColumn } from 'typeorm';

export const ROLES = ['inspector', 'supervisor', 'quality', 'admin'] as const;
export type Role = (typeof ROLES)[number];

@Entity('users')
export class User {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 254, unique: true })
  email: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 16 })
  role: Role;

  @Column({ type: 'varchar', length: 72, select: false })
  passwordHash: string;

  @Column({ type: 'boolean' })
  active: boolean;

  @Column({ type: Date })
  createdAt: Date;
}
