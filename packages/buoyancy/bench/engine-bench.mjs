// Speed of the engine as shipped (dist), against goals stated as ratios and medians. Prints a
// table; it is a measurement, not a test, and always exits 0 unless the engine throws.
import { Bench } from 'tinybench';
import {
  driftTrack,
  evaluate,
  fastLift,
  flightPath,
  landingArea,
  liftSweeps,
  sweepSphereDiameter,
  windProfile,
} from '../dist/index.js';

const fastInput = {
  volumeM3: 0.0731,
  envelopeMassKg: 0.0246,
  payloadMassKg: 0.01,
  airTemperatureK: 293.15,
  airPressurePa: 101325,
  airVapourMoleFraction: 0,
  gas: { gasId: 'hydrogen', temperatureK: 293.15, pressurePa: 101325, purity: 0.98 },
};

// The same physics typed out inline: CIPM-2007 dry air, ideal gas with air as contaminant, lift.
function inlinedFreeLiftKg(
  volumeM3,
  envelopeMassKg,
  payloadMassKg,
  temperatureK,
  pressurePa,
  purity,
) {
  const t = temperatureK - 273.15;
  const pOverT = pressurePa / temperatureK;
  const z =
    1 - pOverT * (1.58123e-6 - 2.9331e-8 * t + 1.1043e-10 * t * t) + pOverT * pOverT * 1.83e-11;
  const airDensity = (pressurePa * 28.96546e-3) / (z * 8.314472 * temperatureK);
  const gasMolarMass = purity * 2.016e-3 + (1 - purity) * 28.96546e-3;
  const gasDensity = (pressurePa * gasMolarMass) / (8.314462618 * temperatureK);
  return volumeM3 * (airDensity - gasDensity) - envelopeMassKg - payloadMassKg;
}

const flightInputs = {
  envelope: { kind: 'extensible', launchDiameterM: 1.6, burstDiameterM: 6 },
  envelopeMassKg: 0.6,
  payloadMassKg: 0.9,
  gas: { gasId: 'helium' },
  launch: { altitudeM: 100 },
  timeStepS: 1,
};

// The lift check the web's lift charts draw: its size, air-temperature and purity sweeps.
const chartedLiftCheck = {
  envelope: { shape: 'sphere', diameterM: 1.4 },
  envelopeMass: { kind: 'areal', arealDensityKgM2: 0.05, fittingsKg: 0.02 },
  payloadMassKg: 0.25,
  gas: { gasId: 'hydrogen', purity: 0.97 },
  ambient: {
    mode: 'measured',
    temperatureK: 288.15,
    pressurePa: 101325,
    humidity: { kind: 'relative', relativeHumidity: 0.5 },
  },
};

// The same three sweeps as the web built them before they moved into the engine: the full
// evaluate('lift-check', ...) at each of the 61 points of a curve, and once for its design point.
function sweepsThroughEvaluate(inputs) {
  const liftAt = (changed, x) => {
    try {
      const { outputs } = evaluate('lift-check', changed);
      return { x, netKg: outputs.netLift.value, freeKg: outputs.freeLift.value };
    } catch {
      return undefined;
    }
  };
  const sweep = (from, to, inputsAt) => {
    const points = [];
    for (let index = 0; index <= 60; index += 1) {
      const x = from + ((to - from) * index) / 60;
      const point = liftAt(inputsAt(x), x);
      if (point) points.push(point);
    }
    return points;
  };
  const { envelope, ambient, gas } = inputs;
  return [
    {
      design: liftAt(inputs, envelope.diameterM),
      points: sweep(0.4 * envelope.diameterM, 2 * envelope.diameterM, (diameterM) => ({
        ...inputs,
        envelope: { ...envelope, diameterM },
      })),
    },
    {
      design: liftAt(inputs, ambient.temperatureK),
      points: sweep(ambient.temperatureK - 25, ambient.temperatureK + 25, (temperatureK) => ({
        ...inputs,
        ambient: { ...ambient, temperatureK },
      })),
    },
    {
      design: liftAt(inputs, gas.purity),
      points: sweep(0.5, 1, (purity) => ({ ...inputs, gas: { ...gas, purity } })),
    },
  ];
}

// A typical flight (the flight-profile example with a parachute, 1 s steps to burst near 26 km
// and down) under a 40-level wind profile from the ground to 30 km, veering and strengthening
// to a jet near 11 km. The path is integrated once; the drift runs against two profiles in turn.
const driftPath = flightPath({
  envelope: { kind: 'extensible', launchDiameterM: 1.6, burstDiameterM: 6 },
  envelopeMassKg: 0.6,
  payloadMassKg: 0.9,
  gas: { gasId: 'helium' },
  launch: { altitudeM: 120 },
  parachute: { areaM2: 0.8 },
});
const driftWinds = [0, 7].map((turnDeg) =>
  windProfile({
    layers: Array.from({ length: 40 }, (_, index) => {
      const heightM = index * 770;
      return {
        heightM,
        directionDeg: (240 + turnDeg + index * 2) % 360,
        speedMS: 5 + 35 * Math.exp(-(((heightM - 11000) / 4000) ** 2)),
        temperatureK: 288 - Math.min(heightM, 11000) * 0.0065,
      };
    }),
  }),
);
const driftPoints = driftPath.ascent.length + driftPath.descent.length;

// The landing area of the same flight under the first of those profiles (its temperatures make the
// air too): 200 runs with the default spreads, seed 1. Each sample takes a few hundred
// milliseconds, so it has a bench of its own with few samples.
const landingInput = {
  envelope: { kind: 'extensible', launchDiameterM: 1.6, burstDiameterM: 6 },
  envelopeMassKg: 0.6,
  payloadMassKg: 0.9,
  gas: { gasId: 'helium' },
  launch: { altitudeM: 120, latitudeDeg: 52.2, longitudeDeg: 0.12 },
  parachute: { areaM2: 0.8 },
  wind: {
    layers: Array.from({ length: 40 }, (_, index) => {
      const heightM = index * 770;
      return {
        heightM,
        directionDeg: (240 + index * 2) % 360,
        speedMS: 5 + 35 * Math.exp(-(((heightM - 11000) / 4000) ** 2)),
        temperatureK: 288 - Math.min(heightM, 11000) * 0.0065,
      };
    }),
  },
  landingArea: { runs: 200, seed: 1 },
};
const landingBench = new Bench({ time: 2000, iterations: 9, warmupTime: 0, warmupIterations: 1 });
landingBench.add('landing area: 200 runs, 40-level profile', () => {
  sink += landingArea(landingInput).regions[1].areaM2;
});

// Two inputs alternated, so neither side can be folded into a constant.
const fastInputs = [fastInput, { ...fastInput, volumeM3: 0.0732 }];
const volumes = [0.0731, 0.0732];
let sink = 0;
let turn = 0;
const bench = new Bench({ time: 1500, warmupTime: 300 });
bench
  .add('lift check without steps (fastLift)', () => {
    turn ^= 1;
    sink += fastLift(fastInputs[turn]).freeLiftKg;
  })
  .add('hand-inlined lift formula', () => {
    turn ^= 1;
    sink += inlinedFreeLiftKg(volumes[turn], 0.0246, 0.01, 293.15, 101325, 0.98);
  })
  .add('1,000-point diameter sweep', () => {
    const sweep = sweepSphereDiameter(
      fastInput,
      { fixedMassKg: 0, arealDensityKgM2: 0.05 },
      0.1,
      3,
      1000,
    );
    sink += sweep[999].freeLiftKg;
  })
  .add('lift-check chart sweeps through evaluate (3 × 61 points)', () => {
    sink += sweepsThroughEvaluate(chartedLiftCheck)[2].points[60].freeKg;
  })
  .add('lift-check chart sweeps on the fast path (liftSweeps)', () => {
    sink += liftSweeps('lift-check', chartedLiftCheck)[2].points[60].freeKg;
  })
  .add('flight profile to burst at 1 s steps (with steps and series)', () => {
    sink += evaluate('flight-profile', flightInputs).outputs.ascentTime.value;
  })
  .add('drift of a typical flight through a 40-level wind profile', () => {
    turn ^= 1;
    sink += driftTrack({
      launch: { latitudeDeg: 52.2, longitudeDeg: 0.12, altitudeM: 120 },
      ascent: driftPath.ascent,
      descent: driftPath.descent,
      wind: driftWinds[turn],
    }).groundDistanceM;
  })
  .add('lift check through evaluate (validation and derivation)', () => {
    sink += evaluate('lift-check', {
      envelope: { shape: 'sphere', diameterM: 0.52 },
      envelopeMass: { kind: 'fixed', massKg: 0.0246 },
      payloadMassKg: 0.01,
      gas: { gasId: 'hydrogen', purity: 0.98 },
      ambient: { mode: 'measured', temperatureK: 293.15, pressurePa: 101325 },
    }).outputs.freeLift.value;
  });

await bench.run();
await landingBench.run();

const median = (name) => {
  const task = [...bench.tasks, ...landingBench.tasks].find((candidate) => candidate.name === name);
  const latency = task?.result?.latency;
  if (!latency) throw new Error(`no result for ${name}`);
  return latency.p50;
};
const ms = (value) => `${value.toFixed(4)} ms`;
const fast = median('lift check without steps (fastLift)');
const inlined = median('hand-inlined lift formula');
const sweep = median('1,000-point diameter sweep');
const flight = median('flight profile to burst at 1 s steps (with steps and series)');
const full = median('lift check through evaluate (validation and derivation)');
const slowSweeps = median('lift-check chart sweeps through evaluate (3 × 61 points)');
const fastSweeps = median('lift-check chart sweeps on the fast path (liftSweeps)');

const drift = median('drift of a typical flight through a 40-level wind profile');
const landing = median('landing area: 200 runs, 40-level profile');

const rows = [
  [
    'lift check without steps / inlined formula',
    `${(fast / inlined).toFixed(2)} x`,
    '<= 3 x',
    fast / inlined <= 3,
  ],
  ['1,000-point diameter sweep, median', ms(sweep), '< 2 ms', sweep < 2],
  ['lift-check chart sweeps (liftSweeps), median', ms(fastSweeps), '< 1 ms', fastSweeps < 1],
  [
    'lift-check chart sweeps through evaluate / liftSweeps',
    `${(slowSweeps / fastSweeps).toFixed(1)} x`,
    '(for information)',
    true,
  ],
  ['flight profile to burst at 1 s steps, median', ms(flight), '< 10 ms', flight < 10],
  [
    `drift of a typical flight (${driftPoints} path points, 40 levels), median`,
    ms(drift),
    '< 2.5 ms (200 runs in 500 ms)',
    drift < 2.5,
  ],
  ['landing area, 200 runs through 40 levels, median', ms(landing), '< 500 ms', landing < 500],
  [
    'lift check through evaluate / without steps',
    `${(full / fast).toFixed(1)} x`,
    '(for information)',
    true,
  ],
];
console.log(
  `\n@loftwright/buoyancy benchmark (Node ${process.version}, medians of tinybench samples)`,
);
console.table([...bench.table(), ...landingBench.table()]);
for (const [what, measured, goal, met] of rows) {
  console.log(`${met ? 'meets ' : 'MISSES'}  ${what}: ${measured} (goal ${goal})`);
}
if (!Number.isFinite(sink)) throw new Error('benchmark produced a non-finite result');
