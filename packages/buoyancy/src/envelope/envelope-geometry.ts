import { requireInRange } from '../errors.js';

/** Sizes accepted for any envelope dimension [m]: from a toy balloon to a large airship. */
export const ENVELOPE_SIZE_RANGE_M = { min: 0.01, max: 500 } as const;

/**
 * First and second lemniscate constants of the inflated two-disc cushion (W. H. Paulsen, "What is
 * the shape of a mylar balloon?", Amer. Math. Monthly 101 (1994) 953–958; I. M. Mladenov and
 * J. Oprea, "The mylar balloon revisited", Amer. Math. Monthly 110 (2003) 761–784): the flat disc
 * radius is A times the inflated radius, and the thickness at the axis 2·B times it.
 */
export const CUSHION_RADIUS_RATIO = 1.3110287771;
export const CUSHION_THICKNESS_RATIO = 0.5990701173;

export interface EnvelopeGeometry {
  readonly volumeM3: number;
  readonly surfaceAreaM2: number;
  /**
   * Film cut to make the envelope [m2]: the surface itself for shapes sewn to their inflated
   * form, but two flat discs for a cushion, whose inflated surface is smaller than the film
   * (the film wrinkles at the rim). Envelope mass from an areal density uses this.
   */
  readonly filmAreaM2: number;
  /** Area seen along the direction of motion (vertical for balloons) [m2]. */
  readonly frontalAreaM2: number;
  /** Equivalent diameter for drag and Reynolds number: that of the frontal area [m]. */
  readonly referenceDiameterM: number;
}

/** Which way a capsule's axis lies as it climbs: along the climb (end on) or across it. */
export type CapsuleAxis = 'vertical' | 'horizontal';

/** The shapes and the measurements each is given by. */
export type EnvelopeShape =
  | { readonly shape: 'sphere'; readonly diameterM: number }
  | {
      readonly shape: 'spheroid';
      readonly equatorialDiameterM: number;
      readonly polarDiameterM: number;
    }
  | {
      readonly shape: 'capsule';
      readonly diameterM: number;
      readonly lengthM: number;
      /** How it moves through the air: along its axis (default) or across it. */
      readonly axis?: CapsuleAxis;
    }
  | { readonly shape: 'cushion'; readonly flatDiameterM: number }
  | {
      readonly shape: 'custom';
      readonly volumeM3: number;
      readonly surfaceAreaM2?: number;
      readonly frontalAreaM2?: number;
    };

function finish(
  volumeM3: number,
  surfaceAreaM2: number,
  frontalAreaM2: number,
  filmAreaM2 = surfaceAreaM2,
): EnvelopeGeometry {
  return {
    volumeM3,
    surfaceAreaM2,
    filmAreaM2,
    frontalAreaM2,
    referenceDiameterM: Math.sqrt((4 * frontalAreaM2) / Math.PI),
  };
}

/** Sphere: V = π·d³/6, S = π·d², frontal π·d²/4 (CRC Standard Mathematical Tables). */
export function sphereGeometry(diameterM: number): EnvelopeGeometry {
  return finish(
    (Math.PI * diameterM ** 3) / 6,
    Math.PI * diameterM ** 2,
    (Math.PI * diameterM ** 2) / 4,
  );
}

/**
 * Spheroid with equatorial semi-axis a and polar semi-axis c, rising along its polar axis:
 * V = 4/3·π·a²·c; S = 2πa²(1 + (1 − e²)/e · artanh e) when oblate (c < a, e² = 1 − c²/a²) and
 * S = 2πa²(1 + c/(a·e) · arcsin e) when prolate (c > a, e² = 1 − a²/c²) (CRC Standard Mathematical
 * Tables, surfaces of revolution); frontal area π·a².
 */
export function spheroidGeometry(
  equatorialDiameterM: number,
  polarDiameterM: number,
): EnvelopeGeometry {
  const a = equatorialDiameterM / 2;
  const c = polarDiameterM / 2;
  const volumeM3 = (4 / 3) * Math.PI * a * a * c;
  let surfaceAreaM2: number;
  if (Math.abs(c - a) < 1e-9 * a) {
    surfaceAreaM2 = 4 * Math.PI * a * a;
  } else if (c < a) {
    const e = Math.sqrt(1 - (c * c) / (a * a));
    surfaceAreaM2 = 2 * Math.PI * a * a * (1 + ((1 - e * e) / e) * Math.atanh(e));
  } else {
    const e = Math.sqrt(1 - (a * a) / (c * c));
    surfaceAreaM2 = 2 * Math.PI * a * a * (1 + (c / (a * e)) * Math.asin(e));
  }
  return finish(volumeM3, surfaceAreaM2, Math.PI * a * a);
}

/**
 * Cylinder with hemispherical ends, of diameter d and overall length L ≥ d:
 * V = π·r²·(L − d) + 4/3·π·r³, S = 2π·r·(L − d) + 4π·r². Frontal area: π·r² moving along its axis
 * (a vertical axis, end on), d·(L − d) + π·r² moving across it (the side's outline: a rectangle
 * and the two half-discs of the ends).
 */
export function capsuleGeometry(
  diameterM: number,
  lengthM: number,
  axis: CapsuleAxis = 'vertical',
): EnvelopeGeometry {
  const r = diameterM / 2;
  const cylinderLengthM = lengthM - diameterM;
  return finish(
    Math.PI * r * r * cylinderLengthM + (4 / 3) * Math.PI * r ** 3,
    2 * Math.PI * r * cylinderLengthM + 4 * Math.PI * r * r,
    axis === 'vertical' ? Math.PI * r * r : diameterM * cylinderLengthM + Math.PI * r * r,
  );
}

/**
 * Two flat discs of diameter D sewn at the rim and inflated (Paulsen 1994; Mladenov & Oprea 2003):
 * inflated radius r = (D/2)/A, V = 2/3·π·(D/2)·r², inflated surface π²·r², frontal area π·r²
 * (face on, the largest; a conservative choice for drag). The film cut is the two flat discs,
 * 2·π·(D/2)², which is 2·A²/π ≈ 1.094 times the inflated surface.
 */
export function cushionGeometry(flatDiameterM: number): EnvelopeGeometry {
  const discRadiusM = flatDiameterM / 2;
  const r = discRadiusM / CUSHION_RADIUS_RATIO;
  return finish(
    (2 / 3) * Math.PI * discRadiusM * r * r,
    Math.PI * Math.PI * r * r,
    Math.PI * r * r,
    2 * Math.PI * discRadiusM * discRadiusM,
  );
}

/** Thickness of the inflated cushion at its axis, τ = 2·B·r [m]. */
export function cushionThicknessM(flatDiameterM: number): number {
  return (2 * CUSHION_THICKNESS_RATIO * flatDiameterM) / 2 / CUSHION_RADIUS_RATIO;
}

/**
 * Volume, surface and frontal area of an envelope of the given shape. A custom envelope given only
 * by volume takes the surface and frontal area of the sphere of that volume.
 * @throws InputError for sizes outside 0.01–500 m, or a capsule shorter than its diameter
 */
export function envelopeGeometry(
  envelope: EnvelopeShape,
  fieldPrefix = 'envelope',
): EnvelopeGeometry {
  const size = (name: string, value: number) =>
    requireInRange(
      `${fieldPrefix}.${name}`,
      value,
      ENVELOPE_SIZE_RANGE_M.min,
      ENVELOPE_SIZE_RANGE_M.max,
      'm',
    );
  switch (envelope.shape) {
    case 'sphere':
      return sphereGeometry(size('diameterM', envelope.diameterM));
    case 'spheroid':
      return spheroidGeometry(
        size('equatorialDiameterM', envelope.equatorialDiameterM),
        size('polarDiameterM', envelope.polarDiameterM),
      );
    case 'capsule': {
      const diameterM = size('diameterM', envelope.diameterM);
      const lengthM = requireInRange(
        `${fieldPrefix}.lengthM`,
        envelope.lengthM,
        diameterM,
        ENVELOPE_SIZE_RANGE_M.max * 4,
        'm',
      );
      return capsuleGeometry(diameterM, lengthM, envelope.axis);
    }
    case 'cushion':
      return cushionGeometry(size('flatDiameterM', envelope.flatDiameterM));
    case 'custom': {
      const volumeM3 = requireInRange(
        `${fieldPrefix}.volumeM3`,
        envelope.volumeM3,
        1e-6,
        1e7,
        'm³',
      );
      const sphere = sphereGeometry(Math.cbrt((6 * volumeM3) / Math.PI));
      const surfaceAreaM2 =
        envelope.surfaceAreaM2 === undefined
          ? sphere.surfaceAreaM2
          : requireInRange(
              `${fieldPrefix}.surfaceAreaM2`,
              envelope.surfaceAreaM2,
              sphere.surfaceAreaM2,
              1e7,
              'm²',
            );
      const frontalAreaM2 =
        envelope.frontalAreaM2 === undefined
          ? sphere.frontalAreaM2
          : requireInRange(`${fieldPrefix}.frontalAreaM2`, envelope.frontalAreaM2, 1e-6, 1e6, 'm²');
      return finish(volumeM3, surfaceAreaM2, frontalAreaM2);
    }
  }
}
