import type { Plan } from '@loftwright/contract';
import {
  BadRequestException,
  ForbiddenException,
  Injectable,
  NotFoundException,
  UnprocessableEntityException,
} from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import {
  ENGINE_VERSION,
  type GasPlanLine,
  type GasSupplyInput,
  planGas,
  sphereGeometry,
  kindCapabilities,
} from '@loftwright/buoyancy';
import { randomUUID } from 'node:crypto';
import { DataSource, Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthUser, hasRole } from '../auth/auth-user';
import { CalculationsService } from '../calculations/calculations.service';
import { insertRow } from '../persistence/insert-row';
import { WriteLock } from '../persistence/write-lock';
import { AUTHOR_ROLES } from '../users/roles';
import type { SavePlanDto } from './dto/plan.dto';
import { GasPlanRecord } from './plan.entity';

export interface ResolvedLine extends GasPlanLine {
  calculationId: string | null;
  versionNumber: number | null;
}

@Injectable()
export class PlansService {
  constructor(
    @InjectRepository(GasPlanRecord) private readonly plans: Repository<GasPlanRecord>,
    private readonly calculations: CalculationsService,
    private readonly audit: AuditService,
    private readonly writeLock: WriteLock,
    private readonly dataSource: DataSource,
  ) {}

  /** Each line's gas per envelope: from the named calculation version's results, or as entered. */
  private async resolveLines(user: AuthUser, dto: SavePlanDto): Promise<ResolvedLine[]> {
    return Promise.all(
      dto.lines.map(async (line, index) => {
        if (line.calculationId) {
          const calculation = await this.calculations
            .findReadable(user, line.calculationId)
            .catch(() => {
              throw new NotFoundException({
                message: `lines.${index}.calculationId names no calculation you may see.`,
                field: `lines.${index}.calculationId`,
              });
            });
          const number = line.versionNumber ?? calculation.latestVersion;
          const version = await this.calculations.findVersion(calculation.id, number).catch(() => {
            throw new NotFoundException({
              message: `lines.${index}.versionNumber: version ${number} does not exist.`,
              field: `lines.${index}.versionNumber`,
            });
          });
          // Which result is the envelope's volume is the kind's to say (engine capabilities).
          const volumeOutput = kindCapabilities(calculation.kind).volumeOutput;
          const volume = volumeOutput
            ? (version.outputs as Record<string, { value: number; unit: string } | undefined>)[
                volumeOutput
              ]
            : undefined;
          if (!volume || volume.unit !== 'm³') {
            throw new UnprocessableEntityException({
              message: `lines.${index}: "${calculation.title}" gives no envelope volume (a lift check, sizing, geometry or flight profile does).`,
              field: `lines.${index}.calculationId`,
            });
          }
          return {
            label: line.label || `${calculation.title} (v${number})`,
            volumeM3: volume.value,
            count: line.count,
            calculationId: calculation.id,
            versionNumber: number,
          };
        }
        if (line.diameterM !== undefined) {
          return {
            label: line.label || `Sphere of ${line.diameterM} m`,
            volumeM3: sphereGeometry(line.diameterM).volumeM3,
            count: line.count,
            calculationId: null,
            versionNumber: null,
          };
        }
        if (line.volumeM3 === undefined) {
          throw new BadRequestException({
            message: `lines.${index} needs a calculationId, a diameterM or a volumeM3.`,
            field: `lines.${index}`,
          });
        }
        return {
          label: line.label || `Envelope ${index + 1}`,
          volumeM3: line.volumeM3,
          count: line.count,
          calculationId: null,
          versionNumber: null,
        };
      }),
    );
  }

  private async compute(user: AuthUser, dto: SavePlanDto) {
    const lines = await this.resolveLines(user, dto);
    const plan = planGas({
      lines,
      fill: dto.fill,
      ...(dto.electrolyser
        ? { electrolyser: dto.electrolyser as GasSupplyInput['electrolyser'] }
        : {}),
      ...(dto.measured ? { measured: dto.measured as GasSupplyInput['measured'] } : {}),
      ...(dto.cylinder ? { cylinder: dto.cylinder as GasSupplyInput['cylinder'] } : {}),
      ...(dto.prices ? { prices: dto.prices as GasSupplyInput['prices'] } : {}),
    });
    return {
      lines: plan.lines.map((line, index) => ({ ...lines[index], ...line })),
      totalM3: plan.totalM3,
      outputs: plan.result.outputs,
      steps: plan.result.steps,
      warnings: plan.result.warnings,
    };
  }

  private view(record: GasPlanRecord) {
    return {
      id: record.id,
      ownerId: record.ownerId,
      title: record.title,
      eventDate: record.eventDate,
      inputs: record.inputs,
      result: record.result,
      engineVersion: record.engineVersion,
      createdAt: record.createdAt.toISOString(),
      updatedAt: record.updatedAt.toISOString(),
    };
  }

  private async findOwn(user: AuthUser, id: string): Promise<GasPlanRecord> {
    const record = await this.plans.findOneBy({ id });
    if (!record || (record.ownerId !== user.id && !hasRole(user, 'admin'))) {
      throw new NotFoundException({ message: 'No such plan.', field: 'id' });
    }
    return record;
  }

  async list(user: AuthUser): Promise<Plan[]> {
    const rows = await this.plans.find({
      where: hasRole(user, 'admin') ? {} : { ownerId: user.id },
      order: { updatedAt: 'DESC' },
    });
    return rows.map((row) => this.view(row));
  }

  async get(user: AuthUser, id: string): Promise<Plan> {
    return this.view(await this.findOwn(user, id));
  }

  async create(user: AuthUser, dto: SavePlanDto): Promise<Plan> {
    if (!hasRole(user, ...AUTHOR_ROLES)) {
      throw new ForbiddenException({ message: 'Planning gas needs the designer or teacher role.' });
    }
    const result = await this.compute(user, dto);
    const id = randomUUID();
    // The plan and its audit record commit together, or neither does.
    await this.writeLock.run(() =>
      this.dataSource.transaction(async (manager) => {
        await insertRow(manager.getRepository(GasPlanRecord), {
          id,
          ownerId: user.id,
          title: dto.title,
          eventDate: dto.eventDate ?? '',
          inputs: { ...dto },
          result,
          engineVersion: ENGINE_VERSION,
        });
        await this.audit.record(
          { actorId: user.id, action: 'plan.create', targetType: 'gas_plan', targetId: id },
          manager,
        );
      }),
    );
    return this.get(user, id);
  }

  async replace(user: AuthUser, id: string, dto: SavePlanDto): Promise<Plan> {
    await this.findOwn(user, id);
    const result = await this.compute(user, dto);
    await this.writeLock.run(() =>
      this.dataSource.transaction(async (manager) => {
        await manager.getRepository(GasPlanRecord).update({ id }, {
          title: dto.title,
          eventDate: dto.eventDate ?? '',
          inputs: { ...dto },
          result,
          engineVersion: ENGINE_VERSION,
        } as never);
        await this.audit.record(
          { actorId: user.id, action: 'plan.update', targetType: 'gas_plan', targetId: id },
          manager,
        );
      }),
    );
    return this.get(user, id);
  }

  async remove(user: AuthUser, id: string): Promise<void> {
    await this.findOwn(user, id);
    await this.writeLock.run(() =>
      this.dataSource.transaction(async (manager) => {
        await manager.getRepository(GasPlanRecord).delete({ id });
        await this.audit.record(
          { actorId: user.id, action: 'plan.remove', targetType: 'gas_plan', targetId: id },
          manager,
        );
      }),
    );
  }
}
