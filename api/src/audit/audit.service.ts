import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { type EntityManager, Repository } from 'typeorm';
import { insertRow } from '../database/insert-row';
import { WriteLock } from '../database/write-lock';
import { AuditEntry } from './audit-entry.entity';
import type { ListAuditDto } from './dto/list-audit.dto';

export interface AuditRecord {
  actorId: string | null;
  action: string;
  targetType: string;
  targetId?: string | null;
  detail?: Record<string, unknown>;
}

@Injectable()
export class AuditService {
  constructor(
    @InjectRepository(AuditEntry) private readonly entries: Repository<AuditEntry>,
    private readonly writeLock: WriteLock,
  ) {}

  /** Writes one audit row; inside a transaction when `manager` is given, so both commit together. */
  async record(record: AuditRecord, manager?: EntityManager): Promise<void> {
    const row = {
      actorId: record.actorId,
      action: record.action,
      targetType: record.targetType,
      targetId: record.targetId ?? null,
      detail: record.detail ?? null,
    };
    if (manager) {
      await insertRow(manager.getRepository(AuditEntry), row);
    } else {
      await this.writeLock.run(() => insertRow(this.entries, row));
    }
  }

  async list(
    query: ListAuditDto,
  ): Promise<{ items: AuditEntry[]; total: number; page: number; pageSize: number }> {
    const builder = this.entries.createQueryBuilder('entry');
    if (query.action) builder.andWhere('entry.action = :action', { action: query.action });
    if (query.actorId) builder.andWhere('entry.actor_id = :actorId', { actorId: query.actorId });
    if (query.targetId)
      builder.andWhere('entry.target_id = :targetId', { targetId: query.targetId });
    if (query.from) builder.andWhere('entry.created_at >= :from', { from: query.from });
    if (query.to) builder.andWhere('entry.created_at <= :to', { to: query.to });
    const [items, total] = await builder
      .orderBy('entry.id', 'DESC')
      .skip((query.page - 1) * query.pageSize)
      .take(query.pageSize)
      .getManyAndCount();
    return { items, total, page: query.page, pageSize: query.pageSize };
  }

  /** Every entry the filters match, newest first, at most `limit`. */
  async listAll(query: ListAuditDto, limit: number): Promise<AuditEntry[]> {
    const rows: AuditEntry[] = [];
    for (let page = 1; rows.length < limit; page += 1) {
      const { items } = await this.list({ ...query, page, pageSize: 500 });
      rows.push(...items);
      if (items.length < 500) break;
    }
    return rows.slice(0, limit);
  }
}
