import {
  inputFieldInfo,
  kindCapabilities,
  type InputIssue,
  type LandingArea,
  readableIssue,
  type UnitSystem,
} from '@loftwright/buoyancy';
import { useCallback, useEffect, useRef, useState } from 'react';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import { useInputSchema } from '../hooks/use-input-schema';
import type { LandingAreaAnswer, LandingAreaRequest } from './landing-area-job';

/** The little of a Worker the hook uses, so tests can hand it one that runs in the page. */
export interface LandingWorker {
  postMessage: (request: LandingAreaRequest) => void;
  terminate: () => void;
  onmessage: ((event: MessageEvent<LandingAreaAnswer>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
}

export const createLandingWorker = (): LandingWorker =>
  new Worker(new URL('./landing-area.worker.ts', import.meta.url), {
    type: 'module',
  }) as unknown as LandingWorker;

type State =
  | { readonly status: 'idle' }
  | { readonly status: 'running'; readonly inputs: unknown }
  | { readonly status: 'done'; readonly inputs: unknown; readonly area: LandingArea }
  | { readonly status: 'refused'; readonly inputs: unknown; readonly problem: string };

/**
 * The landing area of the given inputs, computed in a web worker when asked (`estimate`), never
 * on every keystroke; `cancel` ends the worker. A refusal names each field by its label, in the
 * reader's units. An area computed for other inputs than the current ones is reported as stale.
 */
export function useLandingArea(
  inputs: unknown,
  schema: Record<string, unknown>,
  unitSystem: UnitSystem,
  createWorker: () => LandingWorker = createLandingWorker,
) {
  const { numberFormat } = useReadingPreferences();
  const [state, setState] = useState<State>({ status: 'idle' });
  const worker = useRef<LandingWorker | undefined>(undefined);
  const nextId = useRef(0);

  const stop = useCallback(() => {
    worker.current?.terminate();
    worker.current = undefined;
  }, []);
  useEffect(() => stop, [stop]);

  const describe = useCallback(
    (issues: readonly InputIssue[]) =>
      issues
        .map((issue) =>
          readableIssue(issue, inputFieldInfo(schema, issue.field), { unitSystem, numberFormat }),
        )
        .join('; '),
    [schema, unitSystem, numberFormat],
  );

  const estimate = useCallback(() => {
    stop();
    const id = (nextId.current += 1);
    const started = createWorker();
    worker.current = started;
    const asked = inputs;
    setState({ status: 'running', inputs: asked });
    started.onmessage = (event) => {
      const answer = event.data;
      if (answer.id !== id) return;
      stop();
      if (answer.status === 'done') setState({ status: 'done', inputs: asked, area: answer.area });
      else
        setState({
          status: 'refused',
          inputs: asked,
          problem:
            answer.status === 'refused'
              ? `The landing area waits for: ${describe(answer.issues)}`
              : `The landing area could not be estimated: ${answer.message}`,
        });
    };
    started.onerror = (event) => {
      stop();
      setState({
        status: 'refused',
        inputs: asked,
        problem: `The landing area could not be estimated: ${event.message}`,
      });
    };
    started.postMessage({ id, inputs: asked });
  }, [createWorker, describe, inputs, stop]);

  const cancel = useCallback(() => {
    stop();
    setState({ status: 'idle' });
  }, [stop]);

  const current = state.status !== 'idle' && state.inputs === inputs;
  return {
    status: state.status,
    running: state.status === 'running',
    /** The area, when estimated for the inputs as they are now. */
    area: state.status === 'done' && current ? state.area : undefined,
    /** An area was estimated, but the inputs have changed since. */
    stale: state.status === 'done' && !current,
    problem: state.status === 'refused' && current ? state.problem : undefined,
    estimate,
    cancel,
  };
}

export type LandingAreaState = ReturnType<typeof useLandingArea>;

/** The landing area of a calculation's inputs, and whether its kind offers one at all. */
export function useKindLandingArea(kind: string, inputs: unknown, unitSystem: UnitSystem) {
  const schema = useInputSchema(kind);
  const landing = useLandingArea(inputs, schema, unitSystem);
  return { ...landing, offered: kindCapabilities(kind).landingArea };
}
