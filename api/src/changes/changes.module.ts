import { Global, Module } from '@nestjs/common';
import { ChangeFeed } from './change-feed.service.js';

/** Global: every module that owns rows the tablets mirror publishes their changes here. */
@Global()
@Module({ providers: [ChangeFeed], exports: [ChangeFeed] })
export class ChangesModule {}
