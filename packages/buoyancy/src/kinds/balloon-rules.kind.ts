import * as z from 'zod';
import { Derivation, v } from '../derivation.js';
import { InputError } from '../errors.js';
import { JURISDICTION_PROFILES, type RuleThreshold } from '../rules/jurisdiction-profiles.js';
import { choice } from '../schema/choice-schema.js';
import { quantity } from '../schema/quantity-schema.js';
import { defineKind } from './kind.js';

const packageSchema = z
  .object({
    massKg: quantity('mass', 0, 1000, 'mass of the package'),
    smallestSurfaceAreaM2: quantity('area', 1e-6, 100, 'area of its smallest surface').optional(),
  })
  .strict();

const PROFILE_IDS = Object.keys(JURISDICTION_PROFILES);
const profileTitle = (id: string) => JURISDICTION_PROFILES[id]?.name ?? id;

const OPERATION_TITLES = { free: 'Free balloon', moored: 'Moored balloon' } as const;

export const balloonRulesSchema = z
  .object({
    profileId: choice(PROFILE_IDS, profileTitle, 'jurisdiction'),
    operation: choice(['free', 'moored'], (id) => OPERATION_TITLES[id]),
    packages: z
      .array(packageSchema)
      .max(50)
      .default([])
      .meta({ description: 'payload packages', itemLabel: 'package' }),
    suspensionSeparationForceN: quantity(
      'force',
      0,
      1e5,
      'impact force needed to separate the payload',
    ).optional(),
    mooredDiameterM: quantity('length', 0, 1000, 'largest diameter of a moored balloon').optional(),
    mooredGasVolumeM3: quantity('volume', 0, 1e7, 'gas capacity of a moored balloon').optional(),
  })
  .strict();

export type BalloonRulesInput = z.input<typeof balloonRulesSchema>;
type Inputs = z.output<typeof balloonRulesSchema>;

function checkThreshold(d: Derivation, rule: RuleThreshold, inputs: Inputs): boolean | undefined {
  const heaviest = inputs.packages.reduce<(typeof inputs.packages)[number] | undefined>(
    (max, item) => (max === undefined || item.massKg > max.massKg ? item : max),
    undefined,
  );
  const id = `rule-${rule.id}-${rule.kind}`;
  const record = (value: number, limit: number, unit: string, symbol: string) => {
    d.step({
      id,
      label: `${rule.id}: ${rule.text}`,
      formula: `${symbol} > ${symbol}_limit`,
      values: [v(`${symbol}_limit`, limit, unit)],
      result: v(symbol, value, unit),
      source: rule.id,
    });
    return value > limit;
  };
  switch (rule.kind) {
    case 'single-package-mass':
      return heaviest && record(heaviest.massKg, rule.limitKg, 'kg', 'm_package');
    case 'single-package-mass-and-ratio': {
      const candidates = inputs.packages.filter((item) => item.massKg > rule.limitKg);
      if (candidates.length === 0)
        return heaviest && record(heaviest.massKg, rule.limitKg, 'kg', 'm_package');
      const ratios = candidates.map((item) => {
        if (item.smallestSurfaceAreaM2 === undefined) {
          throw new InputError(
            `packages.${inputs.packages.indexOf(item)}.smallestSurfaceAreaM2`,
            undefined,
            `is needed for a package over ${rule.limitKg.toFixed(3)} kg (rule ${rule.id})`,
          );
        }
        return item.massKg / item.smallestSurfaceAreaM2;
      });
      return record(Math.max(...ratios), rule.ratioLimitKgPerM2, 'kg/m²', 'm/A_smallest');
    }
    case 'combined-package-mass':
      if (inputs.packages.length < 2) return undefined;
      return record(
        inputs.packages.reduce((sum, item) => sum + item.massKg, 0),
        rule.limitKg,
        'kg',
        'm_packages',
      );
    case 'suspension-force':
      return inputs.suspensionSeparationForceN === undefined
        ? undefined
        : record(inputs.suspensionSeparationForceN, rule.limitN, 'N', 'F_separation');
    case 'moored-diameter':
      return inputs.mooredDiameterM === undefined
        ? undefined
        : record(inputs.mooredDiameterM, rule.limitM, 'm', 'd');
    case 'moored-gas-volume':
      return inputs.mooredGasVolumeM3 === undefined
        ? undefined
        : record(inputs.mooredGasVolumeM3, rule.limitM3, 'm³', 'V_gas');
  }
}

export const balloonRulesKind = defineKind({
  id: 'balloon-rules',
  title: 'Balloon rules check',
  description:
    'Compares a design’s payload packages, suspension and (for moored balloons) size with the thresholds of a jurisdiction’s balloon rules. Not legal advice: the aviation authority where you fly decides.',
  schema: balloonRulesSchema,
  example: {
    profileId: 'us-14cfr101',
    operation: 'free',
    packages: [{ massKg: 1.2, smallestSurfaceAreaM2: 0.02 }],
    suspensionSeparationForceN: 100,
  },
  compute(inputs) {
    const profile = JURISDICTION_PROFILES[inputs.profileId];
    if (!profile) {
      throw new InputError(
        'profileId',
        inputs.profileId,
        `must be one of: ${PROFILE_IDS.map((id) => `“${profileTitle(id)}” (${id})`).join(', ')}`,
      );
    }
    if (
      inputs.operation === 'moored' &&
      inputs.mooredDiameterM === undefined &&
      inputs.mooredGasVolumeM3 === undefined
    ) {
      // With neither size there is nothing to compare: "0 thresholds crossed" would be a false
      // all-clear.
      throw new InputError(
        'mooredDiameterM',
        undefined,
        'is needed for a moored balloon, or its gas capacity: the rules turn on its size',
      );
    }
    const d = new Derivation();
    const rules = inputs.operation === 'free' ? profile.free : profile.moored;
    const crossed = rules.filter((rule) => checkThreshold(d, rule, inputs) === true);
    d.step({
      id: 'thresholds-crossed',
      label: `Thresholds of ${profile.citation} crossed`,
      formula: 'n = number of thresholds crossed',
      values: [],
      result: v('n', crossed.length, ''),
      source: profile.citation,
    });
    d.output('thresholdsCrossed', 'Thresholds crossed', 'thresholds-crossed');
    for (const rule of crossed) {
      d.warn({
        code: `rule-crossed-${rule.id}-${rule.kind}`,
        severity: 'caution',
        message: `Crosses ${rule.id}: ${rule.text}. ${profile.name} rules apply to this flight: follow them and notify the authority as they require.`,
      });
    }
    d.warn({
      code: 'not-legal-advice',
      severity: 'note',
      message: `This compares numbers with ${profile.citation} only; it is not legal advice. Rules differ between countries and change: ask the aviation authority where you fly.`,
    });
    return d.result();
  },
});
