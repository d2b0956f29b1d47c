import type { UsualRange } from './usual-range.js';

/**
 * What the trade usually meets, in SI. These are not limits of any model (the allowed ranges
 * are); they mark values that are more often a slip than a real balloon, so the person is asked
 * to check them. Unless a source is named, each is common practice, no published source.
 */
export const USUAL = {
  /** Across an envelope (diameter, either axis of a spheroid, a flat disc). */
  envelopeAcrossM: { max: 100, why: 'envelopes are seldom larger across' },
  envelopeRadiusM: { max: 50, why: 'envelopes are seldom larger across' },
  /** The girth of a 100 m sphere, π·100 m. */
  envelopeCircumferenceM: { max: Math.PI * 100, why: 'envelopes are seldom larger around' },
  envelopeLengthM: { max: 250, why: 'envelopes are seldom longer' },
  /** The volume of a 100 m sphere, π·(100 m)³/6. */
  envelopeVolumeM3: { max: (Math.PI * 100 ** 3) / 6, why: 'envelopes seldom hold more' },
  payloadMassKg: { max: 100, why: 'payloads are seldom heavier' },
  /** Air at filling: −40 °C to 50 °C. */
  fillAirTemperatureK: {
    min: 233.15,
    max: 323.15,
    why: 'envelopes are seldom filled in colder or hotter air',
  },
  /** Air pressure where envelopes are filled: from high ground to a deep sea-level high. */
  fillAirPressurePa: {
    min: 50000,
    max: 108500,
    why: 'air pressure where envelopes are filled seldom lies outside 500–1085 hPa',
  },
  gasPurity: { min: 0.9, why: 'lifting gas is seldom less pure' },
  ascentRateMS: { max: 10, why: 'free balloons seldom climb faster' },
  /**
   * Below the reversible cell voltage, 1.2288 V at 25 °C, no water is split (−ΔfG° of liquid
   * water over 2F, NIST-JANAF key value); the 3 V top is common practice, no published source.
   */
  cellVoltageV: {
    min: 1.2288,
    max: 3,
    why: 'working electrolysis cells run between the reversible voltage and about 3 V',
  },
} as const satisfies Record<string, UsualRange>;
