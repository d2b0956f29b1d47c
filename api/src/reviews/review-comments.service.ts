import type { ReviewComment as ReviewCommentShape } from '@loftwright/contract';
import {
  BadRequestException,
  ConflictException,
  ForbiddenException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { inputFieldInfo, KINDS } from '@loftwright/buoyancy';
import { randomUUID } from 'node:crypto';
import { Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthUser, hasRole } from '../auth/auth-user';
import { canEdit } from '../calculations/calculation-access';
import { CalculationsService } from '../calculations/calculations.service';
import { WriteLock } from '../persistence/write-lock';
import { UsersService } from '../users/users.service';
import type { AddReviewCommentDto } from './dto/review-comment.dto';
import { ReviewComment } from './review-comment.entity';

/** A comment as the calculation page shows it: who, when, on what (by label), open or addressed. */
export type ReviewCommentView = ReviewCommentShape;

@Injectable()
export class ReviewCommentsService {
  constructor(
    @InjectRepository(ReviewComment) private readonly comments: Repository<ReviewComment>,
    private readonly calculations: CalculationsService,
    private readonly users: UsersService,
    private readonly audit: AuditService,
    private readonly writeLock: WriteLock,
  ) {}

  /** A reviewer comments on a version in review that they did not write. */
  async add(
    user: AuthUser,
    calculationId: string,
    number: number,
    dto: AddReviewCommentDto,
  ): Promise<ReviewCommentView> {
    const calculation = await this.calculations.findReadable(user, calculationId);
    const version = await this.calculations.findVersion(calculationId, number);
    if (!hasRole(user, 'reviewer') || version.authorId === user.id) {
      throw new ForbiddenException({
        message: 'Only a reviewer who did not write the version comments on it.',
      });
    }
    if (version.status !== 'in_review') {
      throw new ConflictException({
        message: `Version ${number} is not in review; comments go with a review.`,
        field: 'n',
      });
    }
    const anchor = dto.anchor;
    if (anchor) {
      const known =
        anchor.kind === 'input'
          ? inputFieldInfo(
              KINDS.find((kind) => kind.id === calculation.kind)?.inputSchema,
              anchor.path,
            ) !== undefined
          : Object.hasOwn(version.outputs as Record<string, unknown>, anchor.path);
      if (!known) {
        throw new BadRequestException({
          message: `anchor.path: this ${anchor.kind === 'input' ? 'calculation has no input' : 'version has no result'} ${anchor.path}`,
          field: 'anchor.path',
        });
      }
    }
    const comment = this.comments.create({
      id: randomUUID(),
      calculationId,
      versionNumber: number,
      authorId: user.id,
      anchorKind: anchor?.kind ?? null,
      anchorPath: anchor?.path ?? null,
      body: dto.body.trim(),
      addressedInVersion: null,
      addressedBy: null,
      addressedAt: null,
    });
    await this.writeLock.transaction(async (manager) => {
      await manager.getRepository(ReviewComment).insert(comment);
      await this.audit.record(
        {
          actorId: user.id,
          action: 'comment.add',
          targetType: 'calculation',
          targetId: calculationId,
          detail: {
            commentId: comment.id,
            number,
            anchor: anchor ? `${anchor.kind}:${anchor.path}` : null,
          },
        },
        manager,
      );
    });
    const stored = await this.comments.findOneByOrFail({ id: comment.id });
    return (await this.views(calculation.kind, [stored], version.outputs))[0] as ReviewCommentView;
  }

  /** Every comment on the calculation, oldest first, to anyone who may read it. */
  async list(user: AuthUser, calculationId: string): Promise<ReviewCommentView[]> {
    const calculation = await this.calculations.findReadable(user, calculationId);
    const comments = await this.comments.find({
      where: { calculationId },
      order: { createdAt: 'ASC' },
    });
    const latest = await this.calculations.findVersion(calculationId, calculation.latestVersion);
    return this.views(calculation.kind, comments, latest.outputs);
  }

  /** The owner says a later version addresses a comment ("addressed in version 4"). */
  async markAddressed(
    user: AuthUser,
    commentId: string,
    versionNumber: number,
  ): Promise<ReviewCommentView> {
    const comment = await this.comments.findOneBy({ id: commentId });
    if (!comment) throw new NotFoundException({ message: 'No such comment.', field: 'id' });
    const calculation = await this.calculations.findReadable(user, comment.calculationId);
    if (!canEdit(user, calculation)) {
      throw new ForbiddenException({
        message: 'Only the owner of the calculation marks a comment addressed.',
      });
    }
    if (versionNumber <= comment.versionNumber || versionNumber > calculation.latestVersion) {
      throw new BadRequestException({
        message: `versionNumber must be a saved version after ${comment.versionNumber} (at most ${calculation.latestVersion})`,
        field: 'versionNumber',
      });
    }
    await this.writeLock.transaction(async (manager) => {
      await manager
        .getRepository(ReviewComment)
        .update(
          { id: commentId },
          { addressedInVersion: versionNumber, addressedBy: user.id, addressedAt: new Date() },
        );
      await this.audit.record(
        {
          actorId: user.id,
          action: 'comment.addressed',
          targetType: 'calculation',
          targetId: calculation.id,
          detail: { commentId, number: versionNumber },
        },
        manager,
      );
    });
    const stored = await this.comments.findOneByOrFail({ id: commentId });
    const latest = await this.calculations.findVersion(calculation.id, calculation.latestVersion);
    return (await this.views(calculation.kind, [stored], latest.outputs))[0] as ReviewCommentView;
  }

  private async views(
    kind: string,
    comments: ReviewComment[],
    outputs: unknown,
  ): Promise<ReviewCommentView[]> {
    const names = await this.users.names(comments.flatMap((c) => [c.authorId, c.addressedBy]));
    const schema = KINDS.find((candidate) => candidate.id === kind)?.inputSchema;
    const results = (outputs ?? {}) as Record<string, { label?: string }>;
    return comments.map((comment) => ({
      id: comment.id,
      versionNumber: comment.versionNumber,
      author: names(comment.authorId),
      anchor:
        comment.anchorKind && comment.anchorPath
          ? {
              kind: comment.anchorKind,
              path: comment.anchorPath,
              label:
                comment.anchorKind === 'input'
                  ? (inputFieldInfo(schema, comment.anchorPath)?.label ?? comment.anchorPath)
                  : (results[comment.anchorPath]?.label ?? comment.anchorPath),
            }
          : null,
      body: comment.body,
      createdAt: new Date(comment.createdAt).toISOString(),
      addressed:
        comment.addressedInVersion !== null
          ? {
              versionNumber: comment.addressedInVersion,
              by: names(comment.addressedBy),
              at: new Date(comment.addressedAt ?? comment.createdAt).toISOString(),
            }
          : null,
    }));
  }
}
