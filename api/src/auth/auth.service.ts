import { createHash, randomBytes, randomUUID, timingSafeEqual } from 'node:crypto';
import { Injectable, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { InjectRepository } from '@nestjs/typeorm';
import bcrypt from 'bcryptjs';
import { In, IsNull, Repository, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { Transactions } from '../database/transactions.js';
import { User } from '../users/entities/user.entity.js';
import { publicUser, type PublicUser } from '../users/public-user.js';
import type { AccessClaims } from './jwt.strategy.js';
import { RefreshToken } from './entities/refresh-token.entity.js';
import { Session } from './entities/session.entity.js';
import { LoginThrottle } from './login-throttle.js';

const ACCESS_SECONDS = 15 * 60;
const REFRESH_MS = 30 * 24 * 3600 * 1000;
const WRONG = 'Email or password is wrong';
// Compared against when the email is unknown, so both failures take as long.
const DUMMY_HASH = bcrypt.hashSync('not-a-password-anyone-has', 10);

export interface SessionTokens {
  accessToken: string;
  refreshToken: string;
  expiresIn: number;
  user: PublicUser;
}

function sha256(text: string): string {
  return createHash('sha256').update(text).digest('hex');
}

@Injectable()
export class AuthService {
  constructor(
    private readonly jwt: JwtService,
    private readonly throttle: LoginThrottle,
    private readonly transactions: Transactions,
    private readonly audit: AuditService,
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectRepository(Session) private readonly sessions: Repository<Session>,
  ) {}

  async login(
    email: string,
    password: string,
    deviceId: string | undefined,
    address: string,
  ): Promise<SessionTokens> {
    const key = `${email.toLowerCase()}|${address}`;
    this.throttle.check(key);
    const user = await this.users
      .createQueryBuilder('user')
      .addSelect('user.passwordHash')
      .where('user.email = :email', { email: email.toLowerCase() })
      .getOne();
    const matches = await bcrypt.compare(password, user?.passwordHash ?? DUMMY_HASH);
    if (!user || !matches || !user.active) {
      this.throttle.fail(key);
      throw new UnauthorizedException(WRONG);
    }
    this.throttle.succeed(key);
    return this.transactions.run(async (manager) => {
      const session: Session = {
        id: randomUUID(),
        userId: user.id,
        deviceId: deviceId ?? null,
        createdAt: new Date(),
        revokedAt: null,
        revokeReason: null,
      };
      await manager.insert(Session, session);
      await this.audit.record(manager, user.id, 'auth.login', 'session', session.id, null, {
        deviceId: session.deviceId,
      });
      return this.issue(manager, user, session);
    });
  }

  /**
   * Rotates a refresh token. A token that was already spent means someone holds a copy: the whole
   * sign-in (every token descended from the same login) is revoked.
   */
  async refresh(refreshToken: string): Promise<SessionTokens> {
    const [id = '', secret = ''] = refreshToken.split('.');
    const outcome = await this.transactions.run(async (manager) => {
      const token = await manager.findOneBy(RefreshToken, { id });
      if (!token || !sameHash(token.secretHash, sha256(secret))) return 'unknown' as const;
      const session = await manager.findOneByOrFail(Session, { id: token.sessionId });
      if (token.usedAt) {
        if (!session.revokedAt) await this.revoke(manager, session, 'reuse');
        return 'reused' as const;
      }
      const user = await manager.findOneBy(User, { id: session.userId });
      if (session.revokedAt || token.expiresAt < new Date() || !user?.active) {
        return 'ended' as const;
      }
      await manager.update(RefreshToken, { id }, { usedAt: new Date() });
      return this.issue(manager, user, session);
    });
    if (typeof outcome === 'string') {
      throw new UnauthorizedException(
        outcome === 'reused'
          ? 'This refresh token was already used; the sign-in has been ended'
          : 'Sign in again',
      );
    }
    return outcome;
  }

  async logout(refreshToken: string): Promise<void> {
    const [id = '', secret = ''] = refreshToken.split('.');
    await this.transactions.run(async (manager) => {
      const token = await manager.findOneBy(RefreshToken, { id });
      if (!token || !sameHash(token.secretHash, sha256(secret))) return;
      const session = await manager.findOneByOrFail(Session, { id: token.sessionId });
      if (!session.revokedAt) await this.revoke(manager, session, 'logout');
    });
  }

  /** Ends every sign-in of a user (deactivation). */
  async revokeAll(manager: EntityManager, userId: string, reason: string): Promise<void> {
    await manager.update(
      Session,
      { userId, revokedAt: IsNull() },
      { revokedAt: new Date(), revokeReason: reason },
    );
  }

  /** Each user's sign-ins on one device, for checking who may author its operations. */
  async deviceSessions(userIds: string[], deviceId: string): Promise<Map<string, Session[]>> {
    const found = await this.sessions.findBy({ userId: In(userIds), deviceId });
    const byUser = new Map<string, Session[]>();
    for (const session of found)
      byUser.set(session.userId, [...(byUser.get(session.userId) ?? []), session]);
    return byUser;
  }

  /**
   * Ends every sign-in on a device that is lost or stolen. Sign-ins already past their refresh
   * expiry are ended too: one never ended would go on vouching for work said to be recorded on
   * that device. Returns how many were ended.
   */
  async revokeDevice(manager: EntityManager, actorId: string, deviceId: string): Promise<number> {
    const open = await manager.findBy(Session, { deviceId, revokedAt: IsNull() });
    for (const session of open) await this.revoke(manager, session, 'device-revoked', actorId);
    return open.length;
  }

  /** `actorId` is whoever ended the sign-in; by default its own person. */
  private async revoke(
    manager: EntityManager,
    session: Session,
    reason: string,
    actorId = session.userId,
  ): Promise<void> {
    await manager.update(
      Session,
      { id: session.id },
      { revokedAt: new Date(), revokeReason: reason },
    );
    await this.audit.record(manager, actorId, `auth.${reason}`, 'session', session.id, null, {
      revokeReason: reason,
    });
  }

  private async issue(
    manager: EntityManager,
    user: User,
    session: Session,
  ): Promise<SessionTokens> {
    const secret = randomBytes(32).toString('base64url');
    const token: RefreshToken = {
      id: randomUUID(),
      sessionId: session.id,
      secretHash: sha256(secret),
      expiresAt: new Date(Date.now() + REFRESH_MS),
      usedAt: null,
    };
    await manager.insert(RefreshToken, token);
    const claims: AccessClaims = { sub: user.id, sid: session.id, dev: session.deviceId };
    return {
      accessToken: await this.jwt.signAsync(claims, { expiresIn: ACCESS_SECONDS }),
      refreshToken: `${token.id}.${secret}`,
      expiresIn: ACCESS_SECONDS,
      user: publicUser(user),
    };
  }
}

/**
 * Whether a sign-in vouches for work recorded at `at`: it began no later, and it had not been
 * ended before (signing out later does not void earlier work). A sign-in ended because its
 * refresh token was replayed vouches for nothing: someone else may have held it.
 */
export function vouchesFor(sessions: Session[], at: Date): boolean {
  return sessions.some(
    (s) => s.createdAt <= at && (!s.revokedAt || (s.revokeReason !== 'reuse' && s.revokedAt >= at)),
  );
}

function sameHash(a: string, b: string): boolean {
  return a.length === b.length && timingSafeEqual(Buffer.from(a), Buffer.from(b));
}
