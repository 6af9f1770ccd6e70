import { Module, type DynamicModule } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { TypeOrmModule } from '@nestjs/typeorm';
import { User } from '../users/entities/user.entity.js';
import { AccessGuard } from './access.guard.js';
import { AuthController } from './auth.controller.js';
import { AuthService } from './auth.service.js';
import { RefreshToken } from './entities/refresh-token.entity.js';
import { Session } from './entities/session.entity.js';
import { JWT_SECRET } from './jwt-secret.js';
import { JwtStrategy } from './jwt.strategy.js';
import { LoginThrottle } from './login-throttle.js';

@Module({})
export class AuthModule {
  static forRoot(secret: string): DynamicModule {
    return {
      module: AuthModule,
      global: true,
      imports: [
        PassportModule,
        JwtModule.register({ secret, signOptions: { algorithm: 'HS256' } }),
        TypeOrmModule.forFeature([User, Session, RefreshToken]),
      ],
      controllers: [AuthController],
      providers: [
        { provide: JWT_SECRET, useValue: secret },
        AuthService,
        JwtStrategy,
        LoginThrottle,
        { provide: APP_GUARD, useClass: AccessGuard },
      ],
      exports: [AuthService],
    };
  }
}
