/**
 * Default drag coefficient of a sounding balloon on its frontal area. A smooth sphere below the
 * drag crisis has about 0.47; balloons fly near the crisis, where it falls. 0.35 reproduces U.S.
 * radiosonde practice: about 40 ft³ of helium, a 100 g balloon and 700 g free lift give
 * 900–1000 ft/min (U.S. Navy Aerographer's Mate training manual, NAVEDTRA 14270); the
 * flight-profile tests check it.
 */
export const DEFAULT_BALLOON_DRAG_COEFFICIENT = 0.35;

/** Default parachute drag coefficient on its canopy area: common practice, no published source. */
export const DEFAULT_PARACHUTE_DRAG_COEFFICIENT = 1.0;
