import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { AuthService } from '../auth/auth.service.js';
import { RefreshToken } from '../auth/entities/refresh-token.entity.js';
import { Session } from '../auth/entities/session.entity.js';
import { Transactions } from '../database/transactions.js';
import { AppliedOp } from '../sync/entities/applied-op.entity.js';

export interface DevicePerson {
  userId: string;
  name: string;
  email: string;
}

export interface Device {
  deviceId: string;
  /** Who signed in on it, the latest first. */
  people: DevicePerson[];
  firstSeenAt: Date;
  lastSignInAt: Date;
  lastPushAt: Date | null;
  appliedOps: number;
  /** Sign-ins not ended and not past their refresh expiry. */
  activeSessions: number;
}

export interface DeviceRevoked {
  deviceId: string;
  revoked: number;
}

interface SignInRow extends DevicePerson {
  deviceId: string;
  firstAt: unknown;
  lastAt: unknown;
  active: number | string;
}

interface PushRow {
  deviceId: string;
  lastAt: unknown;
  ops: number | string;
}

/**
 * Devices have no table of their own: a device is the id a person gives when signing in on it,
 * and the id its pushes carry.
 */
@Injectable()
export class DevicesService {
  constructor(
    private readonly transactions: Transactions,
    private readonly audit: AuditService,
    private readonly auth: AuthService,
    @InjectRepository(Session) private readonly sessions: Repository<Session>,
    @InjectRepository(AppliedOp) private readonly appliedOps: Repository<AppliedOp>,
  ) {}

  async list(): Promise<Device[]> {
    const [signIns, pushes] = await Promise.all([this.signIns(), this.pushes()]);
    const devices = new Map<string, Device>();
    for (const row of signIns) {
      const firstAt = this.time(row.firstAt);
      const lastAt = this.time(row.lastAt);
      const { deviceId, userId, name, email } = row;
      const device = devices.get(deviceId) ?? {
        deviceId,
        people: [],
        firstSeenAt: firstAt,
        lastSignInAt: lastAt,
        lastPushAt: null,
        appliedOps: 0,
        activeSessions: 0,
      };
      device.people.push({ userId, name, email });
      if (firstAt < device.firstSeenAt) device.firstSeenAt = firstAt;
      if (lastAt > device.lastSignInAt) device.lastSignInAt = lastAt;
      device.activeSessions += Number(row.active);
      devices.set(deviceId, device);
    }
    for (const row of pushes) {
      const device = devices.get(row.deviceId);
      if (!device) continue;
      device.lastPushAt = this.time(row.lastAt);
      device.appliedOps = Number(row.ops);
    }
    return [...devices.values()].sort((a, b) => lastActive(b) - lastActive(a));
  }

  revoke(actorId: string, deviceId: string): Promise<DeviceRevoked> {
    return this.transactions.run(async (manager) => {
      if (!(await manager.existsBy(Session, { deviceId }))) {
        throw new NotFoundException(`No one has signed in on device ${deviceId}`);
      }
      const revoked = await this.auth.revokeDevice(manager, actorId, deviceId);
      await this.audit.record(manager, actorId, 'device.revoke', 'device', deviceId, null, {
        revoked,
      });
      return { deviceId, revoked };
    });
  }

  /** Per device and person: their first and last sign-in there and how many are still live. */
  private signIns(): Promise<SignInRow[]> {
    const query = this.sessions.createQueryBuilder('session');
    const live = query
      .subQuery()
      .select('1')
      .from(RefreshToken, 'token')
      .where('token.sessionId = session.id')
      .andWhere('token.usedAt IS NULL')
      .andWhere('token.expiresAt > :now')
      .getQuery();
    return query
      .innerJoin('session.user', 'user')
      .select('session.deviceId', 'deviceId')
      .addSelect('user.id', 'userId')
      .addSelect('user.name', 'name')
      .addSelect('user.email', 'email')
      .addSelect('MIN(session.createdAt)', 'firstAt')
      .addSelect('MAX(session.createdAt)', 'lastAt')
      .addSelect(
        `SUM(CASE WHEN session.revokedAt IS NULL AND EXISTS ${live} THEN 1 ELSE 0 END)`,
        'active',
      )
      .where('session.deviceId IS NOT NULL')
      .groupBy('session.deviceId')
      .addGroupBy('user.id')
      .addGroupBy('user.name')
      .addGroupBy('user.email')
      .orderBy('MAX(session.createdAt)', 'DESC')
      .setParameter('now', new Date())
      .getRawMany<SignInRow>();
  }

  private pushes(): Promise<PushRow[]> {
    return this.appliedOps
      .createQueryBuilder('op')
      .select('op.deviceId', 'deviceId')
      .addSelect('MAX(op.appliedAt)', 'lastAt')
      .addSelect('COUNT(*)', 'ops')
      .groupBy('op.deviceId')
      .getRawMany<PushRow>();
  }

  /** An aggregate comes back as the driver stores times (SQLite: UTC text without a zone). */
  private time(raw: unknown): Date {
    const column = this.sessions.metadata.findColumnWithPropertyName('createdAt')!;
    return this.sessions.manager.connection.driver.prepareHydratedValue(raw, column) as Date;
  }
}

function lastActive(device: Device): number {
  return Math.max(device.lastSignInAt.getTime(), device.lastPushAt?.getTime() ?? 0);
}
