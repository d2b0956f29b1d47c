import { Module } from '@nestjs/common';
import { CalculationsModule } from '../calculations/calculations.module';
import { FillLogsModule } from '../fill-logs/fill-logs.module';
import { PlansModule } from '../plans/plans.module';
import { ReviewsModule } from '../reviews/reviews.module';
import { UsersModule } from '../users/users.module';
import { DemoSeedService } from './demo-seed.service';

@Module({
  imports: [UsersModule, CalculationsModule, ReviewsModule, FillLogsModule, PlansModule],
  providers: [DemoSeedService],
})
export class SeedModule {}
