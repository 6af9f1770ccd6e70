import { createSecretKey } from 'node:crypto';
import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { InjectRepository } from '@nestjs/typeorm';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { Repository } from 'typeorm';
import { User } from '../users/entities/user.entity.js';
import type { AuthUser } from './access.js';
import { Session } from './entities/session.entity.js';
import { JWT_SECRET } from './jwt-secret.js';

export interface AccessClaims {
  sub: string;
  sid: string;
  dev: string | null;
}

@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    @Inject(JWT_SECRET) secret: string,
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectRepository(Session) private readonly sessions: Repository<Session>,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      // A key object made once: given a string, jsonwebtoken first tries it as a PEM public key on
      // every request, and that failed attempt cost about 1 ms each. Its verify takes a KeyObject;
      // passport-jwt's types only know strings and buffers.
      secretOrKey: createSecretKey(Buffer.from(secret)) as unknown as Buffer,
      algorithms: ['HS256'],
    });
  }

  /** Checked on every request so that deactivation, a role change or sign-out apply at once. */
  async validate(claims: AccessClaims): Promise<AuthUser> {
    const [user, session] = await Promise.all([
      this.users.findOneBy({ id: claims.sub }),
      this.sessions.findOneBy({ id: claims.sid }),
    ]);
    if (!user?.active || !session || session.revokedAt || session.userId !== user.id) {
      throw new UnauthorizedException('Sign in again');
    }
    return { ...pick(user), sessionId: session.id, deviceId: session.deviceId };
  }
}

function pick({ id, email, name, role }: User) {
  return { id, email, name, role };
}
