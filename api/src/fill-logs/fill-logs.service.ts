import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import {
  ENGINE_VERSION,
  type FillAmbient,
  type FillReading,
  type LiftInstrument,
  fillDesignFromVersion,
  reduceFillLog,
} from '@loftwright/buoyancy';
import { randomUUID } from 'node:crypto';
import { Repository } from 'typeorm';
import { AttachmentsService } from '../attachments/attachments.service';
import { AuditService } from '../audit/audit.service';
import { type AuthUser, hasRole } from '../auth/auth-user';
import { canEdit } from '../calculations/calculation-access';
import type { Calculation } from '../calculations/calculation.entity';
import { CalculationsService } from '../calculations/calculations.service';
import { EnvelopesService } from '../envelopes/envelopes.service';
import { insertRow } from '../persistence/insert-row';
import { WriteLock } from '../persistence/write-lock';
import { UsersService } from '../users/users.service';
import type { AddReadingsDto, CreateFillLogDto, UpdateFillLogDto } from './dto/fill-log.dto';
import { FillLog } from './fill-log.entity';
import { fillLogView, type FillLogView } from './fill-log-views';

@Injectable()
export class FillLogsService {
  constructor(
    @InjectRepository(FillLog) private readonly logs: Repository<FillLog>,
    private readonly users: UsersService,
    private readonly calculations: CalculationsService,
    private readonly attachments: AttachmentsService,
    private readonly audit: AuditService,
    private readonly writeLock: WriteLock,
    private readonly envelopes: EnvelopesService,
  ) {}

  private async views(rows: FillLog[]): Promise<FillLogView[]> {
    const names = await this.users.names(rows.map((row) => row.createdBy));
    return rows.map((row) => fillLogView(row, names(row.createdBy)));
  }

  private requireEditor(user: AuthUser, calculation: Calculation): void {
    if (!canEdit(user, calculation) && !hasRole(user, 'admin')) {
      throw new ForbiddenException({
        message: 'Only the calculation’s owner or an admin logs fills against it.',
      });
    }
  }

  /** The engine's reduction of a log, against the design of the version it belongs to. */
  private async reduce(
    calculation: Calculation,
    versionNumber: number,
    log: {
      ambient: unknown;
      readings: unknown[];
      instrument?: LiftInstrument | null;
    },
  ) {
    const version = await this.calculations.findVersion(calculation.id, versionNumber);
    const design = fillDesignFromVersion(calculation.kind, version.inputs);
    const { result, points } = reduceFillLog({
      ambient: log.ambient as FillAmbient,
      readings: log.readings as FillReading[],
      ...(design ? { design } : {}),
      ...(log.instrument ? { instrument: log.instrument } : {}),
    });
    return {
      outputs: result.outputs,
      steps: result.steps,
      warnings: result.warnings,
      points,
      engineVersion: ENGINE_VERSION,
    };
  }

  async create(
    user: AuthUser,
    calculationId: string,
    versionNumber: number,
    dto: CreateFillLogDto,
  ): Promise<FillLogView> {
    const calculation = await this.calculations.findReadable(user, calculationId);
    this.requireEditor(user, calculation);
    const reduced = await this.reduce(calculation, versionNumber, dto);
    const id = randomUUID();
    await this.writeLock.transaction(async (manager) => {
      if (dto.envelopeId) await this.envelopes.requireExists(dto.envelopeId, manager);
      await insertRow(manager.getRepository(FillLog), {
        id,
        calculationId,
        versionNumber,
        createdBy: user.id,
        filledAt: dto.filledAt,
        place: dto.place ?? '',
        envelopeLabel: dto.envelopeLabel ?? '',
        envelopeId: dto.envelopeId ?? null,
        gasSource: dto.gasSource,
        ambient: { ...dto.ambient },
        readings: dto.readings,
        instrument: dto.instrument ? { ...dto.instrument } : null,
        note: dto.note ?? '',
        ...reduced,
      });
      await this.audit.record(
        {
          actorId: user.id,
          action: 'fill-log.create',
          targetType: 'calculation',
          targetId: calculationId,
          detail: { fillLogId: id, versionNumber, readings: dto.readings.length },
        },
        manager,
      );
    });
    return this.get(user, id);
  }

  async list(user: AuthUser, calculationId: string): Promise<FillLogView[]> {
    await this.calculations.findReadable(user, calculationId);
    const rows = await this.logs.find({
      where: { calculationId },
      order: { filledAt: 'DESC', createdAt: 'DESC' },
    });
    return this.views(rows);
  }

  private async findReadable(user: AuthUser, id: string) {
    const log = await this.logs.findOneBy({ id });
    if (!log) throw new NotFoundException({ message: 'No such fill log.', field: 'id' });
    try {
      const calculation = await this.calculations.findReadable(user, log.calculationId);
      return { log, calculation };
    } catch {
      throw new NotFoundException({ message: 'No such fill log.', field: 'id' });
    }
  }

  async get(user: AuthUser, id: string): Promise<FillLogView> {
    const { log } = await this.findReadable(user, id);
    return (await this.views([log]))[0] as FillLogView;
  }

  async update(user: AuthUser, id: string, dto: UpdateFillLogDto): Promise<FillLogView> {
    const { log, calculation } = await this.findReadable(user, id);
    this.requireEditor(user, calculation);
    const next = {
      filledAt: dto.filledAt ?? log.filledAt,
      place: dto.place ?? log.place,
      envelopeLabel: dto.envelopeLabel ?? log.envelopeLabel,
      // undefined keeps the link; null removes it.
      envelopeId: dto.envelopeId === undefined ? log.envelopeId : dto.envelopeId,
      gasSource: dto.gasSource ?? log.gasSource,
      ambient: dto.ambient ? { ...dto.ambient } : log.ambient,
      readings: dto.readings ?? log.readings,
      instrument: dto.instrument ? { ...dto.instrument } : log.instrument,
      note: dto.note ?? log.note,
    };
    const reduced = await this.reduce(calculation, log.versionNumber, next);
    await this.writeLock.transaction(async (manager) => {
      if (dto.envelopeId) await this.envelopes.requireExists(dto.envelopeId, manager);
      await manager.getRepository(FillLog).update({ id }, { ...next, ...reduced } as never);
      await this.audit.record(
        {
          actorId: user.id,
          action: 'fill-log.update',
          targetType: 'calculation',
          targetId: log.calculationId,
          detail: { fillLogId: id, fields: Object.keys(dto) },
        },
        manager,
      );
    });
    return this.get(user, id);
  }

  /**
   * Readings from an import: all of them are checked by the engine together with the log's
   * existing ones, then stored in one UPDATE; a bad row stores nothing.
   */
  async addReadings(user: AuthUser, id: string, dto: AddReadingsDto): Promise<FillLogView> {
    const { log, calculation } = await this.findReadable(user, id);
    this.requireEditor(user, calculation);
    const readings = dto.mode === 'replace' ? dto.readings : [...log.readings, ...dto.readings];
    const reduced = await this.reduce(calculation, log.versionNumber, {
      ambient: log.ambient,
      readings,
      instrument: log.instrument,
    });
    await this.writeLock.transaction(async (manager) => {
      await manager.getRepository(FillLog).update({ id }, { readings, ...reduced } as never);
      await this.audit.record(
        {
          actorId: user.id,
          action: 'fill-log.import-readings',
          targetType: 'calculation',
          targetId: log.calculationId,
          detail: { fillLogId: id, mode: dto.mode, readings: dto.readings.length },
        },
        manager,
      );
    });
    return this.get(user, id);
  }

  async remove(user: AuthUser, id: string): Promise<void> {
    const { log, calculation } = await this.findReadable(user, id);
    this.requireEditor(user, calculation);
    await this.attachments.removeForFillLog(id);
    await this.writeLock.transaction(async (manager) => {
      await manager.getRepository(FillLog).delete({ id });
      await this.audit.record(
        {
          actorId: user.id,
          action: 'fill-log.remove',
          targetType: 'calculation',
          targetId: log.calculationId,
          detail: { fillLogId: id },
        },
        manager,
      );
    });
  }
}
