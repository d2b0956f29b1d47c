import { Module } from '@nestjs/common';
import { CalculationsModule } from '../calculations/calculations.module';
import { ClassroomsModule } from '../classrooms/classrooms.module';
import { FillLogsModule } from '../fill-logs/fill-logs.module';
import { PlansModule } from '../plans/plans.module';
import { ReviewsModule } from '../reviews/reviews.module';
import { UsersModule } from '../users/users.module';
import { WorkedExamplesModule } from '../worked-examples/worked-examples.module';
import { DemoSeedService } from './demo-seed.service';

@Module({
  imports: [
    UsersModule,
    CalculationsModule,
    ReviewsModule,
    FillLogsModule,
    PlansModule,
    ClassroomsModule,
    WorkedExamplesModule,
  ],
  providers: [DemoSeedService],
})
export class SeedModule {}
