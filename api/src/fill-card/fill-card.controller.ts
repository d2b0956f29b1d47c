import type { FillCardAnswer } from '@loftwright/contract';
import { Controller, Get, Param, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import type { Response } from 'express';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { intParam } from '../common/pipes/int-param.pipe';
import { uuidParam } from '../common/pipes/uuid-param.pipe';
import { RequestOrigin } from '../common/public-url';
import { FillCardQueryDto } from './dto/fill-card-query.dto';
import { fillCardFileName, renderFillCardPdf } from './fill-card-pdf';
import { FillCardService } from './fill-card.service';

@ApiTags('fill card')
@ApiBearerAuth()
@ApiUnprocessableEntityResponse({
  description: 'a typed value missing or out of range (named in `field`), or a kind without a card',
})
@Controller('calculations')
export class FillCardController {
  constructor(private readonly fillCards: FillCardService) {}

  @Get(':id/versions/:n/fill-card')
  card(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('n', intParam('n')) n: number,
    @Query() query: FillCardQueryDto,
    @RequestOrigin() origin: string,
  ): Promise<FillCardAnswer> {
    return this.fillCards.card(user, id, n, query, origin);
  }

  /** The same card as a one-page A4 PDF, for printing at the filling table. */
  @Get(':id/versions/:n/fill-card.pdf')
  async pdf(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('n', intParam('n')) n: number,
    @Query() query: FillCardQueryDto,
    @RequestOrigin() origin: string,
    @Res() response: Response,
  ): Promise<void> {
    const answer = await this.fillCards.card(user, id, n, query, origin);
    const name = fillCardFileName(answer.title, answer.versionNumber);
    response.setHeader(
      'Content-Disposition',
      `inline; filename="${name.replace(/[^\x20-\x7e]/g, '_')}"; filename*=UTF-8''${encodeURIComponent(name)}`,
    );
    const bytes = await renderFillCardPdf(answer);
    response.setHeader('Content-Type', 'application/pdf');
    response.setHeader('Content-Length', String(bytes.length));
    response.end(bytes);
  }
}
