import { describe, expect, it } from 'vitest';
import { InputError } from '../errors.js';
import { JURISDICTION_PROFILES } from '../rules/jurisdiction-profiles.js';
import { evaluate, KINDS } from './registry.js';

// Title 14 CFR § 101.1(a): thresholds in pounds, ounces per square inch, feet and cubic feet,
// converted with the exact NIST SP 811 definitions (1 lb = 0.453 592 37 kg, 1 in = 0.0254 m).
const LB = 0.45359237;
const LBF = 4.4482216152605;
const crossed = (inputs: unknown) =>
  evaluate('balloon-rules', inputs)
    .warnings.filter((warning) => warning.code.startsWith('rule-crossed-'))
    .map((warning) => warning.code);

describe('balloon-rules, U.S. 14 CFR 101.1', () => {
  it('leaves a 6 lb package inside (ii) and puts one just over 6 lb under it', () => {
    const base = {
      profileId: 'us-14cfr101',
      operation: 'free',
      packages: [{ massKg: 6 * LB, smallestSurfaceAreaM2: 1 }],
    };
    expect(crossed(base)).not.toContain('rule-crossed-101.1(a)(4)(ii)-single-package-mass');
    expect(
      crossed({ ...base, packages: [{ massKg: 6 * LB + 1e-6, smallestSurfaceAreaM2: 1 }] }),
    ).toContain('rule-crossed-101.1(a)(4)(ii)-single-package-mass');
  });

  it('applies (i) only to packages over 4 lb denser than 3 oz per square inch of their smallest face', () => {
    const massKg = 5 * LB;
    // 5 lb = 80 oz: the ratio exceeds 3 oz/in² when the smallest face is under 80/3 in².
    const justDense = (80 / 3 - 0.01) * 0.0254 ** 2;
    const justLight = (80 / 3 + 0.01) * 0.0254 ** 2;
    const at = (area: number) =>
      crossed({
        profileId: 'us-14cfr101',
        operation: 'free',
        packages: [{ massKg, smallestSurfaceAreaM2: area }],
      });
    expect(at(justDense)).toContain('rule-crossed-101.1(a)(4)(i)-single-package-mass-and-ratio');
    expect(at(justLight)).not.toContain(
      'rule-crossed-101.1(a)(4)(i)-single-package-mass-and-ratio',
    );
  });

  it('adds packages for (iii), over 12 lb together', () => {
    const packages = [
      { massKg: 5 * LB, smallestSurfaceAreaM2: 1 },
      { massKg: 7 * LB + 1e-6, smallestSurfaceAreaM2: 1 },
    ];
    expect(crossed({ profileId: 'us-14cfr101', operation: 'free', packages })).toContain(
      'rule-crossed-101.1(a)(4)(iii)-combined-package-mass',
    );
  });

  it('checks the suspension against 50 lbf for (iv)', () => {
    const inputs = {
      profileId: 'us-14cfr101',
      operation: 'free',
      packages: [],
      suspensionSeparationForceN: 50 * LBF + 0.01,
    };
    expect(crossed(inputs)).toEqual(['rule-crossed-101.1(a)(4)(iv)-suspension-force']);
  });

  it('refuses a moored balloon with neither size rather than answer “0 thresholds crossed”', () => {
    const ask = () => evaluate('balloon-rules', { profileId: 'us-14cfr101', operation: 'moored' });
    expect(ask).toThrow(InputError);
    expect(ask).toThrow(/is needed for a moored balloon, or its gas capacity/);
    expect(() =>
      evaluate('balloon-rules', {
        profileId: 'us-14cfr101',
        operation: 'moored',
        mooredGasVolumeM3: 1,
      }),
    ).not.toThrow();
  });

  it('checks a moored balloon against 6 ft and 115 ft³ for (a)(1)', () => {
    const over = crossed({
      profileId: 'us-14cfr101',
      operation: 'moored',
      mooredDiameterM: 1.83,
      mooredGasVolumeM3: 3.2,
    });
    expect(over).toEqual(['rule-crossed-101.1(a)(1)-moored-diameter']);
    const volume = crossed({
      profileId: 'us-14cfr101',
      operation: 'moored',
      mooredDiameterM: 1.8,
      mooredGasVolumeM3: 115 * 0.3048 ** 3 + 1e-6,
    });
    expect(volume).toEqual(['rule-crossed-101.1(a)(1)-moored-gas-volume']);
  });

  it('always says it is not legal advice, and refuses an unknown profile', () => {
    const result = evaluate('balloon-rules', {
      profileId: 'us-14cfr101',
      operation: 'free',
      packages: [{ massKg: 0.3 }],
    });
    expect(result.outputs.thresholdsCrossed?.value).toBe(0);
    expect(result.warnings.find((warning) => warning.code === 'not-legal-advice')?.message).toMatch(
      /not legal advice/,
    );
    expect(() => evaluate('balloon-rules', { profileId: 'atlantis', operation: 'free' })).toThrow(
      /profileId/,
    );
  });

  it('refuses an unknown profile by naming the allowed ones, by title', () => {
    let refusal: unknown;
    try {
      evaluate('balloon-rules', { profileId: 'atlantis', operation: 'free' });
    } catch (error) {
      refusal = error;
    }
    expect(refusal).toBeInstanceOf(InputError);
    const issue = (refusal as InputError).issues[0];
    expect(issue?.field).toBe('profileId');
    expect(issue?.value).toBe('atlantis');
    expect(issue?.reason).toBe(
      'must be one of: “United States (FAA, 14 CFR Part 101)” (us-14cfr101)',
    );
  });

  it('points at the package whose smallest surface is needed for (i)', () => {
    let refusal: unknown;
    try {
      evaluate('balloon-rules', {
        profileId: 'us-14cfr101',
        operation: 'free',
        packages: [{ massKg: 0.5 }, { massKg: 5 * LB }],
      });
    } catch (error) {
      refusal = error;
    }
    expect(refusal).toBeInstanceOf(InputError);
    expect((refusal as InputError).field).toBe('packages.1.smallestSurfaceAreaM2');
    expect((refusal as InputError).reason).toMatch(/over 1\.814 kg \(rule 101\.1\(a\)\(4\)\(i\)\)/);
  });
});

describe('balloon-rules input schema, as forms read it', () => {
  const schema = KINDS.find((kind) => kind.id === 'balloon-rules')?.inputSchema ?? {};
  const properties = schema.properties as Record<string, Record<string, unknown>>;

  it('offers every jurisdiction profile, titled by its name', () => {
    expect(properties.profileId?.enum).toEqual(Object.keys(JURISDICTION_PROFILES));
    expect(properties.profileId?.enumTitles).toEqual({
      'us-14cfr101': 'United States (FAA, 14 CFR Part 101)',
    });
    expect(properties.profileId?.description).toBe('jurisdiction');
  });

  it('titles the operations and names the packages list and its items', () => {
    expect(properties.operation?.enumTitles).toEqual({
      free: 'Free balloon',
      moored: 'Moored balloon',
    });
    expect(properties.packages).toMatchObject({
      type: 'array',
      description: 'payload packages',
      itemLabel: 'package',
      maxItems: 50,
      default: [],
      items: { type: 'object', required: ['massKg'] },
    });
  });
});
