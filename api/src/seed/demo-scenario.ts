import type { Role } from '../users/roles';
import type { Visibility } from '../calculations/calculation.entity';

/**
 * The demo: an invented club, the Saltmarsh Lofting Collective, sizing envelopes for invented
 * payloads. Only the demo seed uses these names and numbers.
 */
export const DEMO_ACCOUNTS: readonly {
  key: string;
  email: string;
  displayName: string;
  roles: Role[];
}[] = [
  { key: 'admin', email: 'admin@demo.test', displayName: 'Ada Marlowe', roles: ['admin'] },
  { key: 'designer', email: 'designer@demo.test', displayName: 'Tomas Reyne', roles: ['designer'] },
  { key: 'reviewer', email: 'reviewer@demo.test', displayName: 'Ilse Varga', roles: ['reviewer'] },
  { key: 'teacher', email: 'teacher@demo.test', displayName: 'Noor Haddad', roles: ['teacher'] },
  { key: 'student', email: 'student@demo.test', displayName: 'Felix Brandt', roles: ['student'] },
];

export type DemoStage = 'draft' | 'in_review' | 'approved' | 'changes_requested';

export interface DemoCalculation {
  owner: 'designer' | 'teacher';
  title: string;
  kind: string;
  visibility: Visibility;
  tags: string[];
  /** Each entry is one saved version, oldest first. */
  versions: { inputs: Record<string, unknown>; note: string }[];
  /** What happens to the newest version. */
  stage: DemoStage;
  reviewComment?: string;
}

const marshAir = {
  mode: 'measured',
  temperatureK: 285.15,
  pressurePa: 101100,
  humidity: { kind: 'relative', relativeHumidity: 0.7 },
};

export const DEMO_CALCULATIONS: readonly DemoCalculation[] = [
  {
    owner: 'designer',
    title: 'Curlew air-sampling pod: envelope size',
    kind: 'envelope-sizing',
    visibility: 'team',
    tags: ['curlew', 'spring-campaign'],
    versions: [
      {
        note: 'First sizing with the catalogue film mass',
        inputs: {
          shape: { shape: 'sphere' },
          envelopeMass: { kind: 'areal', arealDensityKgM2: 0.045, fittingsKg: 0.03 },
          payloadMassKg: 0.62,
          target: { kind: 'freeLift', freeLiftKg: 0.35 },
          gas: { gasId: 'helium' },
          ambient: marshAir,
        },
      },
      {
        note: 'Weighed film sample: 52 g/m²',
        inputs: {
          shape: { shape: 'sphere' },
          envelopeMass: { kind: 'areal', arealDensityKgM2: 0.052, fittingsKg: 0.03 },
          payloadMassKg: 0.62,
          target: { kind: 'freeLift', freeLiftKg: 0.35 },
          gas: { gasId: 'helium' },
          ambient: marshAir,
        },
      },
    ],
    stage: 'approved',
    reviewComment: 'Film mass now from the weighed sample. Approved for the spring fills.',
  },
  {
    owner: 'designer',
    title: 'Curlew pod: flight to burst',
    kind: 'flight-profile',
    visibility: 'team',
    tags: ['curlew', 'spring-campaign'],
    versions: [
      {
        note: 'Maker’s burst diameter 5.8 m, 0.9 m² canopy',
        inputs: {
          envelope: { kind: 'extensible', launchDiameterM: 1.55, burstDiameterM: 5.8 },
          envelopeMassKg: 0.5,
          payloadMassKg: 0.62,
          gas: { gasId: 'helium' },
          launch: { altitudeM: 4, temperatureOffsetK: -3 },
          parachute: { areaM2: 0.9 },
        },
      },
    ],
    stage: 'in_review',
  },
  {
    owner: 'designer',
    title: 'Shore anemometer, tethered capsule: lift check',
    kind: 'lift-check',
    visibility: 'private',
    tags: ['tethered', 'anemometer'],
    versions: [
      {
        note: 'Hydrogen from the bench electrolyser, assumed 97 % pure',
        inputs: {
          envelope: { shape: 'capsule', diameterM: 1.1, lengthM: 3.2 },
          envelopeMass: { kind: 'fixed', massKg: 0.85 },
          payloadMassKg: 0.9,
          gas: { gasId: 'hydrogen', purity: 0.97, relativeHumidity: 1 },
          ambient: marshAir,
        },
      },
    ],
    stage: 'changes_requested',
    reviewComment: 'Tether line and swivel are missing from the payload; add them (about 180 g).',
  },
  {
    owner: 'designer',
    title: 'Bench electrolyser: gas and cost for the spring fills',
    kind: 'gas-supply',
    visibility: 'team',
    tags: ['spring-campaign', 'hydrogen'],
    versions: [
      {
        note: 'Six fills of the anemometer capsule',
        inputs: {
          fill: { volumeM3: 2.7, temperatureK: 288.15, pressurePa: 101100, count: 6 },
          electrolyser: {
            currentA: 40,
            cellsInSeries: 8,
            faradaicEfficiency: 0.93,
            voltage: { kind: 'cell', cellVoltageV: 2.05 },
            supplyEfficiency: 0.87,
          },
          cylinder: {
            gasId: 'helium',
            waterVolumeM3: 0.05,
            fillPressurePa: 2e7,
            temperatureK: 288.15,
          },
          prices: { currency: 'EUR', electricityPerKWh: 0.31, cylinderEach: 340, bulkGasPerM3: 38 },
        },
      },
    ],
    stage: 'draft',
  },
  {
    owner: 'designer',
    title: 'Foil marker cushion: float altitude',
    kind: 'flight-profile',
    visibility: 'private',
    tags: ['foil'],
    versions: [
      {
        note: 'Cushion of 0.9 m discs',
        inputs: {
          envelope: { kind: 'fixed', shape: { shape: 'cushion', flatDiameterM: 0.9 } },
          envelopeMassKg: 0.03,
          payloadMassKg: 0.012,
          gas: { gasId: 'helium' },
          launch: { altitudeM: 4 },
        },
      },
      {
        note: 'Lighter tag, 8 g',
        inputs: {
          envelope: { kind: 'fixed', shape: { shape: 'cushion', flatDiameterM: 0.9 } },
          envelopeMassKg: 0.03,
          payloadMassKg: 0.008,
          gas: { gasId: 'helium' },
          launch: { altitudeM: 4 },
        },
      },
    ],
    stage: 'draft',
  },
  {
    owner: 'teacher',
    title: 'Worked example: lift of one cubic metre of helium at the coast',
    kind: 'lifting-gas',
    visibility: 'published',
    tags: ['classroom'],
    versions: [
      {
        note: 'For the buoyancy lesson',
        inputs: {
          gas: { gasId: 'helium' },
          ambient: { mode: 'measured', temperatureK: 288.15, pressurePa: 101325 },
        },
      },
    ],
    stage: 'draft',
  },
];

const HOUR_S = 3600;

/**
 * A fill of the anemometer capsule in the boat shed, weighed against a 3 kg sandbag as the night
 * cooled and the hydrogen slowly leaked.
 */
export const DEMO_FILL_LOGS = [
  {
    calculationTitle: 'Shore anemometer, tethered capsule: lift check',
    filledAt: '2026-11-21T16:20:00Z',
    place: 'Boat shed, north dyke',
    envelopeLabel: 'Capsule B (grey)',
    gasSource: 'electrolysis',
    ambient: { temperatureK: 284.65, pressurePa: 101050, relativeHumidity: 0.74 },
    note: 'Scale zeroed with the sandbag alone before tying on.',
    readings: [
      { kind: 'ballast', timeS: 0, ballastMassKg: 3, scaleReadingKg: 1.13 },
      {
        kind: 'ballast',
        timeS: 6 * HOUR_S,
        ballastMassKg: 3,
        scaleReadingKg: 1.16,
        airTemperatureK: 281.9,
      },
      {
        kind: 'ballast',
        timeS: 24 * HOUR_S,
        ballastMassKg: 3,
        scaleReadingKg: 1.24,
        airTemperatureK: 283.4,
      },
      {
        kind: 'ballast',
        timeS: 48 * HOUR_S,
        ballastMassKg: 3,
        scaleReadingKg: 1.33,
        airTemperatureK: 284.1,
      },
    ],
  },
] as const;

/** The collective's spring launch weekend: sondes from the sizing, pilots, and the capsule. */
export const DEMO_PLANS = [
  {
    title: 'Spring launch weekend on the dyke',
    eventDate: '2027-04-17',
    lines: [
      { calculationTitle: 'Curlew air-sampling pod: envelope size', count: 3 },
      { calculationTitle: 'Shore anemometer, tethered capsule: lift check', count: 1 },
      { label: 'Pilot balloons for wind', diameterM: 0.6, count: 8 },
    ],
    fill: { temperatureK: 283.15, pressurePa: 101300 },
    electrolyser: {
      currentA: 30,
      cellsInSeries: 6,
      faradaicEfficiency: 0.95,
      voltage: { kind: 'cell' as const, cellVoltageV: 2.1 },
      supplyEfficiency: 0.88,
    },
    cylinder: { gasId: 'helium', waterVolumeM3: 0.05, fillPressurePa: 2e7, temperatureK: 283.15 },
    prices: { currency: 'EUR', electricityPerKWh: 0.31, cylinderEach: 335, bulkGasPerM3: 42 },
    pricesDate: '2026-11-30',
  },
] as const;
