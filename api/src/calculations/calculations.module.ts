import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { UsersModule } from '../users/users.module';
import { CalculationVersion } from './calculation-version.entity';
import { Calculation } from './calculation.entity';
import { CalculationsController } from './calculations.controller';
import { CalculationChainService } from './calculation-chain.service';
import { CalculationTransferService } from './calculation-transfer.service';
import { CalculationsService } from './calculations.service';

@Module({
  imports: [TypeOrmModule.forFeature([Calculation, CalculationVersion]), UsersModule],
  controllers: [CalculationsController],
  providers: [CalculationsService, CalculationTransferService, CalculationChainService],
  exports: [CalculationsService],
})
export class CalculationsModule {}
