/** One threshold of a jurisdiction's balloon rules, as data. */
export type RuleThreshold =
  | {
      readonly kind: 'single-package-mass';
      readonly id: string;
      readonly limitKg: number;
      readonly text: string;
    }
  | {
      readonly kind: 'single-package-mass-and-ratio';
      readonly id: string;
      readonly limitKg: number;
      /** Package mass over the area of its smallest surface [kg/m²]. */
      readonly ratioLimitKgPerM2: number;
      readonly text: string;
    }
  | {
      readonly kind: 'combined-package-mass';
      readonly id: string;
      readonly limitKg: number;
      readonly text: string;
    }
  | {
      readonly kind: 'suspension-force';
      readonly id: string;
      readonly limitN: number;
      readonly text: string;
    }
  | {
      readonly kind: 'moored-diameter';
      readonly id: string;
      readonly limitM: number;
      readonly text: string;
    }
  | {
      readonly kind: 'moored-gas-volume';
      readonly id: string;
      readonly limitM3: number;
      readonly text: string;
    };

export interface JurisdictionProfile {
  readonly id: string;
  readonly name: string;
  readonly citation: string;
  readonly free: readonly RuleThreshold[];
  readonly moored: readonly RuleThreshold[];
}

// Exact unit definitions (NIST SP 811, Appendix B): 1 lb = 0.453 592 37 kg, 1 ft = 0.3048 m,
// 1 in = 0.0254 m, 1 oz = lb/16, 1 lbf = 4.448 221 615 260 5 N.
const LB_KG = 0.45359237;
const OZ_KG = LB_KG / 16;
const IN_M = 0.0254;
const FT_M = 0.3048;
const LBF_N = 4.4482216152605;

/**
 * United States: Title 14 CFR Part 101, § 101.1 Applicability (moored balloons and unmanned free
 * balloons). Part 101 applies when any threshold below is crossed.
 */
export const US_14_CFR_101: JurisdictionProfile = {
  id: 'us-14cfr101',
  name: 'United States (FAA, 14 CFR Part 101)',
  citation: 'Title 14 Code of Federal Regulations, Part 101, § 101.1 Applicability',
  free: [
    {
      kind: 'single-package-mass-and-ratio',
      id: '101.1(a)(4)(i)',
      limitKg: 4 * LB_KG,
      ratioLimitKgPerM2: (3 * OZ_KG) / (IN_M * IN_M),
      text: 'a payload package of more than 4 lb with a weight/size ratio of more than 3 oz per square inch on any surface',
    },
    {
      kind: 'single-package-mass',
      id: '101.1(a)(4)(ii)',
      limitKg: 6 * LB_KG,
      text: 'a payload package of more than 6 lb',
    },
    {
      kind: 'combined-package-mass',
      id: '101.1(a)(4)(iii)',
      limitKg: 12 * LB_KG,
      text: 'two or more payload packages weighing more than 12 lb together',
    },
    {
      kind: 'suspension-force',
      id: '101.1(a)(4)(iv)',
      limitN: 50 * LBF_N,
      text: 'a rope or other suspension device needing an impact force of more than 50 lb to separate the payload from the balloon',
    },
  ],
  moored: [
    {
      kind: 'moored-diameter',
      id: '101.1(a)(1)',
      limitM: 6 * FT_M,
      text: 'a moored balloon of more than 6 ft diameter',
    },
    {
      kind: 'moored-gas-volume',
      id: '101.1(a)(1)',
      limitM3: 115 * FT_M ** 3,
      text: 'a moored balloon with a gas capacity of more than 115 ft³',
    },
  ],
};

export const JURISDICTION_PROFILES: Readonly<Record<string, JurisdictionProfile>> = {
  [US_14_CFR_101.id]: US_14_CFR_101,
};
