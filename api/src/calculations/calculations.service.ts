import type {
  CalculationDetail,
  CalculationListItem,
  CalculationPage,
  VersionDetail,
  VersionDiff,
} from '@loftwright/contract';
import {
  ConflictException,
  ForbiddenException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthUser, hasRole } from '../auth/auth-user';
import { insertRow } from '../persistence/insert-row';
import { WriteLock } from '../persistence/write-lock';
import { AUTHOR_ROLES, TEAM_ROLES } from '../users/roles';
import { UsersService } from '../users/users.service';
import { calculationPermissions, canArchive, canEdit, canRead } from './calculation-access';
import { CalculationVersion } from './calculation-version.entity';
import { readLinks, sourceChangesOnSave } from './calculation-links';
import { calculationSummary, versionDetail, versionSummary } from './calculation-views';
import { Calculation } from './calculation.entity';
import type { CreateCalculationDto } from './dto/create-calculation.dto';
import type { ListCalculationsDto } from './dto/list-calculations.dto';
import type { SaveVersionDto } from './dto/save-version.dto';
import type { UpdateCalculationDto } from './dto/update-calculation.dto';
import { computeVersionContent } from './version-content';
import { diffInputs, diffOutputs } from '@loftwright/buoyancy';
import { containsIgnoringCase, jsonArrayContains } from '../database/sql-dialect';

const SORT_COLUMNS: Record<string, string> = {
  updatedAt: 'calculation.updated_at',
  createdAt: 'calculation.created_at',
  title: 'calculation.title',
  kind: 'calculation.kind',
  status: 'calculation.latest_status',
};

@Injectable()
export class CalculationsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @InjectRepository(Calculation) private readonly calculations: Repository<Calculation>,
    @InjectRepository(CalculationVersion) private readonly versions: Repository<CalculationVersion>,
    private readonly users: UsersService,
    private readonly audit: AuditService,
    private readonly writeLock: WriteLock,
  ) {}

  /** The calculation if the user may see it; otherwise 404, so its existence does not leak. */
  async findReadable(user: AuthUser, id: string): Promise<Calculation> {
    const calculation = await this.calculations.findOneBy({ id });
    if (!calculation || !canRead(user, calculation)) {
      throw new NotFoundException({ message: 'No such calculation.', field: 'id' });
    }
    return calculation;
  }

  async findVersion(calculationId: string, number: number): Promise<CalculationVersion> {
    const version = await this.versions.findOneBy({ calculationId, number });
    if (!version)
      throw new NotFoundException({ message: `Version ${number} does not exist.`, field: 'n' });
    return version;
  }

  async create(user: AuthUser, dto: CreateCalculationDto): Promise<CalculationDetail> {
    if (!hasRole(user, ...AUTHOR_ROLES)) {
      throw new ForbiddenException({
        message: 'Creating calculations needs the designer or teacher role.',
      });
    }
    const content = computeVersionContent(dto.kind, dto.inputs);
    const calculationId = randomUUID();
    await this.writeLock.run(() =>
      this.dataSource.transaction(async (manager) => {
        await manager.getRepository(Calculation).insert({
          id: calculationId,
          title: dto.title.trim(),
          kind: dto.kind,
          ownerId: user.id,
          visibility: dto.visibility ?? 'private',
          tags: [...new Set(dto.tags ?? [])],
          latestVersion: 1,
          latestStatus: 'draft',
          everSubmitted: false,
          archivedAt: null,
        });
        await insertRow(manager.getRepository(CalculationVersion), {
          id: randomUUID(),
          calculationId,
          number: 1,
          ...content,
          authorId: user.id,
          note: dto.note ?? '',
          status: 'draft',
          reviewerId: null,
          submittedAt: null,
        });
        await this.audit.record(
          {
            actorId: user.id,
            action: 'calculation.create',
            targetType: 'calculation',
            targetId: calculationId,
            detail: { kind: dto.kind },
          },
          manager,
        );
      }),
    );
    return this.detail(user, calculationId);
  }

  async list(user: AuthUser, query: ListCalculationsDto): Promise<CalculationPage> {
    const builder = this.calculations.createQueryBuilder('calculation');
    if (!hasRole(user, 'admin')) {
      builder.andWhere('calculation.archived_at IS NULL');
      const visible = ['calculation.owner_id = :me', `calculation.visibility = 'published'`];
      if (hasRole(user, ...TEAM_ROLES)) visible.push(`calculation.visibility = 'team'`);
      if (hasRole(user, 'reviewer')) visible.push('calculation.ever_submitted = TRUE');
      builder.andWhere(`(${visible.join(' OR ')})`, { me: user.id });
    }
    if (query.kind) builder.andWhere('calculation.kind = :kind', { kind: query.kind });
    if (query.status)
      builder.andWhere('calculation.latest_status = :status', { status: query.status });
    if (query.owner)
      builder.andWhere('calculation.owner_id = :owner', {
        owner: query.owner === 'me' ? user.id : query.owner,
      });
    if (query.tag) {
      builder.andWhere(jsonArrayContains('calculation.tags', 'tag'), { tag: query.tag });
    }
    if (query.q) {
      const words = query.q.trim().split(/\s+/).filter(Boolean).slice(0, 8);
      words.forEach((word, index) => {
        builder.andWhere(
          `(${containsIgnoringCase('calculation.title', `q${index}`)} OR ${containsIgnoringCase('calculation.tags', `q${index}`)})`,
          {
            [`q${index}`]: `%${word.replace(/[\\%_]/g, (c) => `\\${c}`)}%`,
          },
        );
      });
    }
    const descending = query.sort.startsWith('-');
    const column = SORT_COLUMNS[query.sort.replace(/^-/, '')] ?? 'calculation.updated_at';
    builder.orderBy(column, descending ? 'DESC' : 'ASC').addOrderBy('calculation.id', 'ASC');
    const [items, total] = await builder
      .skip((query.page - 1) * query.pageSize)
      .take(query.pageSize)
      .getManyAndCount();
    const names = await this.users.names(items.map((item) => item.ownerId));
    return {
      items: items.map((item) => ({
        ...calculationSummary(item, names),
        // What the signed-in user may do with the row; the web shows its actions from this.
        permissions: { archive: canArchive(user, item) },
      })),
      total,
      page: query.page,
      pageSize: query.pageSize,
    };
  }

  async detail(user: AuthUser, id: string): Promise<CalculationDetail> {
    const calculation = await this.findReadable(user, id);
    const versions = await this.versions.find({
      where: { calculationId: id },
      order: { number: 'ASC' },
    });
    const latest = versions.at(-1);
    const names = await this.users.names([
      calculation.ownerId,
      ...versions.flatMap((v) => [v.authorId, v.reviewerId]),
    ]);
    return {
      ...calculationSummary(calculation, names),
      versions: versions.map((version) => versionSummary(version, names)),
      latest: latest ? versionDetail(latest, names) : null,
      permissions: calculationPermissions(user, calculation, latest),
      ...(await readLinks(this.calculations, user, calculation)),
    };
  }

  /** Every calculation the list's filters match for this user, in its order, at most `limit`. */
  async listAll(
    user: AuthUser,
    query: ListCalculationsDto,
    limit: number,
  ): Promise<CalculationListItem[]> {
    const rows: Awaited<ReturnType<CalculationsService['list']>>['items'] = [];
    for (let page = 1; rows.length < limit; page += 1) {
      const { items } = await this.list(user, { ...query, page, pageSize: 500 });
      rows.push(...items);
      if (items.length < 500) break;
    }
    return rows.slice(0, limit);
  }

  async version(user: AuthUser, id: string, number: number): Promise<VersionDetail> {
    await this.findReadable(user, id);
    const version = await this.findVersion(id, number);
    const names = await this.users.names([version.authorId, version.reviewerId]);
    return versionDetail(version, names);
  }

  async saveVersion(user: AuthUser, id: string, dto: SaveVersionDto): Promise<VersionDetail> {
    const calculation = await this.findReadable(user, id);
    if (!canEdit(user, calculation)) {
      throw new ForbiddenException({
        message: 'Only the owner of a calculation saves new versions of it.',
      });
    }
    const content = computeVersionContent(calculation.kind, dto.inputs);
    const linkChanges = await sourceChangesOnSave(this.calculations, user, calculation, {
      sourceVersion: dto.sourceVersion,
      previousInputs: (
        await this.versions.findOneBy({ calculationId: id, number: dto.baseVersion })
      )?.inputs,
      savedInputs: content.inputs,
    });
    const number = dto.baseVersion + 1;
    const version = {
      id: randomUUID(),
      calculationId: id,
      number,
      ...content,
      authorId: user.id,
      note: dto.note ?? '',
      status: 'draft' as const,
      reviewerId: null,
      submittedAt: null,
      createdAt: new Date(),
    };
    const landed = await this.writeLock.run(() =>
      this.dataSource.transaction(async (manager) => {
        // Moves the head only if nobody else moved it since the base this edit started from.
        const moved = await manager
          .getRepository(Calculation)
          .update(
            { id, latestVersion: dto.baseVersion },
            { latestVersion: number, latestStatus: 'draft', ...linkChanges },
          );
        if (moved.affected !== 1) return false;
        await insertRow(manager.getRepository(CalculationVersion), version);
        await this.audit.record(
          {
            actorId: user.id,
            action: 'calculation.save',
            targetType: 'calculation',
            targetId: id,
            detail: {
              version: number,
              ...(dto.sourceVersion === undefined ? {} : { sourceVersion: dto.sourceVersion }),
            },
          },
          manager,
        );
        return true;
      }),
    );
    if (!landed) {
      const current = await this.calculations.findOneByOrFail({ id });
      const latest = await this.version(user, id, current.latestVersion);
      // Nothing is lost: the answer carries the version that landed first and the text sent.
      throw new ConflictException({
        message: `Version ${current.latestVersion} was saved while you were editing version ${dto.baseVersion}. Keep yours as a new version based on ${current.latestVersion}, or take version ${current.latestVersion}.`,
        field: 'baseVersion',
        latest,
        yours: { baseVersion: dto.baseVersion, inputs: dto.inputs, note: dto.note ?? '' },
      });
    }
    const names = await this.users.names([user.id]);
    return versionDetail(version as CalculationVersion, names);
  }

  async update(user: AuthUser, id: string, dto: UpdateCalculationDto): Promise<CalculationDetail> {
    const calculation = await this.findReadable(user, id);
    if (!canEdit(user, calculation)) {
      throw new ForbiddenException({
        message: 'Only the owner of a calculation changes its details.',
      });
    }
    const changes: Partial<Calculation> = {};
    if (dto.title !== undefined) changes.title = dto.title.trim();
    if (dto.visibility !== undefined) changes.visibility = dto.visibility;
    if (dto.tags !== undefined) changes.tags = [...new Set(dto.tags)];
    await this.writeLock.run(() =>
      this.dataSource.transaction(async (manager) => {
        await manager.getRepository(Calculation).update({ id }, changes);
        await this.audit.record(
          {
            actorId: user.id,
            action: 'calculation.update',
            targetType: 'calculation',
            targetId: id,
            // Old and new value of each field, so the trail can say "Title: old → new".
            detail: {
              changes: Object.fromEntries(
                Object.entries(changes).map(([field, value]) => [
                  field,
                  { from: calculation[field as keyof Calculation] ?? null, to: value },
                ]),
              ),
            },
          },
          manager,
        );
      }),
    );
    return this.detail(user, id);
  }

  async archive(user: AuthUser, id: string): Promise<void> {
    const calculation = await this.findReadable(user, id);
    if (!canArchive(user, calculation)) {
      throw new ForbiddenException({
        message: 'Only the owner or an admin archives a calculation.',
      });
    }
    if (calculation.archivedAt) return;
    await this.writeLock.run(() =>
      this.dataSource.transaction(async (manager) => {
        await manager.getRepository(Calculation).update({ id }, { archivedAt: new Date() });
        await this.audit.record(
          {
            actorId: user.id,
            action: 'calculation.archive',
            targetType: 'calculation',
            targetId: id,
          },
          manager,
        );
      }),
    );
  }

  async diff(user: AuthUser, id: string, a: number, b: number): Promise<VersionDiff> {
    await this.findReadable(user, id);
    const [left, right] = await Promise.all([this.findVersion(id, a), this.findVersion(id, b)]);
    type Outputs = Parameters<typeof diffOutputs>[0];
    return {
      from: a,
      to: b,
      inputs: diffInputs(left.inputs, right.inputs),
      outputs: diffOutputs(left.outputs as Outputs, right.outputs as Outputs),
      engineVersion: { from: left.engineVersion, to: right.engineVersion },
    };
  }
}
