import { describe, expect, it } from 'vitest';
import { actionForKey, moveWalk, walkProgressPercent } from './walk-through-state';

describe('walk-through position', () => {
  const start = { step: 0, stage: 'formula' as const };

  it('reveals formula, values and result of a step before moving to the next', () => {
    const one = moveWalk(start, 'next', 3);
    const two = moveWalk(one, 'next', 3);
    const three = moveWalk(two, 'next', 3);
    expect([one, two, three]).toEqual([
      { step: 0, stage: 'values' },
      { step: 0, stage: 'result' },
      { step: 1, stage: 'formula' },
    ]);
    expect(moveWalk(three, 'back', 3)).toEqual({ step: 0, stage: 'result' });
  });

  it('stops at both ends, reveals all and restarts', () => {
    expect(moveWalk(start, 'back', 3)).toEqual(start);
    const end = moveWalk(start, 'reveal-all', 3);
    expect(end).toEqual({ step: 2, stage: 'result' });
    expect(moveWalk(end, 'next', 3)).toEqual(end);
    expect(moveWalk(end, 'restart', 3)).toEqual(start);
  });

  it('reports progress from the first stage to all shown', () => {
    expect(walkProgressPercent(start, 2)).toBe(17);
    expect(walkProgressPercent({ step: 1, stage: 'result' }, 2)).toBe(100);
  });

  it('maps presenter keys to actions and ignores others', () => {
    expect(['ArrowRight', ' ', 'PageDown'].map(actionForKey)).toEqual(['next', 'next', 'next']);
    expect(['ArrowLeft', 'PageUp'].map(actionForKey)).toEqual(['back', 'back']);
    expect(actionForKey('a')).toBe('reveal-all');
    expect(actionForKey('Home')).toBe('restart');
    expect(actionForKey('x')).toBeUndefined();
  });
});
