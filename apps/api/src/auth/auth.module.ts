import { Module } from '@nestjs/common';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { ThrottlerModule } from '@nestjs/throttler';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module';
import { authConfig, type AuthConfig } from '../config/configuration';
import { MailModule } from '../mail/mail.module';
import { User } from '../users/entities/user.entity';
import { UsersModule } from '../users/users.module';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { RefreshToken } from './entities/refresh-token.entity';
import { JwtStrategy } from './jwt.strategy';
import { MeController } from './me.controller';
import { RefreshTokensService } from './refresh-tokens.service';

@Module({
  imports: [
    TypeOrmModule.forFeature([RefreshToken, User]),
    PassportModule,
    JwtModule.registerAsync({
      inject: [authConfig.KEY],
      useFactory: (config: AuthConfig) => ({
        secret: config.jwtSecret,
        signOptions: { expiresIn: config.accessTtlSeconds, algorithm: 'HS256' },
      }),
    }),
    ThrottlerModule.forRootAsync({
      inject: [authConfig.KEY],
      useFactory: (config: AuthConfig) => ({
        throttlers: [{ name: 'auth', ttl: 60_000, limit: config.rateLimitPerMinute }],
        errorMessage: 'Too many attempts from this address; wait a minute and try again',
      }),
    }),
    UsersModule,
    AuditModule,
    MailModule,
  ],
  controllers: [AuthController, MeController],
  providers: [AuthService, RefreshTokensService, JwtStrategy],
})
export class AuthModule {}
