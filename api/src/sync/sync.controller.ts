import { Body, Controller, Get, HttpCode, Post, Query } from '@nestjs/common';
import { AnyRole, Roles, type AuthUser } from '../auth/access.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { ChangeFeed, type ChangePage } from '../changes/change-feed.service.js';
import { PullQueryDto } from './dto/pull.dto.js';
import type { PushRequest } from './dto/push.dto.js';
import { PushPipe } from './push.pipe.js';
import { SyncService, type OpResult } from './sync.service.js';

@Controller('sync')
export class SyncController {
  constructor(
    private readonly sync: SyncService,
    private readonly feed: ChangeFeed,
  ) {}

  @Post('push')
  @Roles('inspector', 'supervisor')
  @HttpCode(200)
  push(
    @CurrentUser() user: AuthUser,
    @Body(PushPipe) body: PushRequest,
  ): Promise<{ results: OpResult[] }> {
    return this.sync.push(user, body);
  }

  @Get('pull')
  @AnyRole()
  pull(@Query() query: PullQueryDto): Promise<ChangePage> {
    return this.feed.pull(query.since ?? 0, query.limit ?? 500);
  }
}
