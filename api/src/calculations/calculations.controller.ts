import type {
  CalculationDetail,
  CalculationPage,
  VersionDetail,
  VersionDiff,
} from '@loftwright/contract';
import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  Patch,
  Post,
  Query,
  Header,
  Res,
} from '@nestjs/common';
import { ApiBearerAuth, ApiConflictResponse, ApiTags } from '@nestjs/swagger';
import { KINDS } from '@loftwright/buoyancy';
import type { Response } from 'express';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { sendTable } from '../common/export/table-export';
import { intParam } from '../common/pipes/int-param.pipe';
import { uuidParam } from '../common/pipes/uuid-param.pipe';
import type { CalculationFile } from './calculation-file';
import { CalculationChainService } from './calculation-chain.service';
import { CalculationTransferService } from './calculation-transfer.service';
import { CalculationsService } from './calculations.service';
import { ImportCalculationDto } from './dto/import-calculation.dto';
import { ContinueCalculationDto } from './dto/continue-calculation.dto';
import { CreateCalculationDto } from './dto/create-calculation.dto';
import { ExportCalculationsDto, ListCalculationsDto } from './dto/list-calculations.dto';
import { SaveVersionDto } from './dto/save-version.dto';
import { UpdateCalculationDto } from './dto/update-calculation.dto';

@ApiTags('calculations')
@ApiBearerAuth()
@Controller('calculations')
export class CalculationsController {
  constructor(
    private readonly calculationsService: CalculationsService,
    private readonly transfer: CalculationTransferService,
    private readonly chain: CalculationChainService,
  ) {}

  /** A Loftwright calculation file (docs/file-format.md) becomes a new calculation of the caller's. */
  @Post('import')
  import(
    @CurrentUser() user: AuthUser,
    @Body() body: ImportCalculationDto,
  ): Promise<CalculationDetail> {
    return this.transfer.import(user, body);
  }

  /** The list as CSV or XLSX, with the same filters and order, up to 10,000 rows. */
  @Get('export')
  async exportTable(
    @CurrentUser() user: AuthUser,
    @Query() query: ExportCalculationsDto,
    @Res() response: Response,
  ): Promise<void> {
    const rows = await this.calculationsService.listAll(user, query, 10_000);
    await sendTable(
      response,
      query.format ?? 'csv',
      'loftwright-calculations',
      [
        { header: 'Title', value: (row) => row.title, width: 40 },
        {
          header: 'Kind',
          value: (row) => KINDS.find((kind) => kind.id === row.kind)?.title ?? row.kind,
          width: 22,
        },
        { header: 'Status', value: (row) => row.status.replace('_', ' ') },
        { header: 'Latest version', value: (row) => row.latestVersion, width: 10 },
        { header: 'Owner', value: (row) => row.owner?.displayName ?? '' },
        { header: 'Visibility', value: (row) => row.visibility },
        { header: 'Tags', value: (row) => row.tags.join(', '), width: 24 },
        { header: 'Created (UTC)', value: (row) => new Date(row.createdAt), width: 22 },
        { header: 'Updated (UTC)', value: (row) => new Date(row.updatedAt), width: 22 },
        { header: 'Id', value: (row) => row.id, width: 38 },
      ],
      rows,
    );
  }

  @Get(':id/export')
  @Header('Content-Type', 'application/json; charset=utf-8')
  async export(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Res({ passthrough: true }) response: Response,
  ): Promise<CalculationFile> {
    const file = await this.transfer.export(user, id);
    const name = `${file.calculation.title.replace(/[^\p{L}\p{N}]+/gu, '-').replace(/^-|-$/g, '') || 'calculation'}.loftwright.json`;
    response.setHeader(
      'Content-Disposition',
      `attachment; filename="${name.replace(/[^\x20-\x7e]/g, '_')}"; filename*=UTF-8''${encodeURIComponent(name)}`,
    );
    return file;
  }

  @Get()
  list(
    @CurrentUser() user: AuthUser,
    @Query() query: ListCalculationsDto,
  ): Promise<CalculationPage> {
    return this.calculationsService.list(user, query);
  }

  @Post()
  create(
    @CurrentUser() user: AuthUser,
    @Body() body: CreateCalculationDto,
  ): Promise<CalculationDetail> {
    return this.calculationsService.create(user, body);
  }

  @Get(':id')
  findOne(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
  ): Promise<CalculationDetail> {
    return this.calculationsService.detail(user, id);
  }

  @Patch(':id')
  update(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Body() body: UpdateCalculationDto,
  ): Promise<CalculationDetail> {
    return this.calculationsService.update(user, id, body);
  }

  /** Archives (never deletes): the calculation leaves lists, its versions stay verifiable. */
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  archive(@CurrentUser() user: AuthUser, @Param('id', uuidParam('id')) id: string): Promise<void> {
    return this.calculationsService.archive(user, id);
  }

  @Post(':id/versions')
  @ApiConflictResponse({
    description: 'another version landed first; the body holds it and the inputs sent',
  })
  saveVersion(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Body() body: SaveVersionDto,
  ): Promise<VersionDetail> {
    return this.calculationsService.saveVersion(user, id, body);
  }

  @Get(':id/versions/:n')
  version(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('n', intParam('n')) n: number,
  ): Promise<VersionDetail> {
    return this.calculationsService.version(user, id, n);
  }

  /** A new calculation of the next kind in the design chain, made from this version (201). */
  @Post(':id/versions/:n/continue')
  continueFrom(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('n', intParam('n')) n: number,
    @Body() body: ContinueCalculationDto,
  ): Promise<CalculationDetail> {
    return this.chain.continueFrom(user, id, n, body);
  }

  @Get(':id/versions/:a/diff/:b')
  diff(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('a', intParam('a')) a: number,
    @Param('b', intParam('b')) b: number,
  ): Promise<VersionDiff> {
    return this.calculationsService.diff(user, id, a, b);
  }
}
