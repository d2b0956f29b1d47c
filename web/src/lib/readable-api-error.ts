import { humaniseKey, type InputFieldInfo, type InputIssue } from '@loftwright/buoyancy';
import { ApiError } from './api-client';

/** Finds the label (and dimension) a form shows for a field path the API names. */
export type FieldLabels = (field: string) => InputFieldInfo | undefined;

/**
 * A path as words when no form claims it: "readings.0.ballastMassKg" -> "Item 1: ballast mass".
 * Better than the path itself; forms pass their own labels for the fields they show.
 */
export function labelOfPath(field: string): string {
  const words: string[] = [];
  for (const key of field.split('.')) {
    if (/^\d+$/.test(key)) words.push(`Item ${Number(key) + 1}`);
    else words.push(humaniseKey(key));
  }
  const last = words.at(-1) ?? field;
  const item = words.slice(0, -1).findLast((word) => word.startsWith('Item '));
  return item ? `${item}: ${last.toLowerCase()}` : last;
}

/**
 * class-validator starts its reasons with the property's name ("title should not be empty"); the
 * sentence names the field by its label instead.
 */
function reasonWithoutKey(field: string, reason: string): string {
  const key = field.split('.').at(-1) ?? '';
  return key && reason.startsWith(`${key} `) ? reason.slice(key.length + 1) : reason;
}

/** One issue as a sentence, given the field's label: the engine's readableIssue where ranges matter. */
export type DescribeIssue = (issue: InputIssue, field: InputFieldInfo) => string;

const plainSentence: DescribeIssue = (issue, field) => `${field.label} ${issue.reason}`;

/**
 * What went wrong, as sentences a person can read: each field the API names is called by the
 * label the form shows, no paths or library wording. Pages that show ranges pass the engine's
 * readableIssue as `describe`, so ranges come in the units the field shows; others stay light
 * (the engine's unit library is not loaded for a sign-in form).
 */
export function readableApiError(
  error: Error,
  labels: FieldLabels | undefined,
  describe: DescribeIssue = plainSentence,
): string[] {
  if (!(error instanceof ApiError) || error.issues.length === 0) return [error.message];
  return error.issues.map((issue) => {
    const field = labels?.(issue.field) ?? { label: labelOfPath(issue.field) };
    const range =
      issue.range && issue.range.min !== undefined && issue.range.max !== undefined
        ? { min: issue.range.min, max: issue.range.max, unit: issue.range.unit }
        : undefined;
    return describe(
      {
        field: issue.field,
        value: undefined,
        reason: reasonWithoutKey(issue.field, issue.reason),
        ...(range ? { range } : {}),
      },
      field,
    );
  });
}
