import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Calculation } from '../calculations/calculation.entity';
import { FillLog } from '../fill-logs/fill-log.entity';
import { Envelope } from './envelope.entity';
import { EnvelopesController } from './envelopes.controller';
import { EnvelopesService } from './envelopes.service';

/** The team's envelope library; fill logs name its envelopes (EnvelopesService.requireExists). */
@Module({
  imports: [TypeOrmModule.forFeature([Envelope, FillLog, Calculation])],
  controllers: [EnvelopesController],
  providers: [EnvelopesService],
  exports: [EnvelopesService],
})
export class EnvelopesModule {}
