import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { ThrottlerModule } from '@nestjs/throttler';
import { rateLimitThrottlers } from '../common/rate-limit';
import { getDataSourceToken, TypeOrmModule } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import type { EnvironmentVariables } from '../config/env.validation';
import { resolveJwtSecret } from '../config/jwt-secret';
import { ClassroomsModule } from '../classrooms/classrooms.module';
import { WriteLock } from '../persistence/write-lock';
import { MailModule } from '../mail/mail.module';
import { UsersModule } from '../users/users.module';
import { JWT_SECRET } from './auth.constants';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { JwtAuthGuard } from './guards/jwt-auth.guard';
import { RolesGuard } from './guards/roles.guard';
import { PasswordResetToken } from './password-reset-token.entity';
import { PendingRegistration } from './pending-registration.entity';
import { JwtStrategy } from './strategies/jwt.strategy';
import { DatabaseThrottlerStorage } from './database-throttler-storage';

const jwtSecretProvider = {
  provide: JWT_SECRET,
  inject: [ConfigService, getDataSourceToken()],
  useFactory: (
    config: ConfigService<EnvironmentVariables, true>,
    dataSource: DataSource,
  ): Promise<string> =>
    resolveJwtSecret(
      config.get('JWT_SECRET', { infer: true }),
      config.get('DATA_DIR', { infer: true }),
      dataSource,
    ),
};

@Module({
  imports: [
    UsersModule,
    MailModule,
    ClassroomsModule,
    PassportModule,
    TypeOrmModule.forFeature([PasswordResetToken, PendingRegistration]),
    ThrottlerModule.forRootAsync({
      inject: [ConfigService, getDataSourceToken(), WriteLock],
      // Counts live in the database, so every instance behind a load balancer counts the same.
      useFactory: (
        config: ConfigService<EnvironmentVariables, true>,
        dataSource: DataSource,
        writeLock: WriteLock,
      ) => ({
        storage: new DatabaseThrottlerStorage(dataSource, writeLock),
        throttlers: rateLimitThrottlers({
          'sign-in': { limit: config.get('LOGIN_RATE_LIMIT', { infer: true }), windowMs: 60_000 },
          register: {
            limit: config.get('REGISTER_RATE_LIMIT', { infer: true }),
            windowMs: 10 * 60_000,
          },
          'class-join': {
            limit: config.get('CLASS_JOIN_RATE_LIMIT', { infer: true }),
            windowMs: 60_000,
          },
          evaluate: { limit: config.get('EVALUATE_RATE_LIMIT', { infer: true }), windowMs: 60_000 },
        }),
      }),
    }),
    JwtModule.registerAsync({
      inject: [ConfigService, JWT_SECRET],
      extraProviders: [jwtSecretProvider],
      useFactory: (config: ConfigService<EnvironmentVariables, true>, secret: string) => ({
        secret,
        signOptions: { expiresIn: config.get('JWT_TTL_S', { infer: true }), algorithm: 'HS256' },
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [
    AuthService,
    JwtStrategy,
    jwtSecretProvider,
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
  ],
})
export class AuthModule {}
