// The crew's fill card (docs/physics.md, "Fill card"): what the package exports of it.
export {
  FILL_CARD_NORMAL_CONDITIONS,
  fillCard,
  fillCardStopText,
  NECK_LIFT_SOURCE,
} from './fill-card.js';
export type { FillCard } from './fill-card.js';
export type { FillCardCaution } from './fill-card-cautions.js';
export type { FillCardCylinders } from './fill-card-cylinders.js';
export { checkFillCardOptions, FILL_CARD_RANGES } from './fill-card-options.js';
export type { FillCardCylinderOptions, FillCardOptions } from './fill-card-options.js';
