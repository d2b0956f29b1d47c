/**
 * Where a walk-through stands: which step, and how much of it is shown. Each step is revealed in
 * three stages, as on a board: the formula, then the numbers put into it, then the result.
 */
export const STAGES = ['formula', 'values', 'result'] as const;
export type Stage = (typeof STAGES)[number];

export interface WalkPosition {
  /** 0-based index of the current step. */
  step: number;
  stage: Stage;
}

export type WalkAction = 'next' | 'back' | 'reveal-all' | 'restart';

const toIndex = (position: WalkPosition) =>
  position.step * STAGES.length + STAGES.indexOf(position.stage);

const fromIndex = (index: number): WalkPosition => ({
  step: Math.floor(index / STAGES.length),
  stage: STAGES[index % STAGES.length] ?? 'formula',
});

/** The position after a key press or button; it never runs past either end. */
export function moveWalk(
  position: WalkPosition,
  action: WalkAction,
  stepCount: number,
): WalkPosition {
  const last = Math.max(0, stepCount * STAGES.length - 1);
  const index = toIndex(position);
  if (action === 'next') return fromIndex(Math.min(last, index + 1));
  if (action === 'back') return fromIndex(Math.max(0, index - 1));
  if (action === 'reveal-all') return fromIndex(last);
  return fromIndex(0);
}

/** Share of the walk-through shown so far, 0…100. */
export function walkProgressPercent(position: WalkPosition, stepCount: number): number {
  if (stepCount === 0) return 100;
  return Math.round(((toIndex(position) + 1) / (stepCount * STAGES.length)) * 100);
}

/** The action a key stands for: arrows, page keys and space as a presenter's clicker sends. */
export function actionForKey(key: string): WalkAction | undefined {
  switch (key) {
    case 'ArrowRight':
    case 'ArrowDown':
    case 'PageDown':
    case ' ':
    case 'Enter':
    case 'n':
      return 'next';
    case 'ArrowLeft':
    case 'ArrowUp':
    case 'PageUp':
    case 'Backspace':
    case 'p':
      return 'back';
    case 'a':
    case 'End':
      return 'reveal-all';
    case 'Home':
      return 'restart';
    default:
      return undefined;
  }
}
