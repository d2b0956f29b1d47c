import { describe, expect, it } from 'vitest';
import { geometricAltitudeM, standardAtmosphere } from '../atmosphere/standard-atmosphere.js';
import { InputError } from '../errors.js';
import { evaluate, kindCapabilities, KINDS } from '../kinds/registry.js';
import { windProfile } from '../wind/wind-profile.js';
import { driftTrack } from './drift.js';
import { flightPath } from './flight-path.js';

const output = (result: ReturnType<typeof evaluate>, name: string) =>
  result.outputs[name]?.value ?? Number.NaN;
const relative = (a: number, b: number) => Math.abs(a / b - 1);

const balloon = {
  envelope: { kind: 'extensible' as const, launchDiameterM: 1.6, burstDiameterM: 6 },
  envelopeMassKg: 0.6,
  payloadMassKg: 0.9,
  gas: { gasId: 'helium' as const },
  launch: { altitudeM: 120 },
  parachute: { areaM2: 0.8 },
};
/** Results both runs give, with and without a wind. */
const VERTICAL = [
  'freeLift',
  'launchAscentRate',
  'burstAltitude',
  'ascentTime',
  'endAscentRate',
  'landingDescentRate',
  'descentTime',
  'flightTime',
];

/**
 * Levels every 1 km up to 40 km plus the 1976 standard's layer boundaries at 11, 20 and 32 km′
 * geopotential (U.S. Standard Atmosphere 1976, Table 4), where its lapse rate changes.
 */
function levelHeightsM(): number[] {
  const breaks = [11000, 20000, 32000].map((h) => geometricAltitudeM(h));
  const every = Array.from({ length: 41 }, (_, i) => i * 1000);
  return [...every, ...breaks].sort((a, b) => a - b);
}

describe('flight-profile: the air from a wind profile', () => {
  it('reproduces the standard-atmosphere flight when the profile holds the 1976 temperatures', () => {
    // U.S. Standard Atmosphere 1976: temperature linear in geopotential height within each layer,
    // pressure by the hydrostatic equation (eqs. 33a/33b), so a profile with the standard's
    // temperatures at the layer boundaries gives back its pressures and densities.
    const layers = levelHeightsM().map((heightM) => ({
      heightM,
      directionDeg: 0,
      speedMS: 0,
      temperatureK: standardAtmosphere(heightM).temperatureK,
    }));
    const plain = evaluate('flight-profile', balloon);
    const withProfile = evaluate('flight-profile', { ...balloon, wind: { layers } });
    for (const name of VERTICAL) {
      expect(relative(output(withProfile, name), output(plain, name)), name).toBeLessThan(1e-12);
    }
    expect(withProfile.warnings.map((w) => w.code)).toContain('flight-air-from-profile');
  });

  it('matches the 1976 standard with a temperature offset for a profile warmer by that offset', () => {
    // U.S. Standard Atmosphere 1976 with the usual "ISA + ΔT" day: standard pressure at each
    // height, temperature shifted by ΔT. A profile whose levels all lie below the launch site is
    // continued above its top by exactly that model (standard pressure scaled to the top level,
    // standard temperature shifted to meet it), so the two runs must agree to rounding.
    const offsetK = 12;
    const layers = [-400, 0].map((heightM) => ({
      heightM,
      pressurePa: standardAtmosphere(heightM).pressurePa,
      directionDeg: 90,
      speedMS: 0,
      temperatureK: standardAtmosphere(heightM).temperatureK + offsetK,
    }));
    const warmDay = evaluate('flight-profile', {
      ...balloon,
      launch: { altitudeM: 120, temperatureOffsetK: offsetK },
    });
    const withProfile = evaluate('flight-profile', { ...balloon, wind: { layers } });
    for (const name of VERTICAL) {
      expect(relative(output(withProfile, name), output(warmDay, name)), name).toBeLessThan(1e-9);
    }
    expect(withProfile.warnings.map((w) => w.code)).toContain('flight-air-above-profile');
  });

  it('stays close to the offset model with dense levels, where the profile is hydrostatic', () => {
    // Same ISA + 12 K day, now with levels every 1 km giving the standard pressure: between
    // levels the profile's pressure follows the hypsometric equation at the warmer temperature,
    // so it rises above the standard's by up to Δz·ΔT/(H·T) ≈ 1000·12/(7000·220) ≈ 0.8 % mid-layer
    // (scale height H = R·T/g, Wallace & Hobbs 2006, §3.2). The burst altitude moves by a few
    // tens of metres and the times by less than 0.5 %.
    const offsetK = 12;
    const layers = levelHeightsM().map((heightM) => ({
      heightM,
      pressurePa: standardAtmosphere(heightM).pressurePa,
      directionDeg: 90,
      speedMS: 0,
      temperatureK: standardAtmosphere(heightM).temperatureK + offsetK,
    }));
    const warmDay = evaluate('flight-profile', {
      ...balloon,
      launch: { altitudeM: 120, temperatureOffsetK: offsetK },
    });
    const withProfile = evaluate('flight-profile', { ...balloon, wind: { layers } });
    expect(
      Math.abs(output(withProfile, 'burstAltitude') - output(warmDay, 'burstAltitude')),
    ).toBeLessThan(60);
    for (const name of ['ascentTime', 'descentTime', 'flightTime']) {
      expect(relative(output(withProfile, name), output(warmDay, name)), name).toBeLessThan(0.005);
    }
  });

  it('keeps the standard atmosphere, and says so, when no level gives a temperature', () => {
    const layers = [
      { heightM: 0, directionDeg: 270, speedMS: 5 },
      { heightM: 30000, directionDeg: 270, speedMS: 20 },
    ];
    const plain = evaluate('flight-profile', balloon);
    const withWind = evaluate('flight-profile', { ...balloon, wind: { layers } });
    for (const name of VERTICAL) expect(output(withWind, name), name).toBe(output(plain, name));
    expect(withWind.warnings.map((w) => w.code)).toContain('flight-air-standard');
  });

  it('uses the temperatures the file gives and fills the levels without one from neighbours', () => {
    // U.S. Standard Atmosphere 1976, Table 4: temperature is linear in geopotential height within
    // each layer. A profile 12 K warmer than the standard that gives temperatures only at the
    // layer boundaries (0, 11, 20, 32 km′) and at 35 km must fill every level between them with
    // exactly the temperatures a full profile gives, so both flights agree to rounding; the old
    // rule (standard atmosphere as soon as one level lacks a temperature) is 12 K colder.
    const offsetK = 12;
    const boundariesM = [0, 11000, 20000, 32000].map((h) => geometricAltitudeM(h));
    const heightsM = levelHeightsM().filter((heightM) => heightM <= 35000);
    const full = heightsM.map((heightM) => ({
      heightM,
      directionDeg: 90,
      speedMS: 0,
      temperatureK: standardAtmosphere(heightM).temperatureK + offsetK,
    }));
    const partial = full.map((layer) =>
      boundariesM.includes(layer.heightM) || layer.heightM === 35000
        ? layer
        : { heightM: layer.heightM, directionDeg: 90, speedMS: 0 },
    );
    const fromFull = evaluate('flight-profile', { ...balloon, wind: { layers: full } });
    const fromPartial = evaluate('flight-profile', { ...balloon, wind: { layers: partial } });
    for (const name of VERTICAL) {
      expect(relative(output(fromPartial, name), output(fromFull, name)), name).toBeLessThan(1e-9);
    }
    const note = fromPartial.warnings.find((w) => w.code === 'flight-air-filled-temperatures');
    expect(note?.message).toContain('wind.layers.1');
    expect(note?.message).not.toContain('wind.layers.0,');
    expect(fromPartial.warnings.map((w) => w.code)).not.toContain('wind-standard-temperature');
  });

  it('fills levels beyond the last temperature from the standard shifted to meet it', () => {
    // Only the lowest level gives a temperature, 10 K above the standard's: every level above
    // takes the 1976 standard's temperature + 10 K, so the flight matches a full profile of
    // standard + 10 K (U.S. Standard Atmosphere 1976, Table 4 layer temperatures).
    const heightsM = levelHeightsM();
    const full = heightsM.map((heightM) => ({
      heightM,
      directionDeg: 0,
      speedMS: 0,
      temperatureK: standardAtmosphere(heightM).temperatureK + 10,
    }));
    const partial = full.map((layer, index) =>
      index === 0 ? layer : { heightM: layer.heightM, directionDeg: 0, speedMS: 0 },
    );
    const fromFull = evaluate('flight-profile', { ...balloon, wind: { layers: full } });
    const fromPartial = evaluate('flight-profile', { ...balloon, wind: { layers: partial } });
    for (const name of VERTICAL) {
      expect(relative(output(fromPartial, name), output(fromFull, name)), name).toBeLessThan(1e-9);
    }
  });
});

describe('flight-profile: the launch air below, within and above the profile', () => {
  // Levels at 1 km and 2 km geometric with the 1976 standard's temperatures and pressures
  // (check-values §1.4: 281.651 K, 89 876 Pa at 1 km; 275.154 K, 79 501 Pa at 2 km).
  const layers = [
    { heightM: 1000, pressurePa: 89876, directionDeg: 0, speedMS: 0, temperatureK: 281.651 },
    { heightM: 2000, pressurePa: 79501, directionDeg: 0, speedMS: 0, temperatureK: 275.154 },
  ];
  const launchStep = (altitudeM: number, id: string) =>
    evaluate('flight-profile', {
      ...balloon,
      launch: { altitudeM },
      wind: { layers },
    }).steps.find((step) => step.id === id);

  it('below the lowest level: the shifted standard atmosphere, named as such', () => {
    // Sea level of the 1976 standard: 288.150 K, 101 325 Pa (check-values §1.4).
    const temperature = launchStep(0, 'air-temperature');
    const pressure = launchStep(0, 'air-pressure');
    expect(Math.abs((temperature?.result.value ?? 0) - 288.15)).toBeLessThan(2e-3);
    expect(relative(pressure?.result.value ?? 0, 101325)).toBeLessThan(1e-4);
    expect(temperature?.formula).toBe('T = T_std(z) + (T_1 − T_std(z_1))');
    expect(temperature?.source).toContain('lowest level');
    expect(pressure?.formula).toBe('p = p_1·p_std(z) / p_std(z_1)');
    expect(pressure?.source).not.toContain('hypsometric');
  });

  it('between levels: linear in geopotential height and hypsometric from the level below', () => {
    const temperature = launchStep(1500, 'air-temperature');
    expect(temperature?.source).toContain('between levels');
    expect(launchStep(1500, 'air-pressure')?.source).toContain('hypsometric');
  });

  it('above the top level: the standard shifted to meet the top', () => {
    // 5 000 m of the 1976 standard: 255.676 K, 54 048 Pa (check-values §1.4).
    const temperature = launchStep(5000, 'air-temperature');
    const pressure = launchStep(5000, 'air-pressure');
    expect(Math.abs((temperature?.result.value ?? 0) - 255.676)).toBeLessThan(2e-3);
    expect(relative(pressure?.result.value ?? 0, 54048)).toBeLessThan(1e-4);
    expect(temperature?.source).toContain('top level');
    expect(pressure?.formula).toBe('p = p_n·p_std(z) / p_std(z_n)');
  });
});

describe('flight-profile: descent mass with the envelope remnant', () => {
  it('falls at √(m_d) times the rate: terminal velocity w = √(2·m·g/(ρ·C_d·A))', () => {
    // Terminal velocity of a body under drag (textbook: drag ½·ρ·w²·C_d·A equal to the weight),
    // so at the same height the rate scales as the square root of the mass.
    const whole = evaluate('flight-profile', balloon);
    const remnant = evaluate('flight-profile', {
      ...balloon,
      parachute: { areaM2: 0.8, envelopeRemnantMassKg: 0.15 },
    });
    const ratio = output(remnant, 'landingDescentRate') / output(whole, 'landingDescentRate');
    expect(ratio).toBeCloseTo(Math.sqrt((0.9 + 0.15) / (0.9 + 0.6)), 12);
    const step = remnant.steps.find((s) => s.id === 'descent-mass');
    expect(step?.formula).toBe('m_d = m_payload + m_remnant');
    expect(step?.result.value).toBeCloseTo(1.05, 12);
    expect(whole.steps.find((s) => s.id === 'descent-mass')?.formula).toBe(
      'm_d = m_payload + m_env',
    );
  });

  it('refuses a remnant heavier than the envelope, naming the field', () => {
    expect(() =>
      evaluate('flight-profile', {
        ...balloon,
        parachute: { areaM2: 0.8, envelopeRemnantMassKg: 0.7 },
      }),
    ).toThrow(/parachute\.envelopeRemnantMassKg/);
  });
});

describe('flight-profile: drift', () => {
  const layers = [
    { heightM: 0, directionDeg: 240, speedMS: 4 },
    { heightM: 5000, directionDeg: 260, speedMS: 18 },
    { heightM: 11000, directionDeg: 275, speedMS: 35 },
    { heightM: 20000, directionDeg: 90, speedMS: 8 },
    { heightM: 30000, directionDeg: 100, speedMS: 12 },
  ];
  const site = { altitudeM: 120, latitudeDeg: 52.1, longitudeDeg: 5.2 };
  const input = { ...balloon, launch: site, wind: { layers } };

  it('publishes the drift of driftTrack over flightPath', () => {
    const result = evaluate('flight-profile', input);
    const path = flightPath(input);
    const drift = driftTrack({
      launch: site,
      ascent: path.ascent,
      descent: path.descent,
      wind: windProfile({ layers }),
    });
    expect(output(result, 'burstEast')).toBe(drift.burst.eastM);
    expect(output(result, 'burstNorth')).toBe(drift.burst.northM);
    expect(output(result, 'landingEast')).toBe(drift.landing.eastM);
    expect(output(result, 'landingNorth')).toBe(drift.landing.northM);
    expect(output(result, 'landingLatitude')).toBe(drift.landing.latitudeDeg);
    expect(output(result, 'landingLongitude')).toBe(drift.landing.longitudeDeg);
    expect(output(result, 'burstLatitude')).toBe(drift.burst.latitudeDeg);
    expect(output(result, 'groundDistance')).toBe(drift.groundDistanceM);
    expect(output(result, 'initialBearing')).toBe(drift.initialBearingDeg);
    expect(output(result, 'flightTime')).toBeCloseTo(drift.flightTimeS, 9);
    const track = result.series?.track;
    expect(track?.columns.map((c) => c.key)).toEqual([
      'time',
      'east',
      'north',
      'altitude',
      'latitude',
      'longitude',
    ]);
    expect(track?.rows.length).toBe(600);
    expect(track?.rows.at(-1)?.[1]).toBe(drift.landing.eastM);
  });

  it('carries the balloon u·t in a uniform wind (analytic)', () => {
    // A wind from 270° at 10 m/s everywhere blows east: x = u·t_flight, y = 0.
    const uniform = [0, 40000].map((heightM) => ({ heightM, directionDeg: 270, speedMS: 10 }));
    const result = evaluate('flight-profile', { ...balloon, wind: { layers: uniform } });
    expect(relative(output(result, 'landingEast'), 10 * output(result, 'flightTime'))).toBeLessThan(
      1e-9,
    );
    expect(Math.abs(output(result, 'landingNorth'))).toBeLessThan(1e-6);
    // Without a launch site: distance and bearing on the plane, no latitude.
    expect(output(result, 'groundDistance')).toBeCloseTo(output(result, 'landingEast'), 6);
    expect(output(result, 'initialBearing')).toBeCloseTo(90, 9);
    expect(result.outputs.landingLatitude).toBeUndefined();
    expect(result.series?.track?.columns).toHaveLength(4);
  });

  it('refuses half a launch site and a malformed time, naming the fields', () => {
    const issues = (launch: Record<string, unknown>) => {
      try {
        evaluate('flight-profile', { ...balloon, launch: { altitudeM: 120, ...launch } });
      } catch (error) {
        return error instanceof InputError ? error.issues.map((issue) => issue.field) : [];
      }
      return [];
    };
    expect(issues({ latitudeDeg: 52 })).toEqual(['launch.longitudeDeg']);
    expect(issues({ longitudeDeg: 5 })).toEqual(['launch.latitudeDeg']);
    expect(issues({ latitudeDeg: 95, longitudeDeg: 5 })).toEqual(['launch.latitudeDeg']);
    expect(issues({ time: '2026-12-04 09:00' })).toEqual(['launch.time']);
    expect(issues({ time: '2026-12-04T09:00:00+01:00' })).toEqual([]);
  });

  it('declares the drift chart and the landing area for this kind only', () => {
    expect(kindCapabilities('flight-profile')).toMatchObject({
      charts: ['drift-track'],
      landingArea: true,
    });
    for (const kind of KINDS.filter((k) => k.id !== 'flight-profile')) {
      expect(kind.capabilities.landingArea, kind.id).toBe(false);
    }
  });
});
