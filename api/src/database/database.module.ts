import { Global, Module, type DynamicModule } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { dataSourceOptions } from './data-source.js';
import { Transactions } from './transactions.js';

@Global()
@Module({})
export class DatabaseModule {
  /** Opens the SQLite file in `dataDir` and brings it up to the latest migration. */
  static forRoot(dataDir: string): DynamicModule {
    return {
      module: DatabaseModule,
      // No retries: a database that cannot be opened is reported at once, not after half a minute.
      imports: [TypeOrmModule.forRoot({ ...dataSourceOptions(dataDir), retryAttempts: 0 })],
      providers: [Transactions],
      exports: [Transactions],
    };
  }
}
