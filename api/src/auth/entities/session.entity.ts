import { Column, Entity, Index, ManyToOne, PrimaryColumn } from 'typeorm';
import { User } from '../../users/entities/user.entity.js';

/**
 * One sign-in: the family of refresh tokens that rotate from one login. Bound to the device it
 * was made on, which is what lets that device push operations authored by this person.
 */
@Entity('sessions')
@Index(['userId', 'deviceId'])
export class Session {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 36 })
  userId: string;

  @ManyToOne(() => User)
  user?: User;

  @Column({ type: 'varchar', length: 36, nullable: true })
  deviceId: string | null;

  @Column({ type: Date })
  createdAt: Date;

  @Column({ type: Date, nullable: true })
  revokedAt: Date | null;

  /**
   * 'logout', 'reuse' (a spent refresh token came back), 'deactivated', 'device-revoked' (an
   * administrator signed the device out).
   */
  @Column({ type: 'varchar', length: 16, nullable: true })
  revokeReason: string | null;
}
