import { Column, Entity, ManyToOne, PrimaryColumn } from 'typeorm';
import { Session } from './session.entity.js';

/** Only the SHA-256 of the secret half is kept, so a copy of the database cannot sign anyone in. */
@Entity('refresh_tokens')
export class RefreshToken {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 36 })
  sessionId: string;

  @ManyToOne(() => Session)
  session?: Session;

  @Column({ type: 'varchar', length: 64 })
  secretHash: string;

  @Column({ type: Date })
  expiresAt: Date;

  @Column({ type: Date, nullable: true })
  usedAt: Date | null;
}
