import { Module } from '@nestjs/common';
import { CalculationsModule } from '../calculations/calculations.module';
import { FlightExportsController } from './flight-exports.controller';
import { FlightExportsService } from './flight-exports.service';

@Module({
  imports: [CalculationsModule],
  controllers: [FlightExportsController],
  providers: [FlightExportsService],
})
export class FlightExportsModule {}
