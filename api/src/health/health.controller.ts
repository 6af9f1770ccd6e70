import { Controller, Get, Inject } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { Public } from '../auth/access.js';
import { CONFIG, type Config } from '../config.js';

@Controller('health')
export class HealthController {
  constructor(
    @Inject(CONFIG) private readonly config: Config,
    private readonly dataSource: DataSource,
  ) {}

  /** Reads a real row count, so a broken or missing database fails here rather than later. */
  @Get()
  @Public()
  async health(): Promise<{ status: 'ok'; version: string; database: 'ok' }> {
    await this.dataSource.query('SELECT COUNT(*) AS n FROM users');
    return { status: 'ok', version: this.config.version, database: 'ok' };
  }
}
