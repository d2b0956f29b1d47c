import type { ExampleDetail, ExampleSummary, Submission } from '@loftwright/contract';
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
  Res,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { ExportFormatQuery } from '../common/export/export-format.query';
import { type ExportColumn, sendTable } from '../common/export/table-export';
import { uuidParam } from '../common/pipes/uuid-param.pipe';
import { ExampleSettingsDto, PublishExampleDto, SubmitAnswersDto } from './dto/worked-example.dto';
import { WorkedExamplesService } from './worked-examples.service';

type SubmissionRow = Awaited<ReturnType<WorkedExamplesService['listSubmissions']>>[number];

@ApiTags('worked examples')
@ApiBearerAuth()
@Controller()
export class WorkedExamplesController {
  constructor(private readonly examples: WorkedExamplesService) {}

  @Get('classes/:id/examples')
  list(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
  ): Promise<ExampleSummary[]> {
    return this.examples.listForClass(user, id);
  }

  /** Publishes a copy of one calculation version to the class. */
  @Post('classes/:id/examples')
  publish(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Body() body: PublishExampleDto,
  ): Promise<ExampleDetail> {
    return this.examples.publish(user, id, body);
  }

  @Get('examples/:id')
  get(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
  ): Promise<ExampleDetail> {
    return this.examples.get(user, id);
  }

  /** The teacher's words and settings; the calculation content itself never changes. */
  @Patch('examples/:id')
  update(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Body() body: ExampleSettingsDto,
  ): Promise<ExampleDetail> {
    return this.examples.update(user, id, body);
  }

  @Delete('examples/:id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@CurrentUser() user: AuthUser, @Param('id', uuidParam('id')) id: string): Promise<void> {
    return this.examples.remove(user, id);
  }

  @Post('examples/:id/submissions')
  submit(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Body() body: SubmitAnswersDto,
  ): Promise<Submission> {
    return this.examples.submit(user, id, body.answers);
  }

  @Get('examples/:id/submissions')
  submissions(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
  ): Promise<Submission[]> {
    return this.examples.listSubmissions(user, id);
  }

  /** Every attempt, one row each, with the answer, the engine's value and right or wrong. */
  @Get('examples/:id/submissions/export')
  async export(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Query() query: ExportFormatQuery,
    @Res() response: Response,
  ): Promise<void> {
    const { example, steps, rows } = await this.examples.submissionTable(user, id);
    const answersOf = (row: SubmissionRow) => row.check.answers;
    const stepLabel = (row: SubmissionRow) => {
      const stepId = (row.check as { firstWrongStepId: string | null }).firstWrongStepId;
      const index = steps.findIndex((step) => step.id === stepId);
      return index < 0 ? '' : `${index + 1}. ${steps[index]?.label ?? ''}`;
    };
    const perOutput: ExportColumn<SubmissionRow>[] = (
      example.exercise?.hiddenOutputs ?? []
    ).flatMap((name) => {
      const answer = (row: SubmissionRow) => answersOf(row).find((item) => item.output === name);
      const unit = (example.outputs as Record<string, { unit: string }>)[name]?.unit ?? '';
      const suffix = unit ? ` (${unit})` : '';
      return [
        { header: `${name} given${suffix}`, value: (row) => answer(row)?.given ?? null },
        { header: `${name} engine${suffix}`, value: (row) => answer(row)?.expected ?? null },
        {
          header: `${name} right`,
          value: (row) => (answer(row)?.correct ? 'right' : 'wrong'),
          width: 10,
        },
      ];
    });
    await sendTable(
      response,
      query.format ?? 'csv',
      'loftwright-exercise-submissions',
      [
        { header: 'Student', value: (row) => row.student.displayName, width: 28 },
        { header: 'Attempt', value: (row) => row.attempt, width: 9 },
        { header: 'Submitted at (UTC)', value: (row) => row.submittedAt, width: 24 },
        { header: 'Right', value: (row) => row.correctCount, width: 8 },
        { header: 'Asked', value: (row) => row.answerCount, width: 8 },
        { header: 'All right', value: (row) => (row.allCorrect ? 'yes' : 'no'), width: 10 },
        ...perOutput,
        { header: 'First step gone wrong', value: stepLabel, width: 36 },
      ],
      rows,
    );
  }
}
