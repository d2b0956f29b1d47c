import { type RefObject, useEffect, useState } from 'react';
import { moveWalk, type WalkAction, type WalkPosition } from '../lib/walk-through-state';

/**
 * Where the walk-through stands (step and stage) and the moves from there; the current step is
 * kept in view within `frame` as the walk-through grows below the fold.
 */
export function useWalkPosition(stepCount: number, frame: RefObject<HTMLElement | null>) {
  const [position, setPosition] = useState<WalkPosition>({ step: 0, stage: 'formula' });
  const act = (action: WalkAction) => setPosition((now) => moveWalk(now, action, stepCount));

  useEffect(() => {
    frame.current
      ?.querySelector('[aria-current="step"]')
      ?.scrollIntoView?.({ block: 'nearest', behavior: 'smooth' });
  }, [position, frame]);

  return { position, act };
}
