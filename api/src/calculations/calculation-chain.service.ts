import type { CalculationDetail } from '@loftwright/contract';
import { ForbiddenException, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { continueInputs, type ContinuationDraft, InputError, KINDS } from '@loftwright/buoyancy';
import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import type { AuthUser } from '../auth/auth-user';
import { insertRow } from '../persistence/insert-row';
import { WriteLock } from '../persistence/write-lock';
import { accountPermissions } from '../users/account-permissions';
import { CalculationVersion } from './calculation-version.entity';
import { Calculation } from './calculation.entity';
import { CalculationsService } from './calculations.service';
import type { ContinueCalculationDto } from './dto/continue-calculation.dto';
import { computeVersionContent, type VersionContent } from './version-content';

const kindTitle = (id: string): string => KINDS.find((kind) => kind.id === id)?.title ?? id;

/** What a continued calculation is made of, before it is written. */
interface Continued {
  readonly source: Calculation;
  readonly versionNumber: number;
  readonly toKind: string;
  readonly draft: ContinuationDraft;
  readonly content: VersionContent;
}

/**
 * The design chain: a saved version of one kind continues as a new calculation of the next kind
 * (sizing → flight profile → rules check), the mapping being the engine's (`continueInputs`).
 */
@Injectable()
export class CalculationChainService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly calculations: CalculationsService,
    private readonly audit: AuditService,
    private readonly writeLock: WriteLock,
  ) {}

  /**
   * Creates the continuation of version `number` of calculation `id` as the caller's, with its
   * version 1 and the audit record in one transaction. Needs the right to create calculations and
   * to read the source; a kind the source does not continue into is refused (422, `toKind`).
   */
  async continueFrom(
    user: AuthUser,
    id: string,
    number: number,
    dto: ContinueCalculationDto,
  ): Promise<CalculationDetail> {
    if (!accountPermissions(user.roles).createCalculations) {
      throw new ForbiddenException({
        message: 'Continuing a calculation creates one, which needs the designer or teacher role.',
      });
    }
    const source = await this.calculations.findReadable(user, id);
    const version = await this.calculations.findVersion(id, number);
    const { draft, content } = asContinuation(dto.toKind, number, () => {
      const made = continueInputs(source.kind, dto.toKind, version.inputs, version.outputs);
      return { draft: made, content: computeVersionContent(dto.toKind, made.inputs) };
    });
    const newId = randomUUID();
    await this.writeLock.transaction((manager) =>
      this.write(manager, user, newId, {
        source,
        versionNumber: number,
        toKind: dto.toKind,
        draft,
        content,
      }),
    );
    return this.calculations.detail(user, newId);
  }

  private async write(
    manager: EntityManager,
    user: AuthUser,
    newId: string,
    continued: Continued,
  ): Promise<void> {
    const { source, versionNumber, toKind, draft } = continued;
    await manager.getRepository(Calculation).insert({
      id: newId,
      title: `${source.title} → ${kindTitle(toKind)}`.slice(0, 200),
      kind: toKind,
      ownerId: user.id,
      visibility: 'private',
      tags: source.tags,
      latestVersion: 1,
      latestStatus: 'draft',
      everSubmitted: false,
      archivedAt: null,
      sourceCalculationId: source.id,
      sourceVersionNumber: versionNumber,
      sourceNeeds: [...draft.needs],
    });
    await insertRow(manager.getRepository(CalculationVersion), {
      id: randomUUID(),
      calculationId: newId,
      number: 1,
      ...continued.content,
      authorId: user.id,
      note: versionNote(continued),
      status: 'draft',
      reviewerId: null,
      submittedAt: null,
    });
    await this.audit.record(
      {
        actorId: user.id,
        action: 'calculation.create',
        targetType: 'calculation',
        targetId: newId,
        detail: { kind: toKind, continuedFrom: { calculationId: source.id, versionNumber } },
      },
      manager,
    );
  }
}

/** Version 1's change note: where it came from, and what is still the kind's example value. */
function versionNote({ source, versionNumber, draft }: Continued): string {
  const needs =
    draft.needs.length > 0
      ? ` Still to fill (they hold the kind’s example values): ${draft.needs.join(', ')}.`
      : '';
  return `Continued from “${source.title}”, version ${versionNumber}.${needs}`.slice(0, 2000);
}

/**
 * The request names only `toKind`: a refusal of the inputs the continuation would make (from the
 * saved source, not from anything sent) is reported on `toKind`, saying which input and why.
 */
function asContinuation<T>(toKind: string, number: number, work: () => T): T {
  try {
    return work();
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    const issue = error.issues[0];
    if (!issue || issue.field === 'toKind' || error.issues.every((i) => i.field === 'toKind')) {
      throw error;
    }
    const title = KINDS.find((kind) => kind.id === toKind)?.title ?? toKind;
    throw new InputError(
      'toKind',
      toKind,
      `version ${number} cannot continue as a ${title}: its ${issue.field} ${issue.reason}`,
    );
  }
}
