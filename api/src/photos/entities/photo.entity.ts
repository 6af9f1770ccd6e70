import { Column, Entity, PrimaryColumn } from 'typeorm';

export type PhotoMime = 'image/jpeg' | 'image/png' | 'image/webp';

@Entity('photos')
export class Photo {
  /** Lowercase hex SHA-256 of the bytes; also the file's name under the data folder. */
  @PrimaryColumn({ type: 'varchar', length: 64 })
  sha256: string;

  @Column({ type: 'varchar', length: 16 })
  mime: PhotoMime;

  @Column({ type: 'integer' })
  bytes: number;

  @Column({ type: 'varchar', length: 36 })
  uploadedBy: string;

  @Column({ type: Date })
  createdAt: Date;
}
