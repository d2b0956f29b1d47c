import { InputError } from '../errors.js';
import { envelopeAtSize, type EnvelopeSizingValues } from '../kinds/envelope-sizing.kind.js';
import type { Continuation, ContinuationDraft, SourceOutputs } from './continuation-types.js';
import { sizingEnvelopeStretches } from './sizing-stretches.js';
import { exampleValue, requiredOutput } from './source-values.js';

interface Part {
  readonly inputs: Record<string, unknown>;
  readonly filled: readonly string[];
  readonly needs?: readonly string[];
  readonly notes?: readonly string[];
}

/**
 * The envelope. A sizing's envelope keeps its proportions (it never stretches), so it flies as a
 * fixed-volume envelope of the solved shape. One exception: a sphere given by its mass, as
 * stretching (latex) envelopes are sold, continues as a stretching envelope launched at the solved
 * diameter; its burst diameter comes from its maker, which the sizing does not know.
 */
function envelopePart(sizing: EnvelopeSizingValues, sizeM: number): Part {
  if (!sizingEnvelopeStretches(sizing, sizeM)) {
    return {
      inputs: { envelope: { kind: 'fixed', shape: envelopeAtSize(sizing.shape, sizeM) } },
      filled: ['envelope'],
      notes: [
        'The sized envelope keeps its shape, so it flies as a fixed-volume envelope: the flight shows where it floats.',
      ],
    };
  }
  const burstDiameterM = exampleValue('flight-profile', 'envelope.burstDiameterM') as number;
  // A stretching envelope bursts, and only a parachute brings the payload down to a landing
  // point; the sizing knows nothing of the team's canopy.
  const parachuteAreaM2 = exampleValue('flight-profile', 'parachute.areaM2') as number;
  return {
    inputs: {
      envelope: { kind: 'extensible', launchDiameterM: sizeM, burstDiameterM },
      parachute: { areaM2: parachuteAreaM2 },
    },
    filled: ['envelope.kind', 'envelope.launchDiameterM'],
    needs: ['envelope.burstDiameterM', 'parachute.areaM2'],
    notes: [
      'A sphere given by its mass continues as a stretching (latex) envelope launched at the sized diameter. Its burst diameter is the maker’s figure: replace the example value.',
      'After burst the payload comes down under a parachute: replace the example canopy area with your parachute’s.',
    ],
  };
}

/** Launch site air: the sizing's standard-atmosphere altitude and temperature offset. */
function launchPart(sizing: EnvelopeSizingValues): Part {
  if (sizing.ambient.mode === 'standard') {
    return {
      inputs: {
        launch: {
          altitudeM: sizing.ambient.altitudeM,
          temperatureOffsetK: sizing.ambient.temperatureOffsetK,
        },
      },
      filled: ['launch.altitudeM', 'launch.temperatureOffsetK'],
    };
  }
  // Measured air carries no altitude; the flight needs the launch site's.
  return {
    inputs: { launch: { altitudeM: exampleValue('flight-profile', 'launch.altitudeM') } },
    filled: [],
    needs: ['launch.altitudeM'],
    notes: ['The sizing used measured air, which has no altitude: give the launch site’s.'],
  };
}

function gasPart(sizing: EnvelopeSizingValues): Part {
  if (sizing.gas.gasId === 'hot-air') {
    throw new InputError(
      'gas.gasId',
      sizing.gas.gasId,
      'a flight profile is for a lifting gas; a heated-air envelope does not continue into one',
    );
  }
  return {
    inputs: { gas: { gasId: sizing.gas.gasId, purity: sizing.gas.purity } },
    filled: ['gas.gasId', 'gas.purity'],
  };
}

function dragPart(sizing: EnvelopeSizingValues): Part {
  if (sizing.target.kind !== 'ascentRate') return { inputs: {}, filled: [] };
  return {
    inputs: { dragCoefficient: sizing.target.dragCoefficient },
    filled: ['dragCoefficient'],
  };
}

function mergeParts(parts: readonly Part[]): ContinuationDraft {
  return {
    inputs: Object.assign({}, ...parts.map((part) => part.inputs)) as Record<string, unknown>,
    filled: parts.flatMap((part) => part.filled),
    needs: parts.flatMap((part) => part.needs ?? []),
    notes: parts.flatMap((part) => part.notes ?? []),
  };
}

/** A sized envelope, its payload and gas become a flight profile's inputs. */
export function sizingToFlight(fromInputs: unknown, fromOutputs: SourceOutputs): ContinuationDraft {
  const sizing = fromInputs as EnvelopeSizingValues;
  const sizeM = requiredOutput(fromOutputs, 'size', 'm');
  const envelopeMassKg = requiredOutput(fromOutputs, 'envelopeMass', 'kg');
  return mergeParts([
    envelopePart(sizing, sizeM),
    {
      inputs: { envelopeMassKg, payloadMassKg: sizing.payloadMassKg },
      filled: ['envelopeMassKg', 'payloadMassKg'],
    },
    gasPart(sizing),
    launchPart(sizing),
    dragPart(sizing),
  ]);
}

export const SIZING_TO_FLIGHT: Continuation = {
  fromKind: 'envelope-sizing',
  toKind: 'flight-profile',
  title: 'Flight profile',
  map: sizingToFlight,
};
