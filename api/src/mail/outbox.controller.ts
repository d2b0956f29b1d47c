import type { OutboxMessage, Page } from '@loftwright/contract';
import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Roles } from '../common/decorators/roles.decorator';
import { PageQueryDto } from '../common/dto/page-query.dto';
import { MailService } from './mail.service';

@ApiTags('admin')
@ApiBearerAuth()
@Controller('admin/outbox')
export class OutboxController {
  constructor(private readonly mailService: MailService) {}

  /** Mail the local fake server received, newest first. */
  @Get()
  @Roles('admin')
  list(@Query() query: PageQueryDto): Promise<Page<OutboxMessage>> {
    return this.mailService.listOutbox(query.page, query.pageSize);
  }
}
