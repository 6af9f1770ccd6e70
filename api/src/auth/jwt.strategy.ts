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
      secretOrKey: secret,
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
