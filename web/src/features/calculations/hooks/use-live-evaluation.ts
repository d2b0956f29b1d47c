import {
  CHECK_THIS,
  evaluate,
  InputError,
  inputFieldInfo,
  normaliseInputs,
  readableIssue,
  type CalculationResult,
  type NumberFormat,
  type UnitSystem,
} from '@loftwright/buoyancy';
import { useDeferredValue, useMemo } from 'react';
import { useReadingPreferences } from '@/components/reading/reading-preferences';

type ShownAs = { unitSystem: UnitSystem; numberFormat: NumberFormat };

interface LiveResult {
  result?: CalculationResult;
  errors: Record<string, string>;
  /** "Check this" notes by field path: values that are allowed but seldom met. */
  notes: Record<string, string>;
  problem?: string;
}

const NO_NOTES: Record<string, string> = {};
const NO_ERRORS: Record<string, string> = {};

/** The engine's "check this" notes, by the field each is about. */
function notesByField(result: CalculationResult): Record<string, string> {
  const notes: Record<string, string> = {};
  for (const warning of result.warnings) {
    if (warning.code === CHECK_THIS && warning.field) notes[warning.field] = warning.message;
  }
  return notes;
}

/**
 * The engine, run in the browser on every change of the inputs (no request per keystroke). Its
 * refusals come back as sentences naming each field by its label, ranges in the units shown.
 */
function evaluateLive(
  kind: string,
  inputs: unknown,
  schema: Record<string, unknown>,
  shownAs: ShownAs,
): LiveResult {
  try {
    // Notes are written in the reader's units; the server records its own in SI.
    const result = evaluate(kind, inputs, { display: shownAs });
    return { result, errors: {}, notes: notesByField(result) };
  } catch (error) {
    if (!(error instanceof InputError))
      return {
        errors: {},
        notes: NO_NOTES,
        problem: error instanceof Error ? error.message : String(error),
      };
    const { errors, sentences } = fieldErrors(error, schema, shownAs);
    return { errors, notes: NO_NOTES, problem: `Results wait for: ${sentences.join('; ')}` };
  }
}

/** The engine's refusals by field (beside each field) and as sentences (for the summary). */
function fieldErrors(error: InputError, schema: Record<string, unknown>, shownAs: ShownAs) {
  const errors: Record<string, string> = {};
  const sentences: string[] = [];
  for (const issue of error.issues) {
    const field = inputFieldInfo(schema, issue.field);
    const sentence = readableIssue(issue, field, shownAs);
    // Beside the field the label is already shown; the summary names it.
    errors[issue.field] ??= field ? sentence.slice(field.label.length).trim() : sentence;
    sentences.push(sentence);
  }
  return { errors, sentences };
}

/**
 * The field checks alone, on the inputs as they are now: cheap (no computation), so a message
 * beside a field goes the moment the field is put right, not when the results catch up.
 */
function checkFieldsNow(
  kind: string,
  inputs: unknown,
  schema: Record<string, unknown>,
  shownAs: ShownAs,
): Record<string, string> {
  try {
    normaliseInputs(kind, inputs);
    return NO_ERRORS;
  } catch (error) {
    return error instanceof InputError ? fieldErrors(error, schema, shownAs).errors : NO_ERRORS;
  }
}

/**
 * The live evaluation of the editor: the engine run on the inputs as typed, deferred so typing
 * stays quick while the results catch up, and the messages to show beside each field.
 */
export function useLiveEvaluation(
  kind: string,
  inputs: unknown,
  schema: Record<string, unknown>,
  unitSystem: UnitSystem,
) {
  const deferredInputs = useDeferredValue(inputs);
  const { numberFormat } = useReadingPreferences();
  const live = useMemo(
    () =>
      deferredInputs === undefined || !kind
        ? { errors: {}, notes: NO_NOTES }
        : evaluateLive(kind, deferredInputs, schema, { unitSystem, numberFormat }),
    [kind, deferredInputs, schema, unitSystem, numberFormat],
  );
  const errorsNow = useMemo(
    () =>
      inputs === undefined || !kind
        ? NO_ERRORS
        : checkFieldsNow(kind, inputs, schema, { unitSystem, numberFormat }),
    [kind, inputs, schema, unitSystem, numberFormat],
  );
  // Checks the engine makes while computing (a rule needing a field) follow once the results
  // are for these very inputs; a stale one never outlives the typing that put it right.
  const errorsShown = useMemo(
    () => (deferredInputs === inputs ? { ...live.errors, ...errorsNow } : errorsNow),
    [deferredInputs, inputs, live.errors, errorsNow],
  );
  return {
    /** The engine's result for `evaluatedInputs`, if it computed one. */
    result: live.result,
    /** Why there are no results, in a sentence. */
    problem: live.problem,
    notes: live.notes,
    /** Messages to show beside the fields, by field path. */
    errors: errorsShown,
    /** The inputs the result is for: the typed ones, a moment behind. */
    evaluatedInputs: deferredInputs,
  };
}
