import { describe, expect, it } from 'vitest';
import { InputError } from '../errors.js';
import { GAS_CATALOGUE } from '../gas/gas-catalogue.js';
import { fillCard } from './fill-card.js';

/** The molar gas constant, exact since the 2019 SI (CODATA 2018) [J/(mol·K)]. */
const R = 8.314462618;

/** A helium sphere sized at sea level in the 1976 standard atmosphere (15 °C, 101 325 Pa). */
const heliumSizing = {
  shape: { shape: 'sphere' },
  envelopeMass: { kind: 'fixed', massKg: 0.3 },
  payloadMassKg: 0.5,
  target: { kind: 'freeLift', freeLiftKg: 0.25 },
  gas: { gasId: 'helium' },
  ambient: { mode: 'standard', altitudeM: 0 },
};

const hydrogenSizing = { ...heliumSizing, gas: { gasId: 'hydrogen' } };

/** The same sphere with its mass from a film's areal density: it keeps its shape. */
const filmSizing = {
  ...heliumSizing,
  envelopeMass: { kind: 'areal', arealDensityKgM2: 0.05, fittingsKg: 0.02 },
};

const relative = (actual: number, expected: number) => Math.abs(actual / expected - 1);

/** The InputError a call throws, so a test can check the field it names. */
function refusal(call: () => unknown): InputError {
  try {
    call();
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('fill card: the gas', () => {
  const card = fillCard('envelope-sizing', heliumSizing, { fillerMassKg: 0.1 });

  it("fills the volume that lifts envelope, payload and free lift at the day's air", () => {
    // U.S. Standard Atmosphere 1976 sea level ρ = 1.2250 kg/m³ (check-values §1.1, V) and ideal
    // helium at 15 °C, 101.325 kPa ρ = 0.16928 kg/m³ (check-values §3.2, C): 1.05572 kg/m³ of lift.
    const expectedM3 = (0.3 + 0.5 + 0.25) / (1.225 - 0.16928);
    expect(relative(card.gasVolume.value, expectedM3)).toBeLessThan(1e-4);
    // The version's own sized volume: with its own free lift the card fills exactly that.
    expect(card.freeLift.from).toBe('version');
    expect(card.freeLift.value).toBeCloseTo(0.25, 12);
  });

  it('gives the gas at DIN 1343 normal conditions by the ideal-gas density table', () => {
    // check-values §3.2: ideal helium at 0 °C, 101.325 kPa is 0.17858 kg/m³ (five digits, so 1e-4).
    expect(relative(card.gasVolumeNormal.value, card.gasMass.value / 0.17858)).toBeLessThan(1e-4);
    // check-values §4: molar volume of an ideal gas at 273.15 K, 101.325 kPa, 22.41396954 L/mol
    // (CODATA, mathjs molarVolume).
    expect(
      relative(card.gasVolumeNormal.value, card.gasAmount.value * 22.41396954e-3),
    ).toBeLessThan(1e-9);
    expect(card.normalConditions.definition).toContain('DIN 1343');
  });

  it('does the same for hydrogen', () => {
    const h2 = fillCard('envelope-sizing', hydrogenSizing, { fillerMassKg: 0.1 });
    // check-values §3.2: ideal H₂ (2.01588 g/mol) at 0 °C, 101.325 kPa is 0.08994 kg/m³; the engine
    // uses 2.016 g/mol (IUPAC conventional), 6e-5 apart, so 2e-4.
    expect(relative(h2.gasVolumeNormal.value, h2.gasMass.value / 0.08994)).toBeLessThan(2e-4);
  });
});

describe('fill card: neck lift and the weight on the filler', () => {
  it('is free lift plus payload, less the filler for the weight', () => {
    const card = fillCard('envelope-sizing', heliumSizing, { fillerMassKg: 0.12 });
    // check-values §6.1: "neck lift is measured with the filling weight and equals free lift +
    // payload" (meteorological filling practice).
    expect(card.neckLift.value).toBeCloseTo(0.25 + 0.5, 12);
    expect(card.fillerWeight.value).toBeCloseTo(0.75 - 0.12, 12);
    // At balance the gas's gross lift (§1.1 air, §3.2 helium) less the envelope holds up exactly
    // the filler and its weight.
    const grossKg = card.gasVolume.value * (1.225 - 0.16928);
    expect(Math.abs(grossKg - 0.3 - (0.12 + card.fillerWeight.value))).toBeLessThan(2e-4);
    expect(card.stopCriterion).toContain('0.630 kg');
    expect(card.stopCriterion).toContain('balances');
  });

  it('takes a typed free lift over the version’s, and fills more gas for it', () => {
    const card = fillCard('flight-profile', flight(), { fillerMassKg: 0.2, freeLiftKg: 1.5 });
    expect(card.freeLift).toEqual({ value: 1.5, unit: 'kg', from: 'typed' });
    expect(card.neckLift.value).toBeCloseTo(1.5 + 0.9, 12);
    expect(card.notes[0]).toContain('differs');
  });

  it('fills a stretching envelope to its launch diameter with the version’s free lift', () => {
    const card = fillCard('flight-profile', flight(), { fillerMassKg: 0.2 });
    // Sphere volume πd³/6 (Euclid, Elements XII.18 / Archimedes): d = 1.6 m.
    expect(relative(card.gasVolume.value, (Math.PI * 1.6 ** 3) / 6)).toBeLessThan(1e-9);
  });
});

describe('fill card: a sphere given by its mass stretches', () => {
  it('takes a free lift above the sized volume, as the design chain flies it (latex)', () => {
    // The design chain continues this sizing as a stretching envelope (sizing-to-flight), so its
    // fill card must let it take more gas than the sized volume; same lift per m³ as above.
    const card = fillCard('envelope-sizing', heliumSizing, { fillerMassKg: 0.1, freeLiftKg: 0.5 });
    const expectedM3 = (0.3 + 0.5 + 0.5) / (1.225 - 0.16928);
    expect(relative(card.gasVolume.value, expectedM3)).toBeLessThan(1e-4);
    expect(card.notes.join(' ')).toContain('differs');
  });
});

describe('fill card: cylinders', () => {
  // Hydrogen at 25 °C: Z = 1.0601 at 100 bar and 1.0006 at 1 bar, Hydrogen Analysis Resource
  // Center table computed with NIST REFPROP 8.0 (test/reference/data/hydrogen-compressibility.csv).
  const temperatureK = 298.15;
  const fullAbsPa = 1e7;
  const perCylinderMolPerM3 = (fullAbsPa / 1.0601 - 101325 / 1.0006) / (R * temperatureK);
  const fill = fillCard('envelope-sizing', hydrogenSizing, { fillerMassKg: 0.1 });
  const cylinder = (waterVolumeM3: number, count = 1) => ({
    waterVolumeM3,
    fillPressurePa: fullAbsPa - 101325,
    temperatureK,
    count,
  });

  it('says what one full cylinder gives, by the published compressibility', () => {
    const card = fillCard('envelope-sizing', hydrogenSizing, {
      fillerMassKg: 0.1,
      cylinder: cylinder(0.05),
    });
    expect(relative(card.cylinders?.perCylinderMol ?? 0, 0.05 * perCylinderMolPerM3)).toBeLessThan(
      1e-4,
    );
  });

  it('gives the gauge pressure a single cylinder falls to', () => {
    // Size the cylinder so the fill takes it from 100 bar to 50 bar absolute. Z at 50 bar by
    // linear interpolation of the two REFPROP values (Z − 1 is nearly proportional to p here:
    // (Z − 1)/p = 6.01e-9 and 6.0e-9 per Pa), 1.03005; 1e-3 allows for both.
    const zHalf = 1.0006 + ((1.0601 - 1.0006) * (5e6 - 1e5)) / (1e7 - 1e5);
    const waterVolumeM3 =
      (fill.gasAmount.value * R * temperatureK) / (fullAbsPa / 1.0601 - 5e6 / zHalf);
    const card = fillCard('envelope-sizing', hydrogenSizing, {
      fillerMassKg: 0.1,
      cylinder: cylinder(waterVolumeM3),
    });
    expect(card.cylinders?.needed).toBe(1);
    expect(relative((card.cylinders?.lastEndPressurePa ?? 0) + 101325, 5e6)).toBeLessThan(1e-3);
    expect(relative(card.cylinders?.lastPressureDropPa ?? 0, 1e7 - 5e6)).toBeLessThan(1e-3);
    expect(card.cylinders?.text).toMatch(
      /One cylinder is enough: its gauge falls from 99\.0 bar to 4[89]\.\d bar/,
    );
  });

  it('says how many cylinders when one is not enough, and that the team is short', () => {
    // Cylinders each holding 40 % of the fill by the published Z: three opened, two emptied.
    const waterVolumeM3 = (0.4 * fill.gasAmount.value) / perCylinderMolPerM3;
    const card = fillCard('envelope-sizing', hydrogenSizing, {
      fillerMassKg: 0.1,
      cylinder: cylinder(waterVolumeM3, 2),
    });
    expect(card.cylinders).toMatchObject({ needed: 3, available: 2, enough: false });
    expect(card.cylinders?.text).toContain('Not enough: the team has 2, the fill needs 3.');
  });
});

describe('fill card: cylinders at a high launch site', () => {
  // Sized at 2 000 m in the 1976 standard atmosphere: p = 79 501 Pa (check-values §1.4, geometric
  // altitude, five digits). The gauge reads against that air, and a cylinder empties to it.
  const highSizing = { ...hydrogenSizing, ambient: { mode: 'standard', altitudeM: 2000 } };
  const airPa = 79501;
  const temperatureK = 298.15;
  const fullAbsPa = 1e7;
  const card = fillCard('envelope-sizing', highSizing, {
    fillerMassKg: 0.1,
    cylinder: { waterVolumeM3: 0.05, fillPressurePa: fullAbsPa - airPa, temperatureK, count: 1 },
  });

  it('empties cylinders to the day’s air pressure, not to 101 325 Pa', () => {
    const amount = card.steps.find((step) => step.id === 'fill-cylinder-amount');
    const emptiedPa = amount?.values.find((value) => value.symbol === 'p_a')?.value ?? 0;
    expect(relative(emptiedPa, airPa)).toBeLessThan(1e-4);
    expect(relative(card.cylinders?.airPressurePa ?? 0, airPa)).toBeLessThan(1e-4);
  });

  it('gives what one cylinder delivers from gauge + day’s pressure down to the day’s pressure', () => {
    // Hydrogen at 25 °C, Z = 1.0601 at 100 bar and 1.0006 at 1 bar (HyARC table from NIST REFPROP
    // 8.0, test/reference/data/hydrogen-compressibility.csv); Z − 1 nearly proportional to p
    // below 1 bar, so Z(0.795 bar) = 1 + 0.0006·0.79501. Against 101 325 Pa the figure is 2.6e-4
    // apart, so 1e-4 tells the two apart.
    const zAir = 1 + 0.0006 * (airPa / 1e5);
    const expectedMol = (0.05 * (fullAbsPa / 1.0601 - airPa / zAir)) / (R * temperatureK);
    expect(relative(card.cylinders?.perCylinderMol ?? 0, expectedMol)).toBeLessThan(1e-4);
  });
});

describe('fill card: cautions', () => {
  it('gives hydrogen’s flammability from the gas catalogue and defers to local codes', () => {
    const card = fillCard('envelope-sizing', hydrogenSizing, {
      fillerMassKg: 0.1,
      cylinder: { waterVolumeM3: 0.05, fillPressurePa: 2e7, temperatureK: 288.15 },
    });
    const texts = card.cautions.map((caution) => caution.text).join(' ');
    expect(texts).toContain(GAS_CATALOGUE.hydrogen.hazard.note);
    expect(texts).toMatch(/no sparks, open flames/);
    expect(texts).toMatch(/local fire and gas codes and licensed practice/);
    expect(card.cautions.map((caution) => caution.code)).toEqual([
      'flammable-gas',
      'pressurised-cylinder',
    ]);
  });

  it('tells the crew never to inhale helium', () => {
    const card = fillCard('envelope-sizing', heliumSizing, { fillerMassKg: 0.1 });
    expect(card.cautions[0]?.text).toContain(GAS_CATALOGUE.helium.hazard.note);
    expect(card.cautions[0]?.text).toContain('never inhale');
  });
});

describe('fill card: refusals name the field', () => {
  it.each([
    ['fillerMassKg', () => fillCard('envelope-sizing', heliumSizing, {})],
    ['fillerMassKg', () => fillCard('envelope-sizing', heliumSizing, { fillerMassKg: 0.9 })],
    ['fillerMassKg', () => fillCard('envelope-sizing', heliumSizing, { fillerMassKg: Number.NaN })],
    [
      'freeLiftKg',
      () => fillCard('envelope-sizing', heliumSizing, { fillerMassKg: 0.1, freeLiftKg: -1 }),
    ],
    // A film envelope (mass from its area) keeps its shape: it cannot take the gas a larger free
    // lift needs.
    [
      'freeLiftKg',
      () => fillCard('envelope-sizing', filmSizing, { fillerMassKg: 0.1, freeLiftKg: 0.5 }),
    ],
    ['kind', () => fillCard('lift-check', {}, { fillerMassKg: 0.1 })],
    [
      'cylinder.waterVolumeM3',
      () =>
        fillCard('envelope-sizing', heliumSizing, {
          fillerMassKg: 0.1,
          cylinder: { waterVolumeM3: 0, fillPressurePa: 2e7, temperatureK: 288.15 },
        }),
    ],
    [
      'cylinder.count',
      () =>
        fillCard('envelope-sizing', heliumSizing, {
          fillerMassKg: 0.1,
          cylinder: { waterVolumeM3: 0.05, fillPressurePa: 2e7, temperatureK: 288.15, count: 1.5 },
        }),
    ],
    [
      'cylinder',
      () =>
        fillCard(
          'envelope-sizing',
          { ...heliumSizing, gas: { gasId: 'methane' } },
          {
            fillerMassKg: 0.1,
            cylinder: { waterVolumeM3: 0.05, fillPressurePa: 2e7, temperatureK: 288.15 },
          },
        ),
    ],
  ])('refuses on %s', (field, call) => {
    expect(refusal(call).field).toBe(field);
  });
});

function flight() {
  return {
    envelope: { kind: 'extensible', launchDiameterM: 1.6, burstDiameterM: 6 },
    envelopeMassKg: 0.6,
    payloadMassKg: 0.9,
    gas: { gasId: 'helium' },
    launch: { altitudeM: 120 },
    parachute: { areaM2: 0.8 },
  };
}
