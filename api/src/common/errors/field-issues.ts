import { BadRequestException } from '@nestjs/common';

/** One problem with a request field: its dotted path and what is wrong with it. */
export interface FieldIssue {
  field: string;
  reason: string;
}

/**
 * The one shape of a 400 for bad fields, from the validation pipe and from services that check
 * what DTOs cannot (settings against stored content): every issue listed, the first one named.
 */
export function fieldIssuesException(
  issues: readonly FieldIssue[],
  /** Overrides the message built from the issues, when one sentence says it better. */
  message?: string,
): BadRequestException {
  return new BadRequestException({
    statusCode: 400,
    error: 'Bad Request',
    message: message ?? issues.map((issue) => `${issue.field}: ${issue.reason}`).join('; '),
    field: issues[0]?.field,
    issues,
  });
}
