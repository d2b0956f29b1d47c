export { continuations, continueInputs } from './continuations.js';
export type { ContinuationTarget } from './continuations.js';
export type { ContinuationDraft, SourceOutputs } from './continuation-types.js';
export { takeContinuedFields } from './take-continued-fields.js';
export type { TakenFields } from './take-continued-fields.js';
export { needsLeft } from './needs-left.js';
