import { Controller, Get, Query } from '@nestjs/common';
import { Roles } from '../auth/access.js';
import { AuditService } from './audit.service.js';
import { AuditQueryDto } from './dto/audit-query.dto.js';
import type { AuditEntry } from './entities/audit-entry.entity.js';

@Controller('audit')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  @Get()
  @Roles('admin', 'quality')
  list(@Query() query: AuditQueryDto): Promise<AuditEntry[]> {
    return this.audit.list(query);
  }
}
