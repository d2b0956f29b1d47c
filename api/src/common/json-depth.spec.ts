import { describe, expect, it } from 'vitest';
import { jsonNestingDepth } from './json-depth';

const depth = (text: string) => jsonNestingDepth(Buffer.from(text));

describe('jsonNestingDepth', () => {
  it('counts nesting of arrays and objects as JSON.parse would meet it', () => {
    expect(depth('1')).toBe(0);
    expect(depth('{}')).toBe(1);
    expect(depth('{"a":[1,{"b":[]}]}')).toBe(4);
    expect(depth('[[],[[]],[]]')).toBe(3);
  });

  it('ignores brackets inside strings, escaped quotes included', () => {
    expect(depth('{"a":"[[[{{{"}')).toBe(1);
    expect(depth('{"a":"\\"[[[","b":[1]}')).toBe(2);
  });

  it('stops early past the limit on a very deep body', () => {
    const deep = '['.repeat(3000) + ']'.repeat(3000);
    expect(depth(deep)).toBe(3000);
    expect(jsonNestingDepth(Buffer.from(deep), 32)).toBe(33);
  });
});
