import { Module, type DynamicModule } from '@nestjs/common';
import { AuditModule } from './audit/audit.module.js';
import { AuthModule } from './auth/auth.module.js';
import { ChangesModule } from './changes/changes.module.js';
import { CompoundsModule } from './compounds/compounds.module.js';
import { CONFIG, type Config } from './config.js';
import { DatabaseModule } from './database/database.module.js';
import { SeedModule } from './database/seed.js';
import { DevicesModule } from './devices/devices.module.js';
import { HealthModule } from './health/health.module.js';
import { InspectionsModule } from './inspections/inspections.module.js';
import { LotsModule } from './lots/lots.module.js';
import { MailModule } from './mail/mail.module.js';
import { PhotosModule } from './photos/photos.module.js';
import { PressesModule } from './presses/presses.module.js';
import { ReportsModule } from './reports/reports.module.js';
import { SpecsModule } from './specs/specs.module.js';
import { SyncModule } from './sync/sync.module.js';
import { TrendsModule } from './trends/trends.module.js';
import { UsersModule } from './users/users.module.js';

@Module({})
export class AppModule {
  static forRoot(config: Config, jwtSecret: string): DynamicModule {
    return {
      module: AppModule,
      global: true,
      imports: [
        DatabaseModule.forRoot(config.dataDir),
        AuditModule,
        ChangesModule,
        MailModule,
        AuthModule.forRoot(jwtSecret),
        UsersModule,
        DevicesModule,
        PressesModule,
        CompoundsModule,
        SpecsModule,
        LotsModule,
        InspectionsModule,
        SyncModule,
        ReportsModule,
        TrendsModule,
        PhotosModule,
        HealthModule,
        SeedModule,
      ],
      providers: [{ provide: CONFIG, useValue: config }],
      exports: [CONFIG],
    };
  }
}
