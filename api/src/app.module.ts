import { Module } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AttachmentsModule } from './attachments/attachments.module';
import { AuditModule } from './audit/audit.module';
import { AuthModule } from './auth/auth.module';
import { CalculationsModule } from './calculations/calculations.module';
import { ClassroomsModule } from './classrooms/classrooms.module';
import { ClientConfigModule } from './client-config/client-config.module';
import { EnvironmentVariables, validateEnvironment } from './config/env.validation';
import { PersistenceModule } from './persistence/persistence.module';
import { buildDataSourceOptions } from './database/database.options';
import { EnvelopesModule } from './envelopes/envelopes.module';
import { EvaluateModule } from './evaluate/evaluate.module';
import { FillCardModule } from './fill-card/fill-card.module';
import { FillLogsModule } from './fill-logs/fill-logs.module';
import { FlightExportsModule } from './flight-exports/flight-exports.module';
import { HealthModule } from './health/health.module';
import { MailModule } from './mail/mail.module';
import { PlansModule } from './plans/plans.module';
import { ReviewsModule } from './reviews/reviews.module';
import { SeedModule } from './seed/seed.module';
import { UsersModule } from './users/users.module';
import { WorkedExamplesModule } from './worked-examples/worked-examples.module';

@Module({
  imports: [
    ConfigModule.forRoot({ isGlobal: true, ignoreEnvFile: true, validate: validateEnvironment }),
    TypeOrmModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<EnvironmentVariables, true>) =>
        buildDataSourceOptions(config.get('DATA_DIR', { infer: true })),
    }),
    PersistenceModule,
    AuditModule,
    MailModule,
    UsersModule,
    AuthModule,
    CalculationsModule,
    ReviewsModule,
    AttachmentsModule,
    FillLogsModule,
    FillCardModule,
    EnvelopesModule,
    PlansModule,
    ClassroomsModule,
    WorkedExamplesModule,
    EvaluateModule,
    FlightExportsModule,
    HealthModule,
    ClientConfigModule,
    SeedModule,
  ],
})
export class AppModule {}
