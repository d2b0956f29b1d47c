import type { ReviewQueueItem, ReviewedVersion, VersionDetail } from '@loftwright/contract';
import {
  BadRequestException,
  ConflictException,
  ForbiddenException,
  Injectable,
} from '@nestjs/common';
import { configuredBaseUrl, publicBaseUrl, verifyUrl } from '../common/public-url';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthUser, hasRole } from '../auth/auth-user';
import { CalculationVersion, type VersionStatus } from '../calculations/calculation-version.entity';
import { Calculation } from '../calculations/calculation.entity';
import { CalculationsService } from '../calculations/calculations.service';
import type { EnvironmentVariables } from '../config/env.validation';
import { WriteLock } from '../persistence/write-lock';
import { decisionMail, submittedMail } from '../mail/mail-templates';
import { MailService } from '../mail/mail.service';
import { SignOffService } from '../sign-off/sign-off.service';
import { UsersService } from '../users/users.service';
import { Review, type ReviewDecision } from './review.entity';

@Injectable()
export class ReviewsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @InjectRepository(CalculationVersion) private readonly versions: Repository<CalculationVersion>,
    @InjectRepository(Review) private readonly reviews: Repository<Review>,
    private readonly calculationsService: CalculationsService,
    private readonly usersService: UsersService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly writeLock: WriteLock,
    private readonly config: ConfigService<EnvironmentVariables, true>,
    private readonly signOff: SignOffService,
  ) {}

  private link(calculationId: string, number: number): string {
    return `${configuredBaseUrl(this.config)}/calculations/${calculationId}/versions/${number}`;
  }

  async submit(
    user: AuthUser,
    id: string,
    number: number,
    reviewerId: string | undefined,
  ): Promise<VersionDetail> {
    const calculation = await this.calculationsService.findReadable(user, id);
    const version = await this.calculationsService.findVersion(id, number);
    if (version.authorId !== user.id && calculation.ownerId !== user.id) {
      throw new ForbiddenException({ message: 'Only the author submits a version for review.' });
    }
    if (version.status !== 'draft') {
      throw new ConflictException({
        message: `Version ${number} is ${version.status.replace('_', ' ')}; only a draft can be submitted.`,
        field: 'n',
      });
    }
    let reviewers = await this.usersService.listByRole('reviewer');
    if (reviewerId) {
      const named = reviewers.find((candidate) => candidate.id === reviewerId);
      if (!named)
        throw new BadRequestException({
          message: 'reviewerId must be a user with the reviewer role.',
          field: 'reviewerId',
        });
      if (named.id === version.authorId)
        throw new BadRequestException({
          message: 'Authors cannot review their own version.',
          field: 'reviewerId',
        });
      reviewers = [named];
    }
    await this.writeLock.run(() =>
      this.dataSource.transaction(async (manager) => {
        const moved = await manager
          .getRepository(CalculationVersion)
          .update(
            { id: version.id, status: 'draft' },
            { status: 'in_review', reviewerId: reviewerId ?? null, submittedAt: new Date() },
          );
        if (moved.affected !== 1)
          throw new ConflictException({
            message: `Version ${number} is no longer a draft.`,
            field: 'n',
          });
        await this.syncLatestStatus(
          manager.getRepository(Calculation),
          calculation,
          number,
          'in_review',
          true,
        );
        await this.audit.record(
          {
            actorId: user.id,
            action: 'version.submit',
            targetType: 'calculation_version',
            targetId: version.id,
            detail: { calculationId: id, number, reviewerId: reviewerId ?? null },
          },
          manager,
        );
      }),
    );
    const author = await this.usersService.findById(version.authorId);
    if (author) {
      this.mail.send(
        submittedMail(
          reviewers.filter((reviewer) => reviewer.id !== author.id),
          author,
          { title: calculation.title, number, link: this.link(id, number) },
        ),
      );
    }
    return this.calculationsService.version(user, id, number);
  }

  approve(
    user: AuthUser,
    id: string,
    number: number,
    comment: string,
    origin: string,
    approverTimeZone?: string,
  ): Promise<ReviewedVersion> {
    return this.decide(user, id, number, 'approved', comment, origin, approverTimeZone);
  }

  sendBack(
    user: AuthUser,
    id: string,
    number: number,
    comment: string,
    origin: string,
  ): Promise<ReviewedVersion> {
    return this.decide(user, id, number, 'changes_requested', comment, origin);
  }

  /** Where people reach the product, for links printed on sheets. */
  private baseUrl(origin: string): string {
    return publicBaseUrl(this.config.get('PUBLIC_URL', { infer: true }), origin);
  }

  private async decide(
    user: AuthUser,
    id: string,
    number: number,
    decision: ReviewDecision,
    comment: string,
    origin: string,
    approverTimeZone?: string,
  ): Promise<ReviewedVersion> {
    if (!hasRole(user, 'reviewer'))
      throw new ForbiddenException({ message: 'Reviewing needs the reviewer role.' });
    const calculation = await this.calculationsService.findReadable(user, id);
    const version = await this.calculationsService.findVersion(id, number);
    if (version.authorId === user.id)
      throw new ForbiddenException({ message: 'Authors cannot review their own version.' });
    if (version.reviewerId && version.reviewerId !== user.id) {
      throw new ForbiddenException({
        message: 'Another reviewer was asked to review this version.',
      });
    }
    if (version.status !== 'in_review') {
      throw new ConflictException({
        message: `Version ${number} is not waiting for review (it is ${version.status.replace('_', ' ')}).`,
        field: 'n',
      });
    }
    await this.writeLock.run(() =>
      this.dataSource.transaction(async (manager) => {
        const moved = await manager
          .getRepository(CalculationVersion)
          .update({ id: version.id, status: 'in_review' }, { status: decision });
        if (moved.affected !== 1)
          throw new ConflictException({
            message: `Version ${number} was decided by someone else just now.`,
            field: 'n',
          });
        await manager.getRepository(Review).insert({
          id: randomUUID(),
          versionId: version.id,
          reviewerId: user.id,
          decision,
          comment,
          fingerprint: version.fingerprint,
          calculationTitle: calculation.title,
        });
        await this.syncLatestStatus(
          manager.getRepository(Calculation),
          calculation,
          number,
          decision,
          false,
        );
        await this.audit.record(
          {
            actorId: user.id,
            action: decision === 'approved' ? 'version.approve' : 'version.send-back',
            targetType: 'calculation_version',
            targetId: version.id,
            detail: { calculationId: id, number, fingerprint: version.fingerprint },
          },
          manager,
        );
      }),
    );
    const author = await this.usersService.findById(version.authorId);
    const sheet =
      decision === 'approved'
        ? await this.signOff.archiveApproved(
            calculation,
            version,
            {
              author: author?.displayName ?? 'unknown',
              reviewerId: user.id,
              reviewer: user.displayName,
            },
            comment,
            new Date(),
            verifyUrl(this.baseUrl(origin), version.fingerprint),
            approverTimeZone,
          )
        : undefined;
    if (author) {
      const message = decisionMail(
        author,
        user,
        { title: calculation.title, number, link: this.link(id, number) },
        decision === 'approved',
        comment || '(none)',
      );
      this.mail.send(
        sheet
          ? {
              ...message,
              attachments: [
                {
                  filename: sheet.attachment.fileName,
                  content: sheet.bytes,
                  contentType: 'application/pdf',
                },
              ],
            }
          : message,
      );
    }
    return this.versionWithReviews(user, id, number, origin);
  }

  private async syncLatestStatus(
    calculations: Repository<Calculation>,
    calculation: Calculation,
    number: number,
    status: VersionStatus,
    submitted: boolean,
  ) {
    const changes: Partial<Calculation> = submitted ? { everSubmitted: true } : {};
    const latest = await calculations.findOneByOrFail({ id: calculation.id });
    if (latest.latestVersion === number) changes.latestStatus = status;
    if (Object.keys(changes).length > 0) await calculations.update({ id: calculation.id }, changes);
  }

  async versionWithReviews(
    user: AuthUser,
    id: string,
    number: number,
    origin: string,
  ): Promise<ReviewedVersion> {
    const version = await this.calculationsService.version(user, id, number);
    const stored = await this.calculationsService.findVersion(id, number);
    const reviews = await this.reviews.find({
      where: { versionId: stored.id },
      order: { createdAt: 'ASC' },
    });
    const names = await this.usersService.names(reviews.map((review) => review.reviewerId));
    return {
      ...version,
      /** The verify page of this version's fingerprint, with host, as the sheet prints it. */
      verifyUrl: verifyUrl(this.baseUrl(origin), version.fingerprint),
      reviews: reviews.map((review) => ({
        reviewer: names(review.reviewerId),
        decision: review.decision,
        comment: review.comment,
        fingerprint: review.fingerprint,
        calculationTitle: review.calculationTitle,
        createdAt: new Date(review.createdAt).toISOString(),
      })),
    };
  }

  /** People a version can be submitted to: every reviewer but the one asking, by name. */
  async reviewers(user: AuthUser): Promise<{ id: string; displayName: string }[]> {
    const reviewers = await this.usersService.listByRole('reviewer');
    return reviewers
      .filter((reviewer) => reviewer.id !== user.id)
      .map((reviewer) => ({ id: reviewer.id, displayName: reviewer.displayName }))
      .sort((a, b) => a.displayName.localeCompare(b.displayName));
  }

  /** Versions waiting for this reviewer: asked of them by name, or left open, and not their own. */
  async queue(user: AuthUser): Promise<ReviewQueueItem[]> {
    const waiting = await this.versions
      .createQueryBuilder('version')
      .innerJoin(Calculation, 'calculation', 'calculation.id = version.calculation_id')
      .select(['version', 'calculation.title', 'calculation.kind'])
      .addSelect('calculation.title', 'title')
      .addSelect('calculation.kind', 'kind')
      .where(`version.status = 'in_review'`)
      .andWhere('calculation.archived_at IS NULL')
      .andWhere('version.author_id != :me', { me: user.id })
      .andWhere('(version.reviewer_id IS NULL OR version.reviewer_id = :me)', { me: user.id })
      .orderBy('version.submitted_at', 'ASC')
      .getRawAndEntities();
    const names = await this.usersService.names(
      waiting.entities.flatMap((version) => [version.authorId, version.reviewerId]),
    );
    return waiting.entities.map((version, index) => ({
      calculationId: version.calculationId,
      title: String(waiting.raw[index]?.title ?? ''),
      kind: String(waiting.raw[index]?.kind ?? ''),
      number: version.number,
      author: names(version.authorId),
      reviewer: names(version.reviewerId),
      submittedAt: version.submittedAt ? new Date(version.submittedAt).toISOString() : null,
      fingerprint: version.fingerprint,
    }));
  }
}
