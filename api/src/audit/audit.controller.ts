import type { AuditRow, Page } from '@loftwright/contract';
import { Controller, Get, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Roles } from '../common/decorators/roles.decorator';
import { sendTable } from '../common/export/table-export';
import { AUDIT_ACTIONS } from './audit-story';
import { AuditService, type AuditView } from './audit.service';
import { ExportAuditDto, ListAuditDto } from './dto/list-audit.dto';

@ApiTags('admin')
@ApiBearerAuth()
@Controller('admin/audit')
export class AuditController {
  constructor(private readonly auditService: AuditService) {}

  /** The filtered audit trail as CSV or XLSX, newest first, up to 10,000 rows. */
  @Get('export')
  @Roles('admin')
  async export(@Query() query: ExportAuditDto, @Res() response: Response): Promise<void> {
    const rows = await this.auditService.listAllReadable(query, 10_000);
    await sendTable<AuditView>(
      response,
      query.format ?? 'csv',
      'loftwright-audit',
      [
        { header: 'Time (UTC)', value: (row) => row.createdAt, width: 22 },
        { header: 'Who', value: (row) => row.actor?.displayName ?? '', width: 24 },
        { header: 'What happened', value: (row) => row.summary, width: 70 },
        {
          header: 'Changes',
          value: (row) =>
            row.changes
              .map((change) => `${change.label}: ${change.from ?? '—'} → ${change.to ?? '—'}`)
              .join('; '),
          width: 50,
        },
      ],
      rows,
    );
  }

  /** Every action the trail records, with its words, for a filter. */
  @Get('actions')
  @Roles('admin')
  actions(): { action: string; words: string }[] {
    return Object.entries(AUDIT_ACTIONS).map(([action, words]) => ({ action, words }));
  }

  @Get()
  @Roles('admin')
  list(@Query() query: ListAuditDto): Promise<Page<AuditRow>> {
    return this.auditService.listReadable(query);
  }
}
