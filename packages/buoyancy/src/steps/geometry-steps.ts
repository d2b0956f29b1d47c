import { type Derivation, v } from '../derivation.js';
import {
  CUSHION_RADIUS_RATIO,
  envelopeGeometry,
  type EnvelopeGeometry,
  type EnvelopeShape,
} from '../envelope/envelope-geometry.js';
import type { EnvelopeInput, EnvelopeMassInput } from '../schema/envelope-schema.js';
import { SOURCES } from '../sources.js';

/** Reduces the sphere variants to a diameter, recording the conversion as a step. */
function toShape(d: Derivation, envelope: EnvelopeInput): EnvelopeShape {
  switch (envelope.shape) {
    case 'sphere-radius':
      return {
        shape: 'sphere',
        diameterM: d.step({
          id: 'diameter',
          label: 'Diameter from the radius',
          formula: 'd = 2·r',
          values: [v('r', envelope.radiusM, 'm')],
          result: v('d', 2 * envelope.radiusM, 'm'),
          source: SOURCES.sphere,
        }),
      };
    case 'sphere-circumference':
      return {
        shape: 'sphere',
        diameterM: d.step({
          id: 'diameter',
          label: 'Diameter from the measured circumference',
          formula: 'd = C / π',
          values: [v('C', envelope.circumferenceM, 'm')],
          result: v('d', envelope.circumferenceM / Math.PI, 'm'),
          source: SOURCES.sphere,
        }),
      };
    default:
      return envelope;
  }
}

const FORMULAS: Record<
  EnvelopeShape['shape'],
  { volume: string; surface: string; frontal: string; source: string; frontalSource: string }
> = {
  sphere: {
    volume: 'V = π·d³ / 6',
    surface: 'S = π·d²',
    frontal: 'A = π·d² / 4',
    source: SOURCES.sphere,
    frontalSource: SOURCES.frontalCircle,
  },
  spheroid: {
    volume: 'V = (4/3)·π·a²·c',
    surface: 'S = 2πa²·(1 + (1 − e²)/e·artanh e) (oblate) or 2πa²·(1 + c/(a·e)·arcsin e) (prolate)',
    frontal: 'A = π·a²',
    source: SOURCES.spheroid,
    frontalSource: SOURCES.frontalCircle,
  },
  capsule: {
    volume: 'V = π·r²·(L − d) + (4/3)·π·r³',
    surface: 'S = 2π·r·(L − d) + 4π·r²',
    frontal: 'A = π·r²',
    source: SOURCES.capsule,
    frontalSource: SOURCES.frontalCircle,
  },
  cushion: {
    volume: 'V = (2/3)·π·a·r², r = a / 1.3110287771',
    surface: 'S = π²·r²',
    frontal: 'A = π·r² (face on)',
    source: SOURCES.cushion,
    frontalSource: `${SOURCES.frontalCircle}; inflated radius: ${SOURCES.cushion}`,
  },
  custom: {
    volume: 'V = V_given',
    surface: 'S = S_given, else that of the sphere of volume V',
    frontal: 'A = A_given, else that of the sphere of volume V',
    source: SOURCES.given,
    frontalSource: SOURCES.given,
  },
};

function shapeValues(shape: EnvelopeShape) {
  switch (shape.shape) {
    case 'sphere':
      return [v('d', shape.diameterM, 'm')];
    case 'spheroid':
      return [v('a', shape.equatorialDiameterM / 2, 'm'), v('c', shape.polarDiameterM / 2, 'm')];
    case 'capsule':
      return [
        v('d', shape.diameterM, 'm'),
        v('r', shape.diameterM / 2, 'm'),
        v('L', shape.lengthM, 'm'),
      ];
    case 'cushion':
      return [
        v('a', shape.flatDiameterM / 2, 'm'),
        v('r', shape.flatDiameterM / 2 / CUSHION_RADIUS_RATIO, 'm'),
      ];
    case 'custom':
      return [v('V_given', shape.volumeM3, 'm³')];
  }
}

/** Derives volume, surface and frontal area of the envelope, one step each. */
export function deriveGeometry(d: Derivation, envelope: EnvelopeInput): EnvelopeGeometry {
  const shape = toShape(d, envelope);
  const geometry = envelopeGeometry(shape);
  const formulas = FORMULAS[shape.shape];
  const values = shapeValues(shape);
  d.step({
    id: 'volume',
    label: 'Envelope volume',
    formula: formulas.volume,
    values,
    result: v('V', geometry.volumeM3, 'm³'),
    source: formulas.source,
  });
  d.step({
    id: 'surface-area',
    label: 'Envelope surface area',
    formula: formulas.surface,
    values,
    result: v('S', geometry.surfaceAreaM2, 'm²'),
    source: formulas.source,
  });
  const sideways = shape.shape === 'capsule' && shape.axis === 'horizontal';
  d.step({
    id: 'frontal-area',
    label: sideways
      ? 'Frontal area (side first: the outline across the axis)'
      : 'Frontal area (facing the direction of motion)',
    formula: sideways ? 'A = d·(L − d) + π·r²' : formulas.frontal,
    values,
    result: v('A', geometry.frontalAreaM2, 'm²'),
    source: sideways ? SOURCES.frontalOutline : formulas.frontalSource,
  });
  if (shape.shape === 'cushion') {
    // The film cut differs from the inflated surface only for the flat-seamed cushion.
    d.step({
      id: 'film-area',
      label: 'Film cut for the envelope (two flat discs)',
      formula: 'S_film = 2·π·(D/2)²',
      values: [v('D', shape.flatDiameterM, 'm')],
      result: v('S_film', geometry.filmAreaM2, 'm²'),
      source: SOURCES.disc,
    });
  }
  return geometry;
}

/** Derives the envelope's mass: as given, or film mass per area times surface plus fittings. */
export function deriveEnvelopeMass(
  d: Derivation,
  mass: EnvelopeMassInput,
  geometry: EnvelopeGeometry,
): number {
  const filmAreaM2 = geometry.filmAreaM2;
  const film = filmAreaM2 === geometry.surfaceAreaM2 ? 'S' : 'S_film';
  if (mass.kind === 'fixed') {
    return d.step({
      id: 'envelope-mass',
      label: 'Envelope mass (as weighed)',
      formula: 'm_env = m_given',
      values: [],
      result: v('m_env', mass.massKg, 'kg'),
      source: SOURCES.given,
    });
  }
  return d.step({
    id: 'envelope-mass',
    label: 'Envelope mass from the material',
    formula: `m_env = σ·${film} + m_fittings`,
    values: [
      v('σ', mass.arealDensityKgM2, 'kg/m²'),
      v(film, filmAreaM2, 'm²'),
      v('m_fittings', mass.fittingsKg, 'kg'),
    ],
    result: v('m_env', mass.arealDensityKgM2 * filmAreaM2 + mass.fittingsKg, 'kg'),
    source: 'mass of a film of uniform areal density',
  });
}
