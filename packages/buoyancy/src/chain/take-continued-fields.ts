import type { ContinuationDraft } from './continuation-types.js';
import { parentPath, valueAtPath, withValueAtPath } from './path-values.js';

/** The draft with the source's newer values in, and which paths changed. */
export interface TakenFields {
  readonly inputs: unknown;
  readonly changed: readonly string[];
}

/** A choice field (`kind`, `shape`, `mode`): a new choice brings its whole object along. */
const CHOICE_FIELDS = new Set(['kind', 'shape', 'mode']);

/**
 * Puts the source's values at the paths a continuation fills into the person's draft, leaving
 * every other field as they typed it. Where the source changed a choice (a fixed envelope became
 * a stretching one), the object holding it is taken whole, since the old fields no longer fit.
 * @param draft the inputs being edited
 * @param continued `continueInputs` of the newer source version
 */
export function takeContinuedFields(draft: unknown, continued: ContinuationDraft): TakenFields {
  let inputs = draft;
  const changed: string[] = [];
  for (const path of continued.filled) {
    const last = path.split('.').at(-1) ?? '';
    const newValue = valueAtPath(continued.inputs, path);
    if (JSON.stringify(valueAtPath(inputs, path)) === JSON.stringify(newValue)) continue;
    const parent = parentPath(path);
    inputs =
      CHOICE_FIELDS.has(last) && parent !== ''
        ? withValueAtPath(inputs, parent, valueAtPath(continued.inputs, parent))
        : withValueAtPath(inputs, path, newValue);
    changed.push(path);
  }
  return { inputs, changed };
}
