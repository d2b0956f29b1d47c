import type {
  Envelope as EnvelopeAnswer,
  EnvelopeDetail,
  UpdateEnvelopeBody,
} from '@loftwright/contract';
import {
  ConflictException,
  ForbiddenException,
  Injectable,
  NotFoundException,
  UnprocessableEntityException,
} from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { type EntityManager, In, IsNull, Not, Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthUser, hasRole } from '../auth/auth-user';
import { canRead } from '../calculations/calculation-access';
import { Calculation } from '../calculations/calculation.entity';
import { fieldIssuesException, type FieldIssue } from '../common/errors/field-issues';
import { FillLog } from '../fill-logs/fill-log.entity';
import { insertRow } from '../persistence/insert-row';
import { WriteLock } from '../persistence/write-lock';
import { ENVELOPE_MANAGER_ROLES, TEAM_ROLES } from '../users/roles';
import type { EnvelopeDto } from './dto/envelope.dto';
import { Envelope } from './envelope.entity';
import { envelopeFill, envelopeView } from './envelope-views';

/** The figures a body sets, each kind's own measure kept and the other one null. */
function figures(dto: EnvelopeDto) {
  return {
    name: dto.name.trim(),
    kind: dto.kind,
    massKg: dto.massKg,
    burstDiameterM: dto.kind === 'extensible' ? (dto.burstDiameterM ?? null) : null,
    ratedSuperpressurePa: dto.kind === 'fixed' ? (dto.ratedSuperpressurePa ?? null) : null,
    dragCoefficient: dto.dragCoefficient ?? null,
    film: dto.film?.trim() ?? '',
    notes: dto.notes ?? '',
  };
}

/** What the DTO cannot check alone: the measure that belongs to the kind, and only that one. */
function kindIssues(dto: EnvelopeDto): FieldIssue[] {
  const issues: FieldIssue[] = [];
  if (dto.name.trim() === '') issues.push({ field: 'name', reason: 'Name is needed' });
  if (dto.kind === 'extensible') {
    if (dto.burstDiameterM === undefined) {
      issues.push({ field: 'burstDiameterM', reason: 'Burst diameter is needed' });
    }
    if (dto.ratedSuperpressurePa !== undefined) {
      issues.push({
        field: 'ratedSuperpressurePa',
        reason: 'Rated superpressure belongs to a fixed envelope, not an extensible one',
      });
    }
  } else {
    if (dto.ratedSuperpressurePa === undefined) {
      issues.push({ field: 'ratedSuperpressurePa', reason: 'Rated superpressure is needed' });
    }
    if (dto.burstDiameterM !== undefined) {
      issues.push({
        field: 'burstDiameterM',
        reason: 'Burst diameter belongs to an extensible envelope, not a fixed one',
      });
    }
  }
  return issues;
}

@Injectable()
export class EnvelopesService {
  constructor(
    @InjectRepository(Envelope) private readonly envelopes: Repository<Envelope>,
    @InjectRepository(FillLog) private readonly logs: Repository<FillLog>,
    @InjectRepository(Calculation) private readonly calculations: Repository<Calculation>,
    private readonly audit: AuditService,
    private readonly writeLock: WriteLock,
  ) {}

  private requireTeam(user: AuthUser): void {
    if (!hasRole(user, ...TEAM_ROLES)) {
      throw new ForbiddenException({ message: 'The envelope library is for the team’s roles.' });
    }
  }

  private requireManager(user: AuthUser): void {
    if (!hasRole(user, ...ENVELOPE_MANAGER_ROLES)) {
      throw new ForbiddenException({
        message: 'Adding, changing and removing envelopes needs the designer or admin role.',
      });
    }
  }

  private checkKind(dto: EnvelopeDto): void {
    const issues = kindIssues(dto);
    if (issues.length > 0) throw fieldIssuesException(issues);
  }

  /**
   * How many fill logs name each envelope: all of them (an envelope with fills stays in the
   * library) and those of calculations the reader may open (what the reader is told).
   */
  private async fillCounts(
    user: AuthUser,
    ids: readonly string[],
  ): Promise<Map<string, { all: number; readable: number }>> {
    const counts = new Map<string, { all: number; readable: number }>();
    if (ids.length === 0) return counts;
    const logs = await this.logs.find({
      select: { id: true, envelopeId: true, calculationId: true },
      where: { envelopeId: In([...ids]) },
    });
    const calculations = await this.calculations.findBy({
      id: In([...new Set(logs.map((log) => log.calculationId))]),
    });
    const readable = new Set(
      calculations.filter((calculation) => canRead(user, calculation)).map(({ id }) => id),
    );
    for (const log of logs) {
      const count = counts.get(log.envelopeId as string) ?? { all: 0, readable: 0 };
      count.all += 1;
      if (readable.has(log.calculationId)) count.readable += 1;
      counts.set(log.envelopeId as string, count);
    }
    return counts;
  }

  private async views(user: AuthUser, rows: Envelope[]): Promise<EnvelopeAnswer[]> {
    const counts = await this.fillCounts(
      user,
      rows.map((row) => row.id),
    );
    const mayManage = hasRole(user, ...ENVELOPE_MANAGER_ROLES);
    return rows.map((row) => {
      const count = counts.get(row.id) ?? { all: 0, readable: 0 };
      return envelopeView(row, count.readable, mayManage && count.all === 0, mayManage);
    });
  }

  private async find(id: string): Promise<Envelope> {
    const envelope = await this.envelopes.findOneBy({ id });
    if (!envelope) throw new NotFoundException({ message: 'No such envelope.', field: 'id' });
    return envelope;
  }

  /** A fill log may name this envelope: it exists (the team's library is one for everyone). */
  /**
   * Refuses a link to an envelope not in the library. Pass the write's transaction, so a removal
   * cannot slip in between the check and the insert (the foreign key would then fail as a 500).
   */
  async requireExists(id: string, manager?: EntityManager, field = 'envelopeId'): Promise<void> {
    const repository = manager ? manager.getRepository(Envelope) : this.envelopes;
    if (!(await repository.existsBy({ id }))) {
      throw new UnprocessableEntityException({
        message: 'Envelope: no such envelope in the library.',
        field,
      });
    }
  }

  async list(user: AuthUser): Promise<EnvelopeAnswer[]> {
    this.requireTeam(user);
    return this.views(user, await this.envelopes.find({ order: { name: 'ASC' } }));
  }

  /** The envelope and its fills newest first, only those of calculations the reader may see. */
  async get(user: AuthUser, id: string): Promise<EnvelopeDetail> {
    this.requireTeam(user);
    const envelope = await this.find(id);
    const [view] = await this.views(user, [envelope]);
    const logs = await this.logs.find({
      where: { envelopeId: id, calculationId: Not(IsNull()) },
      order: { filledAt: 'DESC', createdAt: 'DESC' },
    });
    const calculations = await this.calculations.findBy({
      id: In([...new Set(logs.map((log) => log.calculationId))]),
    });
    const byId = new Map(calculations.map((calculation) => [calculation.id, calculation]));
    const history = logs.flatMap((log) => {
      const calculation = byId.get(log.calculationId);
      return calculation && canRead(user, calculation) ? [envelopeFill(log, calculation)] : [];
    });
    return { ...(view as EnvelopeAnswer), history };
  }

  async create(user: AuthUser, dto: EnvelopeDto): Promise<EnvelopeDetail> {
    this.requireManager(user);
    this.checkKind(dto);
    const id = randomUUID();
    await this.writeLock.transaction(async (manager) => {
      await insertRow(manager.getRepository(Envelope), {
        id,
        ...figures(dto),
        version: 1,
        createdBy: user.id,
      });
      await this.audit.record(
        {
          actorId: user.id,
          action: 'envelope.create',
          targetType: 'envelope',
          targetId: id,
          detail: { name: dto.name.trim() },
        },
        manager,
      );
    });
    return this.get(user, id);
  }

  /** The whole envelope again; refused (409, with the envelope as it is) if it changed meanwhile. */
  async update(
    user: AuthUser,
    id: string,
    dto: EnvelopeDto & UpdateEnvelopeBody,
  ): Promise<EnvelopeDetail> {
    this.requireManager(user);
    await this.find(id);
    this.checkKind(dto);
    const landed = await this.writeLock.transaction(async (manager) => {
      const moved = await manager
        .getRepository(Envelope)
        .update({ id, version: dto.version }, { ...figures(dto), version: dto.version + 1 });
      if (moved.affected !== 1) return false;
      await this.audit.record(
        {
          actorId: user.id,
          action: 'envelope.update',
          targetType: 'envelope',
          targetId: id,
          detail: { name: dto.name.trim(), version: dto.version + 1 },
        },
        manager,
      );
      return true;
    });
    if (!landed) {
      const latest = await this.get(user, id);
      throw new ConflictException({
        message: `Someone saved this envelope (now version ${latest.version}) while you were editing version ${dto.version}. Look at their figures, then save yours again.`,
        field: 'version',
        latest,
      });
    }
    return this.get(user, id);
  }

  /**
   * Removes an envelope no fill log names. One that has been filled stays, so its history keeps
   * meaning something: 409 says how many logs name it.
   */
  async remove(user: AuthUser, id: string): Promise<void> {
    this.requireManager(user);
    const envelope = await this.find(id);
    const used = await this.writeLock.transaction(async (manager) => {
      const count = await manager.getRepository(FillLog).countBy({ envelopeId: id });
      if (count > 0) return count;
      await manager.getRepository(Envelope).delete({ id });
      await this.audit.record(
        {
          actorId: user.id,
          action: 'envelope.remove',
          targetType: 'envelope',
          targetId: id,
          detail: { name: envelope.name },
        },
        manager,
      );
      return 0;
    });
    if (used > 0) {
      throw new ConflictException({
        message: `“${envelope.name}” is named by ${used} fill log${used === 1 ? '' : 's'}; it stays in the library so its history does.`,
        field: 'id',
      });
    }
  }
}
