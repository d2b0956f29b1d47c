import { Controller, Get, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Roles } from '../common/decorators/roles.decorator';
import { sendTable } from '../common/export/table-export';
import type { AuditEntry } from './audit-entry.entity';
import { AuditService } from './audit.service';
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
    const rows = await this.auditService.listAll(query, 10_000);
    await sendTable<AuditEntry>(
      response,
      query.format ?? 'csv',
      'loftwright-audit',
      [
        { header: 'Id', value: (row) => row.id, width: 8 },
        { header: 'Time (UTC)', value: (row) => row.createdAt, width: 22 },
        { header: 'Action', value: (row) => row.action, width: 24 },
        { header: 'Actor id', value: (row) => row.actorId, width: 38 },
        { header: 'Target type', value: (row) => row.targetType },
        { header: 'Target id', value: (row) => row.targetId, width: 38 },
        {
          header: 'Detail',
          value: (row) => (row.detail ? JSON.stringify(row.detail) : ''),
          width: 60,
        },
      ],
      rows,
    );
  }

  @Get()
  @Roles('admin')
  list(@Query() query: ListAuditDto) {
    return this.auditService.list(query);
  }
}
