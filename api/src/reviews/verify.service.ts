import type { OutputComparison, Verification } from '@loftwright/contract';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { ENGINE_VERSION, evaluate, type OutputQuantity, sameResult } from '@loftwright/buoyancy';
import { Repository } from 'typeorm';
import type { AuthUser } from '../auth/auth-user';
import { canRead } from '../calculations/calculation-access';
import { CalculationVersion } from '../calculations/calculation-version.entity';
import { Calculation } from '../calculations/calculation.entity';
import { User } from '../users/user.entity';
import { Review } from './review.entity';

export type { OutputComparison } from '@loftwright/contract';

@Injectable()
export class VerifyService {
  constructor(
    @InjectRepository(CalculationVersion) private readonly versions: Repository<CalculationVersion>,
    @InjectRepository(Calculation) private readonly calculations: Repository<Calculation>,
    @InjectRepository(Review) private readonly reviews: Repository<Review>,
    @InjectRepository(User) private readonly users: Repository<User>,
  ) {}

  /**
   * Whether a fingerprint belongs to an approved version, by whom and when it was approved, and
   * whether the engine running now still gives the same outputs from the stored inputs.
   */
  async verify(fingerprint: string, reader?: AuthUser): Promise<Verification> {
    // Identical content has an identical fingerprint, so several approvals may share one.
    const approvedVersions = await this.versions.findBy({ fingerprint, status: 'approved' });
    if (approvedVersions.length === 0) {
      return {
        fingerprint,
        match: false as const,
        message: 'No approved version has this fingerprint.',
      };
    }
    const approvals = await Promise.all(
      approvedVersions.map(async (candidate) => {
        const [calculation, review] = await Promise.all([
          this.calculations.findOneByOrFail({ id: candidate.calculationId }),
          this.reviews.findOneOrFail({
            where: { versionId: candidate.id, decision: 'approved' },
            order: { createdAt: 'DESC' },
          }),
        ]);
        const reviewer = await this.users.findOneBy({ id: review.reviewerId });
        return { version: candidate, calculation, review, reviewer };
      }),
    );
    approvals.sort(
      (a, b) => new Date(b.review.createdAt).getTime() - new Date(a.review.createdAt).getTime(),
    );
    const { version, calculation, review, reviewer } = approvals[0] as (typeof approvals)[number];
    const stored = version.outputs as Record<string, OutputQuantity>;
    let recomputed: Record<string, OutputQuantity> = {};
    let recomputeError: string | null = null;
    try {
      recomputed = evaluate(calculation.kind, version.inputs).outputs;
    } catch (error) {
      recomputeError = error instanceof Error ? error.message : String(error);
    }
    const names = [...new Set([...Object.keys(stored), ...Object.keys(recomputed)])].sort();
    const differences: OutputComparison[] = names
      .filter((name) => !sameResult(stored[name]?.value, recomputed[name]?.value))
      .map((name) => {
        const approved = stored[name]?.value ?? null;
        const now = recomputed[name]?.value ?? null;
        return {
          name,
          label: (stored[name] ?? recomputed[name])?.label ?? name,
          unit: (stored[name] ?? recomputed[name])?.unit ?? '',
          approved,
          recomputed: now,
          relativeChange:
            approved !== null && now !== null && approved !== 0
              ? (now - approved) / Math.abs(approved)
              : null,
        };
      });
    // Anyone holding the fingerprint learns that it was approved, by whom, when and whether it
    // still computes the same; which calculation it is (its id, title and the reviewer's comment)
    // only a reader who may open that calculation learns. The title is the one approved.
    const readable = (candidate: Calculation) => reader !== undefined && canRead(reader, candidate);
    const identity = (candidate: Calculation, decision: Review) =>
      readable(candidate)
        ? { id: candidate.id, title: decision.calculationTitle ?? candidate.title }
        : null;
    return {
      fingerprint,
      match: true as const,
      calculation: {
        ...identity(calculation, review),
        kind: calculation.kind,
      },
      version: version.number,
      approvedBy: reviewer ? { id: reviewer.id, displayName: reviewer.displayName } : null,
      approvedAt: new Date(review.createdAt).toISOString(),
      comment: readable(calculation) ? review.comment : null,
      engineVersionAtApproval: version.engineVersion,
      currentEngineVersion: ENGINE_VERSION,
      reproduces: recomputeError === null && differences.length === 0,
      differences,
      recomputeError,
      approvals: approvals.map((approval) => ({
        calculation: identity(approval.calculation, approval.review),
        version: approval.version.number,
        approvedBy: approval.reviewer
          ? { id: approval.reviewer.id, displayName: approval.reviewer.displayName }
          : null,
        approvedAt: new Date(approval.review.createdAt).toISOString(),
      })),
    };
  }
}
