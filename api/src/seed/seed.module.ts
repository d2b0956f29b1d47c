import { Module } from '@nestjs/common';
import { CalculationsModule } from '../calculations/calculations.module';
import { ReviewsModule } from '../reviews/reviews.module';
import { UsersModule } from '../users/users.module';
import { DemoSeedService } from './demo-seed.service';

@Module({
  imports: [UsersModule, CalculationsModule, ReviewsModule],
  providers: [DemoSeedService],
})
export class SeedModule {}
