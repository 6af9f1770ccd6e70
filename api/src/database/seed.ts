import { randomUUID } from 'node:crypto';
import {
  Inject,
  Injectable,
  Module,
  type INestApplicationContext,
  type OnApplicationBootstrap,
} from '@nestjs/common';
import bcrypt from 'bcryptjs';
import { DataSource, In, type EntityManager } from 'typeorm';
import { CompoundsModule } from '../compounds/compounds.module.js';
import { CompoundsService } from '../compounds/compounds.service.js';
import { FitsService } from '../compounds/fits.service.js';
import { AuditService } from '../audit/audit.service.js';
import { CONFIG, type Config } from '../config.js';
import { partVerdict, type Mode } from '../engine.js';
import type { Measurements } from '../inspections/dto/measurements.dto.js';
import { InspectionsModule } from '../inspections/inspections.module.js';
import { InspectionsService } from '../inspections/inspections.service.js';
import { LotsModule } from '../lots/lots.module.js';
import { Lot } from '../lots/entities/lot.entity.js';
import { LotsService } from '../lots/lots.service.js';
import { MailService } from '../mail/mail.service.js';
import type { Press } from '../presses/entities/press.entity.js';
import { PressesModule } from '../presses/presses.module.js';
import { PressesService } from '../presses/presses.service.js';
import type { SpecRevision } from '../specs/entities/spec-revision.entity.js';
import { SpecsModule } from '../specs/specs.module.js';
import { SpecsService } from '../specs/specs.service.js';
import { deviceVerdictOf } from '../sync/device-verdict.js';
import { OpBatch, type OpContext } from '../sync/op-context.js';
import { User } from '../users/entities/user.entity.js';
import type { PublicUser } from '../users/public-user.js';
import { UsersModule } from '../users/users.module.js';
import { BCRYPT_COST, UsersService } from '../users/users.service.js';
import { DEMO_COMPOUNDS, DEMO_PEOPLE, DEMO_PRESSES, DEMO_SPECS } from './demo-data.js';
import { Transactions } from './transactions.js';

export const DEMO_PASSWORD = 'demo-password-1';
export const DEMO_EMAILS = DEMO_PEOPLE.map((p) => `${p.role}@demo.test`);
const DEMO_DEVICE = '00000000-0000-4000-8000-00000000d3e0';
const DAYS = 7;

/** A small deterministic generator, so every fresh demo shows the same week. */
function random(seed: number): () => number {
  let state = seed;
  return () => (state = (state * 16807) % 2147483647) / 2147483647;
}

/** What went wrong with a lot, if anything: the week has a few such lots. */
type Trouble = 'none' | 'soft-cure' | 'thin-parts';

/**
 * The invented demo plant (DESIGN §8), written on the first start only (when there are no users)
 * and in one transaction, through the same services as real use: the fits are the engine's, the
 * lots are judged by the engine, flagged lots mail the supervisor, and all of it is audited.
 */
@Injectable()
export class DemoSeed implements OnApplicationBootstrap {
  constructor(
    @Inject(CONFIG) private readonly config: Config,
    private readonly dataSource: DataSource,
    private readonly transactions: Transactions,
    private readonly users: UsersService,
    private readonly presses: PressesService,
    private readonly compounds: CompoundsService,
    private readonly fits: FitsService,
    private readonly specs: SpecsService,
    private readonly lots: LotsService,
    private readonly inspections: InspectionsService,
    private readonly mail: MailService,
    private readonly audit: AuditService,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (!this.config.seedDemo || (await this.dataSource.getRepository(User).exists())) return;
    const passwordHash = await bcrypt.hash(DEMO_PASSWORD, BCRYPT_COST);
    await this.transactions.run(async (manager) => {
      const people = new Map<string, PublicUser>();
      for (const person of DEMO_PEOPLE) {
        const email = `${person.role}@demo.test`;
        people.set(
          person.role,
          await this.users.insert(manager, null, { email, ...person }, passwordHash),
        );
      }
      const presses: Press[] = [];
      for (const press of DEMO_PRESSES)
        presses.push(await this.presses.insert(manager, null, press));
      const quality = people.get('quality')!.id;
      const revisions = await this.partSpecs(quality, await this.fittedCompounds(quality));
      await this.week(manager, people, presses, revisions);
    });
    await this.mail.flush();
  }

  /** Each compound with its test data, fitted by the engine and published. */
  private async fittedCompounds(quality: string): Promise<Map<string, string>> {
    const ids = new Map<string, string>();
    for (const { compound, tests, start } of DEMO_COMPOUNDS) {
      const made = await this.compounds.create(quality, compound);
      const testSetIds: string[] = [];
      for (const [mode, points] of Object.entries(tests) as [Mode, [number, number][]][]) {
        const set = await this.compounds.addTestSet(quality, made.id, {
          name: `${compound.code} ${mode}, lab sheet 1`,
          mode,
          temperatureC: 23,
          points: points.map(([stretch, stress]) => ({ stretch, stress })),
        });
        testSetIds.push(set.id);
      }
      const fit = await this.fits.fit(quality, made.id, {
        model: start,
        testSetIds,
        objective: 'relative',
      });
      await this.compounds.publish(quality, made.id, fit.id);
      ids.set(compound.code, made.id);
    }
    return ids;
  }

  private async partSpecs(quality: string, compounds: Map<string, string>) {
    const released: { revision: SpecRevision; lotSizes: number[] }[] = [];
    for (const demo of DEMO_SPECS) {
      const spec = await this.specs.create(quality, demo);
      const compoundId = compounds.get(demo.compoundCode)!;
      const draft = await this.specs.addRevision(quality, spec.id, { ...demo.body, compoundId });
      released.push({
        revision: await this.specs.release(quality, spec.id, draft.id),
        lotSizes: demo.lotSizes,
      });
    }
    return released;
  }

  /** A week of lots on every press, recorded on a tablet as the sync path would apply them. */
  private async week(
    manager: EntityManager,
    people: Map<string, PublicUser>,
    presses: Press[],
    revisions: { revision: SpecRevision; lotSizes: number[] }[],
  ): Promise<void> {
    const next = random(20261201);
    const inspector = people.get('inspector')!.id;
    const supervisor = people.get('supervisor')!.id;
    const troubles: Record<string, Trouble> = {
      '2-1': 'soft-cure',
      '4-3': 'thin-parts',
      '6-0': 'soft-cure',
    };
    let counter = 0;
    for (let day = DAYS; day >= 1; day--) {
      for (const [p, press] of presses.entries()) {
        const { revision, lotSizes } = revisions[(day + p) % revisions.length]!;
        const openedAt = new Date(Date.now() - day * 86_400_000 + (7 + p) * 3_600_000);
        const ctx: OpContext = {
          manager,
          authorId: inspector,
          deviceId: DEMO_DEVICE,
          recordedAt: openedAt,
          batch: new OpBatch(),
        };
        const lotId = await this.lots.open(ctx, {
          id: randomUUID(),
          lotNumber: `L${openedAt.toISOString().slice(2, 10).replace(/-/g, '')}-${press.code}-${++counter}`,
          specRevisionId: revision.id,
          pressId: press.id,
          cavity: 1 + Math.floor(next() * 4),
          lotSize: lotSizes[Math.floor(next() * lotSizes.length)]!,
          moldedAt: new Date(openedAt.getTime() - 20 * 3_600_000).toISOString(),
        });
        const trouble = troubles[`${day}-${p}`] ?? 'none';
        await this.sampledParts(ctx, lotId, revision, trouble, next);
        await this.inspections.flush(manager, ctx.batch);
        await this.lots.recount(manager, lotId);
        const judged = await manager.findOneByOrFail(Lot, { id: lotId });
        await this.lots.submit(ctx, {
          lotId,
          deviceVerdict: {
            verdict: judged.serverVerdict === 'flagged' ? 'flagged' : 'pass',
            nonconforming: judged.nonconforming,
          },
        });
        await this.audit.recordMany(manager, ctx.batch.audit);
        await this.lots.recount(manager, lotId);
        if (trouble === 'thin-parts') {
          await this.lots.disposition(supervisor, lotId, {
            action: 'sort-all',
            note: 'Thickness low on one cavity after a mold change: sort the lot, re-shim the mold.',
          });
        }
      }
    }
  }

  private async sampledParts(
    ctx: OpContext,
    lotId: string,
    revision: SpecRevision,
    trouble: Trouble,
    next: () => number,
  ): Promise<void> {
    const lot = await this.lots.openLot(ctx, lotId);
    const { prepared } = await this.specs.judged(ctx.manager, revision.id);
    const body = revision.body;
    const expected = revision.derived!.expected;
    const scatter = (spread: number) => (next() - 0.5) * 2 * spread;
    for (let sample = 1; sample <= lot.plan.sampleSize; sample++) {
      // A troubled lot has every third part off: enough to reach the reject number.
      const off = trouble !== 'none' && sample % 3 === 0;
      const hardnessShift = off && trouble === 'soft-cure' ? -8 : 0;
      const thicknessFactor = off && trouble === 'thin-parts' ? 0.9 : 1;
      const loadFactor = off ? (trouble === 'soft-cure' ? 0.72 : 1.3) : 1;
      const measurements: Measurements = {
        thickness: round(body.geometry.thickness * thicknessFactor * (1 + scatter(0.006)), 2),
        hardness: [0, 1, 2].map(() =>
          Math.round(body.hardness.nominal + hardnessShift + scatter(2)),
        ),
        load: round(
          ((expected.low.load + expected.high.load) / 2) * loadFactor * (1 + scatter(0.05)),
          0,
        ),
      };
      await this.inspections.record(
        { ...ctx, recordedAt: new Date(ctx.recordedAt.getTime() + sample * 90_000) },
        {
          id: randomUUID(),
          lotId,
          sampleIndex: sample,
          measurements,
          deviceVerdict: deviceVerdictOf(partVerdict(prepared, measurements)),
        },
      );
    }
  }
}

function round(value: number, decimals: number): number {
  return Number(value.toFixed(decimals));
}

@Module({
  imports: [
    UsersModule,
    PressesModule,
    CompoundsModule,
    SpecsModule,
    LotsModule,
    InspectionsModule,
  ],
  providers: [DemoSeed],
})
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
