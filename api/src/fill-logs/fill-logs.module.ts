import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AttachmentsModule } from '../attachments/attachments.module';
import { CalculationsModule } from '../calculations/calculations.module';
import { EnvelopesModule } from '../envelopes/envelopes.module';
import { UsersModule } from '../users/users.module';
import { FillLog } from './fill-log.entity';
import { FillLogsController } from './fill-logs.controller';
import { FillLogsService } from './fill-logs.service';

@Module({
  imports: [
    TypeOrmModule.forFeature([FillLog]),
    CalculationsModule,
    AttachmentsModule,
    UsersModule,
    EnvelopesModule,
  ],
  controllers: [FillLogsController],
  providers: [FillLogsService],
  exports: [FillLogsService],
})
export class FillLogsModule {}
