import type { Evaluation, KindCatalogue } from '@loftwright/contract';
import { Body, Controller, Get, HttpCode, HttpStatus, Post } from '@nestjs/common';
import { ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import { ENGINE_VERSION, evaluate, KINDS } from '@loftwright/buoyancy';
import { inBodyField } from '../calculations/version-content';
import { Public } from '../common/decorators/public.decorator';
import { RateLimited } from '../common/rate-limit';
import { EvaluateDto } from './dto/evaluate.dto';

@ApiTags('evaluate')
@Controller()
export class EvaluateController {
  /** Evaluates any kind without saving anything: previews, and other tools. */
  @Public()
  @RateLimited('evaluate')
  @Post('evaluate')
  @HttpCode(HttpStatus.OK)
  @ApiUnprocessableEntityResponse({
    description: 'an input is outside the range the model is valid for; the body names the field',
  })
  evaluate(@Body() body: EvaluateDto): Evaluation {
    const result = inBodyField('inputs', () => evaluate(body.kind, body.inputs));
    return { kind: body.kind, engineVersion: ENGINE_VERSION, ...result };
  }

  /** The kinds the engine offers, with their inputs as JSON Schema. */
  @Public()
  @Get('kinds')
  kinds(): KindCatalogue {
    return {
      engineVersion: ENGINE_VERSION,
      kinds: KINDS.map((kind) => ({ ...kind, inputSchema: kind.inputSchema })),
    };
  }
}
