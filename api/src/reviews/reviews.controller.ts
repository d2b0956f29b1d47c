import type { ReviewQueueItem, ReviewedVersion, VersionDetail } from '@loftwright/contract';
import { Body, Controller, Get, HttpCode, HttpStatus, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { RequestOrigin } from '../common/public-url';
import { intParam } from '../common/pipes/int-param.pipe';
import { uuidParam } from '../common/pipes/uuid-param.pipe';
import { ApproveVersionDto, SendBackVersionDto, SubmitVersionDto } from './dto/review-decision.dto';
import { AddReviewCommentDto, MarkAddressedDto } from './dto/review-comment.dto';
import { ReviewCommentsService, type ReviewCommentView } from './review-comments.service';
import { ReviewsService } from './reviews.service';

@ApiTags('reviews')
@ApiBearerAuth()
@Controller()
export class ReviewsController {
  constructor(
    private readonly reviewsService: ReviewsService,
    private readonly comments: ReviewCommentsService,
  ) {}

  @Post('calculations/:id/versions/:n/submit')
  @HttpCode(HttpStatus.OK)
  submit(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('n', intParam('n')) n: number,
    @Body() body: SubmitVersionDto,
  ): Promise<VersionDetail> {
    return this.reviewsService.submit(user, id, n, body.reviewerId);
  }

  @Post('calculations/:id/versions/:n/approve')
  @HttpCode(HttpStatus.OK)
  approve(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('n', intParam('n')) n: number,
    @Body() body: ApproveVersionDto,
    @RequestOrigin() origin: string,
  ): Promise<ReviewedVersion> {
    return this.reviewsService.approve(user, id, n, body.comment ?? '', origin, body.timeZone);
  }

  @Post('calculations/:id/versions/:n/send-back')
  @HttpCode(HttpStatus.OK)
  sendBack(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('n', intParam('n')) n: number,
    @Body() body: SendBackVersionDto,
    @RequestOrigin() origin: string,
  ): Promise<ReviewedVersion> {
    return this.reviewsService.sendBack(user, id, n, body.comment, origin);
  }

  @Get('calculations/:id/versions/:n/reviews')
  reviews(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('n', intParam('n')) n: number,
    @RequestOrigin() origin: string,
  ): Promise<ReviewedVersion> {
    return this.reviewsService.versionWithReviews(user, id, n, origin);
  }

  /** A reviewer's comment on a version in review, on one input or result or on the whole. */
  @Post('calculations/:id/versions/:n/comments')
  addComment(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('n', intParam('n')) n: number,
    @Body() body: AddReviewCommentDto,
  ): Promise<ReviewCommentView> {
    return this.comments.add(user, id, n, body);
  }

  /** Every review comment on a calculation, oldest first, open and addressed. */
  @Get('calculations/:id/comments')
  listComments(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
  ): Promise<ReviewCommentView[]> {
    return this.comments.list(user, id);
  }

  /** The owner marks a comment addressed by a later version. */
  @Post('comments/:id/addressed')
  @HttpCode(HttpStatus.OK)
  markAddressed(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Body() body: MarkAddressedDto,
  ): Promise<ReviewCommentView> {
    return this.comments.markAddressed(user, id, body.versionNumber);
  }

  /** Who may be asked for a review (people with the reviewer role, not the asker). */
  @Get('reviewers')
  reviewers(@CurrentUser() user: AuthUser): Promise<{ id: string; displayName: string }[]> {
    return this.reviewsService.reviewers(user);
  }

  @Get('reviews/queue')
  @Roles('reviewer')
  queue(@CurrentUser() user: AuthUser): Promise<ReviewQueueItem[]> {
    return this.reviewsService.queue(user);
  }
}
