import { continueInputs, takeContinuedFields } from '@loftwright/buoyancy';
import { useState } from 'react';
import { type CalculationDetail, getVersion } from '../api/calculations-api';

/** A newer source version put into the draft, not yet saved. */
export interface TakenSourceVersion {
  readonly number: number;
  /** Input paths whose values it changed in the form. */
  readonly changed: readonly string[];
}

/**
 * "Take version N" of a continued calculation's source: re-maps the fields the continuation
 * fills from that version into the draft (the engine's `continueInputs` and
 * `takeContinuedFields`), leaving the rest as typed. Nothing is saved: the next save records N.
 */
export function useSourceVersion({
  detail,
  inputs,
  setInputs,
}: {
  detail: CalculationDetail;
  inputs: unknown;
  setInputs: (inputs: unknown) => void;
}) {
  const [taken, setTaken] = useState<TakenSourceVersion>();
  const [taking, setTaking] = useState(false);
  const [problem, setProblem] = useState<string>();

  const take = async (number: number) => {
    const source = detail.source;
    if (!source?.calculationId) return;
    setTaking(true);
    setProblem(undefined);
    try {
      const version = await getVersion(source.calculationId, number);
      const continued = continueInputs(source.kind, detail.kind, version.inputs, version.outputs);
      const result = takeContinuedFields(inputs, continued);
      setInputs(result.inputs);
      setTaken({ number, changed: result.changed });
    } catch (error) {
      setProblem(error instanceof Error ? error.message : String(error));
    } finally {
      setTaking(false);
    }
  };

  return {
    taken,
    taking,
    problem,
    take: (number: number) => void take(number),
    /** After a save: the taken version is recorded, nothing is pending. */
    clear: () => setTaken(undefined),
  };
}

export type SourceVersionState = ReturnType<typeof useSourceVersion>;
