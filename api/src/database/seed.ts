import {
  Injectable,
  Module,
  type INestApplicationContext,
  type OnApplicationBootstrap,
} from '@nestjs/common';
import { Inject } from '@nestjs/common';
import bcrypt from 'bcryptjs';
import { DataSource, In } from 'typeorm';
import { CONFIG, type Config } from '../config.js';
import { PressesModule } from '../presses/presses.module.js';
import { PressesService } from '../presses/presses.service.js';
import { User, type Role } from '../users/entities/user.entity.js';
import { BCRYPT_COST, UsersService } from '../users/users.service.js';
import { UsersModule } from '../users/users.module.js';
import { Transactions } from './transactions.js';

export const DEMO_PASSWORD = 'demo-password-1';
const DEMO_PEOPLE: { role: Role; name: string }[] = [
  { role: 'inspector', name: 'Ines Demo (inspector)' },
  { role: 'supervisor', name: 'Sam Demo (supervisor)' },
  { role: 'quality', name: 'Quinn Demo (quality)' },
  { role: 'admin', name: 'Ada Demo (admin)' },
];
export const DEMO_EMAILS = DEMO_PEOPLE.map((p) => `${p.role}@demo.test`);

/**
 * The invented demo plant (DESIGN §8), written on the first start only — when the database has
 * no users at all — through the same services as real use, so it is audited like everything else.
 */
@Injectable()
export class DemoSeed implements OnApplicationBootstrap {
  constructor(
    @Inject(CONFIG) private readonly config: Config,
    private readonly dataSource: DataSource,
    private readonly transactions: Transactions,
    private readonly users: UsersService,
    private readonly presses: PressesService,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (!this.config.seedDemo || (await this.dataSource.getRepository(User).exists())) return;
    const passwordHash = await bcrypt.hash(DEMO_PASSWORD, BCRYPT_COST);
    await this.transactions.run(async (manager) => {
      for (const person of DEMO_PEOPLE) {
        await this.users.insert(
          manager,
          null,
          { email: `${person.role}@demo.test`, ...person },
          passwordHash,
        );
      }
      for (const press of [
        {
          code: 'P1',
          name: 'Compression press 1 (250 t)',
          kind: 'compression',
          clampForceKn: 2450,
        },
        {
          code: 'P2',
          name: 'Compression press 2 (400 t)',
          kind: 'compression',
          clampForceKn: 3920,
        },
        { code: 'P3', name: 'Transfer press 3', kind: 'transfer', clampForceKn: 1960 },
        { code: 'P4', name: 'Injection press 4', kind: 'injection', clampForceKn: 2940 },
      ] as const) {
        await this.presses.insert(manager, null, press);
      }
    });
  }
}

@Module({ imports: [UsersModule, PressesModule], providers: [DemoSeed] })
export class SeedModule {}

/** One line for the console while any demo account can still sign in. */
export async function demoAccountsWarning(
  app: INestApplicationContext,
): Promise<string | undefined> {
  const active = await app
    .get(DataSource)
    .getRepository(User)
    .countBy({ email: In(DEMO_EMAILS), active: true });
  if (active === 0) return undefined;
  return `Warning: ${active} demo account(s) (…@demo.test, password ${DEMO_PASSWORD}) can sign in; deactivate them before real use`;
}
