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
    title: 'Curlew pod: launch-day drift',
    kind: 'flight-profile',
    visibility: 'team',
    tags: ['curlew', 'spring-campaign', 'launch-day'],
    versions: [
      {
        // An invented morning: a light westerly veering into a jet near 10 km, temperatures
        // a little cooler than the standard, the team's field inland of the marsh.
        note: 'Morning forecast winds from the inland field; parachute 0.9 m², 0.2 kg of the burst envelope stays on the line',
        inputs: {
          envelope: { kind: 'extensible', launchDiameterM: 1.55, burstDiameterM: 5.8 },
          envelopeMassKg: 0.5,
          payloadMassKg: 0.62,
          gas: { gasId: 'helium' },
          launch: {
            altitudeM: 4,
            latitudeDeg: 52.6214,
            longitudeDeg: -1.1862,
            time: '2027-04-17T07:30:00+01:00',
          },
          parachute: { areaM2: 0.9, envelopeRemnantMassKg: 0.2 },
          wind: {
            layers: [
              { heightM: 4, directionDeg: 250, speedMS: 3, temperatureK: 281.2 },
              { heightM: 1500, directionDeg: 260, speedMS: 9, temperatureK: 273.4 },
              { heightM: 5000, directionDeg: 265, speedMS: 18, temperatureK: 250.6 },
              { heightM: 10000, directionDeg: 275, speedMS: 42, temperatureK: 220.1 },
              { heightM: 12000, directionDeg: 272, speedMS: 30, temperatureK: 215.2 },
              { heightM: 20000, directionDeg: 255, speedMS: 8, temperatureK: 216.0 },
              { heightM: 28000, directionDeg: 95, speedMS: 6, temperatureK: 224.5 },
            ],
          },
        },
      },
    ],
    stage: 'draft',
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
  {
    owner: 'teacher',
    title: 'Lesson: helium lift per litre in standard sea-level air',
    kind: 'lifting-gas',
    visibility: 'private',
    tags: ['classroom'],
    versions: [
      {
        note: 'Standard atmosphere at sea level',
        inputs: { gas: { gasId: 'helium' }, ambient: { mode: 'standard', altitudeM: 0 } },
      },
    ],
    stage: 'draft',
  },
  {
    owner: 'teacher',
    title: 'Lesson: where a rigid 2 m sphere floats',
    kind: 'flight-profile',
    visibility: 'private',
    tags: ['classroom'],
    versions: [
      {
        note: 'Film and tag weigh 106.7 g together',
        inputs: {
          envelope: { kind: 'fixed', shape: { shape: 'sphere', diameterM: 2 } },
          envelopeMassKg: 0.0747,
          payloadMassKg: 0.032,
          gas: { gasId: 'helium' },
          launch: { altitudeM: 0 },
        },
      },
    ],
    stage: 'draft',
  },
  {
    owner: 'teacher',
    title: 'Lesson: hydrogen from a four-cell electrolyser',
    kind: 'gas-supply',
    visibility: 'private',
    tags: ['classroom', 'hydrogen'],
    versions: [
      {
        note: '100 litres at 0 °C and one atmosphere',
        inputs: {
          fill: { volumeM3: 0.1, temperatureK: 273.15, pressurePa: 101325, count: 1 },
          electrolyser: {
            currentA: 20,
            cellsInSeries: 4,
            faradaicEfficiency: 1,
            voltage: { kind: 'cell', cellVoltageV: 2 },
            supplyEfficiency: 1,
          },
        },
      },
    ],
    stage: 'draft',
  },
];

/**
 * The demo class: a school physics group that the demo teacher runs and the demo student has
 * joined, with three worked examples whose intros name the outside source a class can check the
 * numbers against.
 */
export const DEMO_CLASSROOM = {
  title: 'Harbour Road School, Physics 11: buoyancy week',
  examples: [
    {
      calculationTitle: 'Lesson: helium lift per litre in standard sea-level air',
      title: 'How much does a litre of helium lift?',
      intro:
        'A party balloon holds a few litres of helium. How many grams can one litre hold up? ' +
        'Work out the density of the air and of the helium with the ideal-gas law, ρ = pM/(RT), ' +
        'then the difference. Check: the U.S. Standard Atmosphere 1976 (Table I) gives sea-level ' +
        'air 1.2250 kg/m³; helium at 15 °C and 101.325 kPa is 0.1693 kg/m³ (M = 4.002602 g/mol, ' +
        'CIAAW), so one cubic metre lifts 1.056 kg and one litre about 1.06 g.',
      stepNotes: {
        'air-density': 'M₀ = 28.9644 g/mol is the mean molar mass of dry air in the 1976 standard.',
        'lift-per-cubic-metre': 'Gross lift: the air pushed aside minus the gas doing the pushing.',
      },
      tryRanges: { 'ambient.altitudeM': { min: 0, max: 5000 } },
      chartStepId: null,
      exercise: { hiddenOutputs: ['airDensity', 'liftPerCubicMetre'], tolerancePercent: 2 },
    },
    {
      calculationTitle: 'Lesson: where a rigid 2 m sphere floats',
      title: 'Where does a rigid sphere stop rising?',
      intro:
        'A sphere that cannot stretch rises until the air it pushes aside weighs as much as the ' +
        'whole balloon: film, tag and the helium inside. Find that float density, then read the ' +
        'height from the U.S. Standard Atmosphere 1976 table: at 15 000 m (geometric) it lists ' +
        'ρ = 0.194 76 kg/m³. Free balloons fall under aviation rules (in the U.S., 14 CFR Part ' +
        '101); launch only where and as your aviation authority allows.',
      stepNotes: {
        'gas-mass': 'The helium is filled at sea level and stays sealed in: its mass is fixed.',
        'float-density': 'Everything that has to be held up, divided by the volume.',
        'float-altitude': 'Look for the height where the table’s density equals ρ_f.',
      },
      tryRanges: {
        payloadMassKg: { min: 0.005, max: 0.3 },
        'envelope.shape.diameterM': { min: 1.5, max: 3 },
      },
      chartStepId: 'float-altitude',
      exercise: null,
    },
    {
      calculationTitle: 'Lesson: hydrogen from a four-cell electrolyser',
      title: 'How long does the electrolyser run for 100 litres?',
      intro:
        'Faraday’s law: two electrons free one molecule of hydrogen, so one ampere through one ' +
        'cell makes I/(2F) = 5.182 × 10⁻⁶ mol/s (F = 96 485.332 C/mol, CODATA 2018), ' +
        '0.418 L an hour at 0 °C and one atmosphere. Four cells in series at 20 A therefore ' +
        'need 2391.5 A·h per normal cubic metre ÷ 80 A ≈ 3.0 h for 100 L. Hydrogen burns in ' +
        'air from about 4 % to 75 %: vent the cell outdoors, keep sparks and flames away, and ' +
        'follow your school’s rules for mains-powered and high-current supplies.',
      stepNotes: {
        'hydrogen-rate': 'n′ = N·I·η / (2F): every cell in the stack makes its own share.',
        'electrical-energy': 'Energy is power times time; the cell voltage sets the power.',
      },
      tryRanges: {
        'electrolyser.currentA': { min: 5, max: 40 },
        'electrolyser.voltage.cellVoltageV': { min: 1.5, max: 2.5 },
      },
      chartStepId: null,
      exercise: { hiddenOutputs: ['timeToFill'], tolerancePercent: 2 },
    },
  ],
} as const;

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
