import { CIPM_DRY_AIR_MOLAR_MASS_KG_PER_MOL } from '../atmosphere/moist-air-density.js';

/** What can go wrong with a gas in use, for the cautions the product shows. */
export interface GasHazard {
  readonly flammable: boolean;
  /** Flammable range in air, volume fraction, where the gas burns. */
  readonly flammableRangeInAir?: {
    readonly lower: number;
    readonly upper: number;
    readonly source: string;
  };
  readonly toxic: boolean;
  readonly note: string;
}

export interface LiftingGas {
  readonly id: GasId;
  readonly name: string;
  readonly formula: string;
  readonly molarMassKgPerMol: number;
  /** Where the molar mass comes from. */
  readonly molarMassSource: string;
  /** Heated air is "gas" only at its own temperature: it needs a gas temperature to lift. */
  readonly isHeatedAir: boolean;
  readonly hazard: GasHazard;
  /**
   * Where the ideal-gas density the engine uses is far enough from the real gas at one atmosphere
   * to matter for lift, what a reader should know (shown with every result using the gas).
   */
  readonly idealGasCaveat?: string;
}

export const GAS_IDS = ['hydrogen', 'helium', 'methane', 'ammonia', 'neon', 'hot-air'] as const;
export type GasId = (typeof GAS_IDS)[number];

const ATOMIC_WEIGHTS_SOURCE =
  'IUPAC/CIAAW standard atomic weights, conventional values (2021): H 1.008, He 4.002602, C 12.011, N 14.007, Ne 20.1797';

/**
 * The lifting gases Loftwright knows. Molar masses from the IUPAC conventional atomic weights;
 * the flammable ranges of hydrogen are the widely published 4–75 % (ISO/TR 15916 is the standard to
 * consult); methane's from Coward & Jones (USBM Bulletin 503), ammonia's from a measurement by the
 * ASTM E681 method; each names its source.
 */
export const GAS_CATALOGUE: Readonly<Record<GasId, LiftingGas>> = {
  hydrogen: {
    id: 'hydrogen',
    name: 'Hydrogen',
    formula: 'H₂',
    molarMassKgPerMol: 2 * 1.008e-3,
    molarMassSource: ATOMIC_WEIGHTS_SOURCE,
    isHeatedAir: false,
    hazard: {
      flammable: true,
      flammableRangeInAir: {
        lower: 0.04,
        upper: 0.75,
        source:
          'widely published limits; see ISO/TR 15916:2015, Basic considerations for the safety of hydrogen systems',
      },
      toxic: false,
      note: 'Burns in air from about 4 % to 75 % by volume with an almost invisible flame; very easily ignited, including by static discharge.',
    },
  },
  helium: {
    id: 'helium',
    name: 'Helium',
    formula: 'He',
    molarMassKgPerMol: 4.002602e-3,
    molarMassSource: ATOMIC_WEIGHTS_SOURCE,
    isHeatedAir: false,
    hazard: {
      flammable: false,
      toxic: false,
      note: 'Not flammable; like any gas it displaces oxygen in a closed room.',
    },
  },
  methane: {
    id: 'methane',
    name: 'Methane',
    formula: 'CH₄',
    molarMassKgPerMol: 12.011e-3 + 4 * 1.008e-3,
    molarMassSource: ATOMIC_WEIGHTS_SOURCE,
    isHeatedAir: false,
    hazard: {
      flammable: true,
      flammableRangeInAir: {
        lower: 0.05,
        upper: 0.14,
        source:
          'H. F. Coward and G. W. Jones, Limits of Flammability of Gases and Vapors, U.S. Bureau of Mines Bulletin 503 (1952), introduction: approximately 5 and 14 %',
      },
      toxic: false,
      note: 'Flammable (natural gas); displaces oxygen.',
    },
  },
  ammonia: {
    id: 'ammonia',
    name: 'Ammonia',
    formula: 'NH₃',
    molarMassKgPerMol: 14.007e-3 + 3 * 1.008e-3,
    molarMassSource: ATOMIC_WEIGHTS_SOURCE,
    isHeatedAir: false,
    hazard: {
      flammable: true,
      flammableRangeInAir: {
        lower: 0.1515,
        upper: 0.2735,
        source:
          '"Flammability limits of ammonia-air mixtures", ASHRAE Transactions (ASTM E681 method, dry air): 15.15 % and 27.35 %',
      },
      toxic: true,
      note: 'Toxic and corrosive; flammable at high concentration.',
    },
    // B = −302 cm³/mol at 290 K and −271 at 298.15 K (CRC Handbook, "Virial coefficients of
    // selected gases", H. V. Kehiaian): Z = 1 + B·p/(R·T) ≈ 0.987–0.989 at 101 325 Pa.
    idealGasCaveat:
      'Ammonia is about 1.1 % (25 °C) to 1.3 % (17 °C) denser at one atmosphere than the ideal-gas density used here, more when colder, so the gross lift shown is about 2 % high.',
  },
  neon: {
    id: 'neon',
    name: 'Neon',
    formula: 'Ne',
    molarMassKgPerMol: 20.1797e-3,
    molarMassSource: ATOMIC_WEIGHTS_SOURCE,
    isHeatedAir: false,
    hazard: { flammable: false, toxic: false, note: 'Not flammable; displaces oxygen.' },
  },
  'hot-air': {
    id: 'hot-air',
    name: 'Heated air',
    formula: 'air',
    molarMassKgPerMol: CIPM_DRY_AIR_MOLAR_MASS_KG_PER_MOL,
    molarMassSource:
      'CIPM-2007 dry air at 400 µmol/mol CO₂ (Picard et al., Metrologia 45 (2008) 149)',
    isHeatedAir: true,
    hazard: {
      flammable: false,
      toxic: false,
      note: 'Lifts only while hot: the burner or heater is the hazard, not the gas.',
    },
  },
};
