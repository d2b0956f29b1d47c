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
import type { Response } from 'express';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { intParam } from '../common/pipes/int-param.pipe';
import { uuidParam } from '../common/pipes/uuid-param.pipe';
import { CalculationTransferService } from './calculation-transfer.service';
import { CalculationsService } from './calculations.service';
import { ImportCalculationDto } from './dto/import-calculation.dto';
import { CreateCalculationDto } from './dto/create-calculation.dto';
import { ListCalculationsDto } from './dto/list-calculations.dto';
import { SaveVersionDto } from './dto/save-version.dto';
import { UpdateCalculationDto } from './dto/update-calculation.dto';

@ApiTags('calculations')
@ApiBearerAuth()
@Controller('calculations')
export class CalculationsController {
  constructor(
    private readonly calculationsService: CalculationsService,
    private readonly transfer: CalculationTransferService,
  ) {}

  /** A Loftwright calculation file (docs/file-format.md) becomes a new calculation of the caller's. */
  @Post('import')
  import(@CurrentUser() user: AuthUser, @Body() body: ImportCalculationDto) {
    return this.transfer.import(user, body);
  }

  @Get(':id/export')
  @Header('Content-Type', 'application/json; charset=utf-8')
  async export(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Res({ passthrough: true }) response: Response,
  ) {
    const file = await this.transfer.export(user, id);
    const name = `${file.calculation.title.replace(/[^\p{L}\p{N}]+/gu, '-').replace(/^-|-$/g, '') || 'calculation'}.loftwright.json`;
    response.setHeader(
      'Content-Disposition',
      `attachment; filename="${name.replace(/[^\x20-\x7e]/g, '_')}"; filename*=UTF-8''${encodeURIComponent(name)}`,
    );
    return file;
  }

  @Get()
  list(@CurrentUser() user: AuthUser, @Query() query: ListCalculationsDto) {
    return this.calculationsService.list(user, query);
  }

  @Post()
  create(@CurrentUser() user: AuthUser, @Body() body: CreateCalculationDto) {
    return this.calculationsService.create(user, body);
  }

  @Get(':id')
  findOne(@CurrentUser() user: AuthUser, @Param('id', uuidParam('id')) id: string) {
    return this.calculationsService.detail(user, id);
  }

  @Patch(':id')
  update(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Body() body: UpdateCalculationDto,
  ) {
    return this.calculationsService.update(user, id, body);
  }

  /** Archives (never deletes): the calculation leaves lists, its versions stay verifiable. */
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  archive(@CurrentUser() user: AuthUser, @Param('id', uuidParam('id')) id: string) {
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
  ) {
    return this.calculationsService.saveVersion(user, id, body);
  }

  @Get(':id/versions/:n')
  version(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('n', intParam('n')) n: number,
  ) {
    return this.calculationsService.version(user, id, n);
  }

  @Get(':id/versions/:a/diff/:b')
  diff(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('a', intParam('a')) a: number,
    @Param('b', intParam('b')) b: number,
  ) {
    return this.calculationsService.diff(user, id, a, b);
  }
}
