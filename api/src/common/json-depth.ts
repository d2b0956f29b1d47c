/** Deepest nesting of arrays and objects a JSON body may have; inputs nest six levels at most. */
export const MAX_JSON_DEPTH = 32;
/** Largest JSON body, as body-parser reads it. */
export const MAX_JSON_BODY = '256kb';

/**
 * How deeply the arrays and objects of a JSON text nest, found in one pass over the raw bytes
 * before anything is parsed, so a body of thousands of brackets costs microseconds, not a parse
 * and a validation that recurse through every level. Brackets inside strings do not count.
 * Stops counting once `limit` is passed.
 */
export function jsonNestingDepth(bytes: Uint8Array, limit = Infinity): number {
  let depth = 0;
  let deepest = 0;
  let inString = false;
  let escaped = false;
  for (const byte of bytes) {
    if (inString) {
      if (escaped) escaped = false;
      else if (byte === 0x5c) escaped = true;
      else if (byte === 0x22) inString = false;
    } else if (byte === 0x22) inString = true;
    else if (byte === 0x5b || byte === 0x7b) {
      depth += 1;
      if (depth > deepest) {
        deepest = depth;
        if (deepest > limit) return deepest;
      }
    } else if (byte === 0x5d || byte === 0x7d) depth -= 1;
  }
  return deepest;
}

/** body-parser's `verify` hook: refuses a body nested deeper than MAX_JSON_DEPTH with a 400. */
export function refuseDeepJson(_request: unknown, _response: unknown, bytes: Buffer): void {
  if (jsonNestingDepth(bytes, MAX_JSON_DEPTH) > MAX_JSON_DEPTH) {
    throw Object.assign(
      new Error(
        `The request body nests deeper than ${MAX_JSON_DEPTH} levels of arrays and objects.`,
      ),
      { status: 400, expose: true, type: 'entity.too.deep' },
    );
  }
}
