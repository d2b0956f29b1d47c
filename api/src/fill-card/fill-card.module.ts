import { Module } from '@nestjs/common';
import { CalculationsModule } from '../calculations/calculations.module';
import { FillCardController } from './fill-card.controller';
import { FillCardService } from './fill-card.service';

/** The crew's fill card of a saved sizing or flight version, as JSON and as a printable PDF. */
@Module({
  imports: [CalculationsModule],
  controllers: [FillCardController],
  providers: [FillCardService],
})
export class FillCardModule {}
