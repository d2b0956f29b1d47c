import type { Plan } from '@loftwright/contract';
import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  Post,
  Put,
  Query,
  Res,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { ExportFormatQuery } from '../common/export/export-format.query';
import { sendTable } from '../common/export/table-export';
import { uuidParam } from '../common/pipes/uuid-param.pipe';
import { SavePlanDto } from './dto/plan.dto';
import { PlansService, type ResolvedLine } from './plans.service';

@ApiTags('gas plans')
@ApiBearerAuth()
@Controller('plans')
export class PlansController {
  constructor(private readonly plans: PlansService) {}

  @Get()
  list(@CurrentUser() user: AuthUser): Promise<Plan[]> {
    return this.plans.list(user);
  }

  @Post()
  create(@CurrentUser() user: AuthUser, @Body() body: SavePlanDto): Promise<Plan> {
    return this.plans.create(user, body);
  }

  @Get(':id')
  get(@CurrentUser() user: AuthUser, @Param('id', uuidParam('id')) id: string): Promise<Plan> {
    return this.plans.get(user, id);
  }

  /** The whole plan again: the server recomputes it from what is sent. */
  @Put(':id')
  replace(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Body() body: SavePlanDto,
  ): Promise<Plan> {
    return this.plans.replace(user, id, body);
  }

  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@CurrentUser() user: AuthUser, @Param('id', uuidParam('id')) id: string): Promise<void> {
    return this.plans.remove(user, id);
  }

  /** The plan's lines as CSV or XLSX. */
  @Get(':id/export')
  async export(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Query() query: ExportFormatQuery,
    @Res() response: Response,
  ): Promise<void> {
    const plan = await this.plans.get(user, id);
    const lines = (plan.result as { lines: (ResolvedLine & { totalM3: number })[] }).lines;
    await sendTable(
      response,
      query.format ?? 'csv',
      'loftwright-gas-plan',
      [
        { header: 'Envelope', value: (line) => line.label, width: 36 },
        { header: 'Calculation id', value: (line) => line.calculationId, width: 38 },
        { header: 'Version', value: (line) => line.versionNumber, width: 9 },
        { header: 'Gas per envelope (m³, fill conditions)', value: (line) => line.volumeM3 },
        { header: 'Count', value: (line) => line.count, width: 8 },
        { header: 'Gas for the line (m³)', value: (line) => line.totalM3 },
      ],
      lines,
    );
  }
}
