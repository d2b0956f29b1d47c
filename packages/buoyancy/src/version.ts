/**
 * Version of the calculation engine. Bump it whenever any result for the same inputs can change:
 * stored versions record it, and the API compares it when it re-verifies an approved result.
 */
// 0.2.0: "check this" notes for values outside what the trade usually meets.
// 0.3.0: a cushion's envelope mass from the film cut (two flat discs), not its inflated surface.
// 0.4.0: heated air is the surrounding air at the gas temperature, in the air's own model.
// 0.5.0: one air model in standard mode (humid air mixed into the standard's ideal gas); the
// CIPM-2007 enhancement factor for water vapour in the lifting gas.
// 0.6.0: a capsule's axis (end or side first) as an input; frontal areas cite their own source.
// 0.7.0: a stack voltage too low for its cells refused.
// 0.8.0: measured lift with a GUM uncertainty, verdicts only outside it; explaining purity in %.
// 0.9.0: cylinders only of gases with a real-gas model (helium, hydrogen).
// 0.10.0: cylinder gas from published real-gas models (hydrogen: Lemmon, Huber & Leachman 2008;
// helium: NIST IR 8474), with the residual gas's own compressibility; a note on ammonia's real-gas
// density at one atmosphere.
// 0.11.0: a flight profile gives its envelope volume at launch (launchVolume), for gas plans.
// 0.12.0: a flight profile with winds: the air from the profile's temperatures, the drift to
// burst and landing, the envelope remnant under the parachute; landing areas.
// 0.13.0: a wind profile's temperatures used where given (levels without one filled from their
// neighbours); launch-air steps name the formula used below, within or above the profile; landing
// areas refused when fewer than 20 (or half) runs land, widened to 100 m when the scatter has no
// width, with notes; track and regions cut at the antimeridian in the files; a sizing's sphere
// given by its mass stretches on the fill card; cylinders emptied to the day's air pressure.
export const ENGINE_VERSION = '0.13.0';
