import { STANDARD_GRAVITY_M_PER_S2 } from '../constants.js';
import { type Derivation, v } from '../derivation.js';
import { SOURCES } from '../sources.js';

export interface LiftMasses {
  readonly displacedAirKg: number;
  readonly gasKg: number;
  readonly grossLiftKg: number;
  readonly netLiftKg: number;
  readonly freeLiftKg: number;
}

/**
 * Lift of an envelope as masses: gross = displaced air − gas, net = gross − envelope, free =
 * net − payload. Forces are these masses times g₀, the convention of lift "in kg" (kgf).
 */
export function liftMasses(
  volumeM3: number,
  airDensityKgM3: number,
  gasDensityKgM3: number,
  envelopeMassKg: number,
  payloadMassKg: number,
): LiftMasses {
  const displacedAirKg = volumeM3 * airDensityKgM3;
  const gasKg = volumeM3 * gasDensityKgM3;
  const grossLiftKg = displacedAirKg - gasKg;
  const netLiftKg = grossLiftKg - envelopeMassKg;
  return { displacedAirKg, gasKg, grossLiftKg, netLiftKg, freeLiftKg: netLiftKg - payloadMassKg };
}

/** Records the lift steps and publishes the lift outputs. */
export function deriveLift(
  d: Derivation,
  volumeM3: number,
  airDensityKgM3: number,
  gasDensityKgM3: number,
  envelopeMassKg: number,
  payloadMassKg: number,
): LiftMasses {
  const lift = liftMasses(volumeM3, airDensityKgM3, gasDensityKgM3, envelopeMassKg, payloadMassKg);
  d.step({
    id: 'displaced-air-mass',
    label: 'Mass of the air the envelope displaces',
    formula: 'm_air = ρ_air·V',
    values: [v('ρ_air', airDensityKgM3, 'kg/m³'), v('V', volumeM3, 'm³')],
    result: v('m_air', lift.displacedAirKg, 'kg'),
    source: SOURCES.archimedes,
  });
  d.step({
    id: 'gas-mass',
    label: 'Mass of the gas in the envelope',
    formula: 'm_gas = ρ_gas·V',
    values: [v('ρ_gas', gasDensityKgM3, 'kg/m³'), v('V', volumeM3, 'm³')],
    result: v('m_gas', lift.gasKg, 'kg'),
    source: SOURCES.idealGas,
  });
  d.step({
    id: 'gross-lift',
    label: 'Gross lift',
    formula: 'L_gross = m_air − m_gas',
    values: [v('m_air', lift.displacedAirKg, 'kg'), v('m_gas', lift.gasKg, 'kg')],
    result: v('L_gross', lift.grossLiftKg, 'kg'),
    source: SOURCES.liftDefinitions,
  });
  d.step({
    id: 'net-lift',
    label: 'Net lift (gross lift less the envelope)',
    formula: 'L_net = L_gross − m_env',
    values: [v('L_gross', lift.grossLiftKg, 'kg'), v('m_env', envelopeMassKg, 'kg')],
    result: v('L_net', lift.netLiftKg, 'kg'),
    source: SOURCES.liftDefinitions,
  });
  d.step({
    id: 'free-lift',
    label: 'Free lift (net lift less the payload)',
    formula: 'L_free = L_net − m_payload',
    values: [v('L_net', lift.netLiftKg, 'kg'), v('m_payload', payloadMassKg, 'kg')],
    result: v('L_free', lift.freeLiftKg, 'kg'),
    source: SOURCES.liftDefinitions,
  });
  const forces = [
    ['gross', 'Gross', lift.grossLiftKg],
    ['net', 'Net', lift.netLiftKg],
    ['free', 'Free', lift.freeLiftKg],
  ] as const;
  for (const [key, name, massKg] of forces) {
    d.step({
      id: `${key}-lift-force`,
      label: `${name} lift as a force`,
      formula: `F_${key} = L_${key}·g₀`,
      values: [v(`L_${key}`, massKg, 'kg'), v('g₀', STANDARD_GRAVITY_M_PER_S2, 'm/s²')],
      result: v(`F_${key}`, massKg * STANDARD_GRAVITY_M_PER_S2, 'N'),
      source: SOURCES.standardGravity,
    });
  }
  d.step({
    id: 'lift-per-litre',
    label: 'Gross lift per litre of gas',
    formula: 'ℓ = L_gross / V',
    values: [v('L_gross', lift.grossLiftKg * 1000, 'g'), v('V', volumeM3 * 1000, 'L')],
    result: v('ℓ', lift.grossLiftKg / volumeM3, 'g/L'),
    source: SOURCES.liftDefinitions,
  });
  return lift;
}
