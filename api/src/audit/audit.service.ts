import type { AuditRow } from '@loftwright/contract';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { DataSource, type EntityManager, In, Repository } from 'typeorm';
import { insertRow } from '../persistence/insert-row';
import { WriteLock } from '../persistence/write-lock';
import { AuditEntry } from './audit-entry.entity';
import { type AuditNames, auditStory } from './audit-story';
import type { ListAuditDto } from './dto/list-audit.dto';

/** An audit entry as people read it: who by name, what in words, changes as old → new. */
export type AuditView = AuditRow;

/** Tables whose rows an entry may name, and the column that names them. */
const TITLED_TABLES = ['calculation', 'classroom', 'gas_plan', 'worked_example'] as const;

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
    private readonly dataSource: DataSource,
  ) {}

  /** A page of the trail in words: names for ids, actions as sentences, changes in a list. */
  async listReadable(
    query: ListAuditDto,
  ): Promise<{ items: AuditView[]; total: number; page: number; pageSize: number }> {
    const page = await this.list(query);
    return { ...page, items: await this.readable(page.items) };
  }

  /** Every entry the filters match in words, newest first, at most `limit`. */
  async listAllReadable(query: ListAuditDto, limit: number): Promise<AuditView[]> {
    return this.readable(await this.listAll(query, limit));
  }

  private async readable(entries: AuditEntry[]): Promise<AuditView[]> {
    const names = await this.namesFor(entries);
    return entries.map((entry) => {
      const actorName = names.person(entry.actorId);
      return {
        id: entry.id,
        createdAt: new Date(entry.createdAt).toISOString(),
        action: entry.action,
        actor: entry.actorId && actorName ? { id: entry.actorId, displayName: actorName } : null,
        ...auditStory(entry, names),
        targetType: entry.targetType,
        targetId: entry.targetId,
        detail: entry.detail,
      };
    });
  }

  /** Names of every person and titled thing the entries mention, in one query per table. */
  private async namesFor(entries: AuditEntry[]): Promise<AuditNames> {
    const ids = new Set<string>();
    for (const entry of entries) {
      for (const id of [entry.actorId, entry.targetId, ...Object.values(entry.detail ?? {})]) {
        if (typeof id === 'string' && /^[0-9a-f-]{36}$/.test(id)) ids.add(id);
      }
    }
    const wanted = [...ids];
    const people = new Map<string, string>();
    const things = new Map<string, string>();
    if (wanted.length > 0) {
      const users = await this.dataSource
        .createQueryBuilder()
        .select(['u.id AS id', 'u.display_name AS name'])
        .from('user', 'u')
        .where({ id: In(wanted) })
        .getRawMany<{ id: string; name: string }>();
      for (const row of users) people.set(row.id, row.name);
      for (const table of TITLED_TABLES) {
        const rows = await this.dataSource
          .createQueryBuilder()
          .select(['t.id AS id', 't.title AS title'])
          .from(table, 't')
          .where({ id: In(wanted) })
          .getRawMany<{ id: string; title: string }>();
        for (const row of rows) things.set(`${table}:${row.id}`, row.title);
      }
    }
    return {
      person: (id) => (id ? (people.get(id) ?? null) : null),
      thing: (type, id) => (id ? (things.get(`${type}:${id}`) ?? null) : null),
    };
  }

  /**
   * Writes one audit row in the transaction of the change it records (`WriteLock.transaction`),
   * so the two commit together.
   */
  async record(record: AuditRecord, manager: EntityManager): Promise<void> {
    await insertRow(manager.getRepository(AuditEntry), {
      actorId: record.actorId,
      action: record.action,
      targetType: record.targetType,
      targetId: record.targetId ?? null,
      detail: record.detail ?? null,
    });
  }

  /** Records an event that changes nothing else (a sign-in, a refused attempt) on its own. */
  recordEvent(record: AuditRecord): Promise<void> {
    return this.writeLock.transaction((manager) => this.record(record, manager));
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
