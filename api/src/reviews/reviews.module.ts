import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CalculationVersion } from '../calculations/calculation-version.entity';
import { Calculation } from '../calculations/calculation.entity';
import { CalculationsModule } from '../calculations/calculations.module';
import { MailModule } from '../mail/mail.module';
import { SignOffModule } from '../sign-off/sign-off.module';
import { User } from '../users/user.entity';
import { UsersModule } from '../users/users.module';
import { Review } from './review.entity';
import { ReviewComment } from './review-comment.entity';
import { ReviewCommentsService } from './review-comments.service';
import { ReviewsController } from './reviews.controller';
import { ReviewsService } from './reviews.service';
import { VerifyController } from './verify.controller';
import { VerifyService } from './verify.service';

@Module({
  imports: [
    TypeOrmModule.forFeature([Review, ReviewComment, CalculationVersion, Calculation, User]),
    CalculationsModule,
    UsersModule,
    MailModule,
    SignOffModule,
  ],
  controllers: [ReviewsController, VerifyController],
  providers: [ReviewsService, ReviewCommentsService, VerifyService],
  exports: [ReviewsService],
})
export class ReviewsModule {}
