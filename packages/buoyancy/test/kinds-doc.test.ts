import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { KINDS, kindsMarkdown } from '../src/index.js';

describe('docs/calculation-kinds.md', () => {
  it('is what the kinds’ schemas generate (run `npm run docs:kinds` after changing a kind)', () => {
    const committed = readFileSync(
      new URL('../../../docs/calculation-kinds.md', import.meta.url),
      'utf8',
    );
    expect(committed).toBe(kindsMarkdown());
  });

  it('documents every kind with its units and ranges', () => {
    const page = kindsMarkdown();
    for (const kind of KINDS) expect(page).toContain(`(\`${kind.id}\`)`);
    expect(page).toContain(
      '| `ambient (mode: standard).altitudeM` | number | m | -5000 … 86000 | required |',
    );
  });
});
