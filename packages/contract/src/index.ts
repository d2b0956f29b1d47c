// The one description of what the API answers and accepts. The API declares its handlers and
// views with these types and the web reads answers by them, so a change is made once and the
// type checker finds every place on either side that no longer fits.
export type * from './common.js';
export * from './users.js';
export * from './calculations.js';
export type * from './reviews.js';
export * from './classrooms.js';
export type * from './plans.js';
export * from './fill-logs.js';
export type * from './attachments.js';
export type * from './admin.js';
export type * from './evaluate.js';
export type * from './envelopes.js';
export * from './flight-exports.js';
export type * from './fill-cards.js';
export type * from './client-config.js';
