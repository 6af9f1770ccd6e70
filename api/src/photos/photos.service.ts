import { createHash } from 'node:crypto';
import { mkdir, rename, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import {
  Inject,
  Injectable,
  NotFoundException,
  UnsupportedMediaTypeException,
} from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { CONFIG, type Config } from '../config.js';
import { Transactions } from '../database/transactions.js';
import { badInput } from '../common/validation.js';
import { Photo } from './entities/photo.entity.js';
import { imageType } from './image-type.js';

export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;

@Injectable()
export class PhotosService {
  constructor(
    @Inject(CONFIG) private readonly config: Config,
    private readonly transactions: Transactions,
    private readonly audit: AuditService,
    @InjectRepository(Photo) private readonly photos: Repository<Photo>,
  ) {}

  /** Where a photo lives: named only by its hash, two-level to keep folders small. */
  file(sha256: string): string {
    return join(this.config.dataDir, 'photos', sha256.slice(0, 2), sha256);
  }

  /** Stores the bytes under their hash; storing the same photo again changes nothing. */
  async store(
    actorId: string,
    sha256: string,
    bytes: Buffer | undefined,
  ): Promise<{ photo: Photo; created: boolean }> {
    if (!bytes || bytes.length === 0) {
      throw badInput([
        { field: 'file', messages: ['file must be a multipart field holding the photo'] },
      ]);
    }
    const mime = imageType(bytes);
    if (!mime) throw new UnsupportedMediaTypeException('file must be a JPEG, PNG or WebP image');
    const actual = createHash('sha256').update(bytes).digest('hex');
    if (actual !== sha256) {
      throw badInput([
        { field: 'sha256', messages: [`sha256 does not match the file (it is ${actual})`] },
      ]);
    }
    const known = await this.photos.findOneBy({ sha256 });
    if (known) return { photo: known, created: false };
    const path = this.file(sha256);
    await mkdir(join(path, '..'), { recursive: true });
    // Written aside, then renamed into place: a crash never leaves half a photo under its hash.
    await writeFile(`${path}.part`, bytes);
    await rename(`${path}.part`, path);
    const photo: Photo = {
      sha256,
      mime,
      bytes: bytes.length,
      uploadedBy: actorId,
      createdAt: new Date(),
    };
    // Checked again inside the writers' queue: two uploads of one photo may race to here.
    const created = await this.transactions.run(async (manager) => {
      if (await manager.findOneBy(Photo, { sha256 })) return false;
      await manager.insert(Photo, photo);
      await this.audit.record(manager, actorId, 'photo.upload', 'photo', sha256, null, photo);
      return true;
    });
    return { photo, created };
  }

  async find(sha256: string): Promise<Photo> {
    const photo = await this.photos.findOneBy({ sha256 });
    if (!photo) throw new NotFoundException(`No photo ${sha256}`);
    return photo;
  }
}
