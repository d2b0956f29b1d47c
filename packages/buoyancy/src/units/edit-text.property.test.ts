import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { KINDS } from '../kinds/registry.js';
import { DIMENSIONS, type Dimension, type UnitSystem } from './dimensions.js';
import { EDIT_SIGNIFICANT_DIGITS, plainEditText, quantityEditText } from './edit-text.js';
import { parseMoney } from './money-text.js';
import { NUMBER_FORMAT_IDS } from './number-format.js';
import { convertFromSI, formatQuantity, parseCount, readQuantity } from './quantity-text.js';

type JsonSchema = Record<string, unknown>;

interface NumericField {
  readonly path: string;
  readonly dimension: Dimension | 'count' | 'money';
  readonly min: number;
  readonly max: number;
}

/** Every number a person types into any kind, found in the kinds' published JSON Schemas. */
function numericFields(): NumericField[] {
  const fields = new Map<string, NumericField>();
  const walk = (node: JsonSchema, path: string) => {
    const { dimension, minimum, maximum } = node;
    if (typeof dimension === 'string' && typeof minimum === 'number') {
      fields.set(path, {
        path,
        dimension: dimension as NumericField['dimension'],
        min: minimum,
        max: typeof maximum === 'number' ? maximum : minimum + 1e6,
      });
      return;
    }
    for (const [key, child] of Object.entries((node.properties ?? {}) as JsonSchema)) {
      walk(child as JsonSchema, `${path}.${key}`);
    }
    for (const variant of [...((node.oneOf ?? []) as []), ...((node.anyOf ?? []) as [])]) {
      walk(variant, path);
    }
    if (node.items) walk(node.items as JsonSchema, `${path}[]`);
  };
  for (const kind of KINDS) walk(kind.inputSchema, kind.id);
  return [...fields.values()];
}

const UNIT_SYSTEMS: readonly UnitSystem[] = ['si', 'us'];
const FIELDS = numericFields();

/** Log-uniform between two positive numbers: every decade as likely as the next. */
const logBetween = (low: number, high: number) =>
  fc.double({ min: 0, max: 1, noNaN: true }).map((share) => low * (high / low) ** share);

/**
 * A value inside the field's range as a person could type it, spread over its decades rather
 * than bunched near the top. Magnitudes below a billionth of the range are left out: nobody types
 * them, and a field shows them as 0.
 */
function valueIn(field: NumericField): fc.Arbitrary<number> {
  const { min, max } = field;
  if (field.dimension === 'count') {
    return fc.integer({ min: Math.ceil(min), max: Math.floor(max) });
  }
  if (field.dimension === 'money') {
    // Amounts are typed to a hundredth of a cent at most.
    return fc
      .integer({ min: 0, max: Math.round(max * 1e4) })
      .map((tenThousandths) => tenThousandths / 1e4);
  }
  const span = Math.max(Math.abs(min), Math.abs(max));
  const floor = span * 1e-9;
  if (min > 0)
    return max / min > 1000 ? logBetween(min, max) : fc.double({ min, max, noNaN: true });
  const positive = max > floor ? [logBetween(floor, max)] : [];
  const negative = min < -floor ? [logBetween(floor, -min).map((value) => -value)] : [];
  return fc.oneof(fc.constant(0), ...positive, ...negative);
}

describe('every field’s text for editing reads back as the value shown', () => {
  it('finds the numeric fields of every kind, quantities, counts and money among them', () => {
    const kinds = new Set(FIELDS.map((field) => field.dimension));
    expect(FIELDS.length).toBeGreaterThan(60);
    expect([...kinds]).toEqual(expect.arrayContaining(['length', 'count', 'money', 'fraction']));
  });

  for (const unitSystem of UNIT_SYSTEMS) {
    for (const numberFormat of NUMBER_FORMAT_IDS) {
      it(`in ${unitSystem} units written ${numberFormat}`, () => {
        for (const field of FIELDS) {
          fc.assert(
            fc.property(valueIn(field), (valueSI) => {
              if (field.dimension === 'count') {
                const text = plainEditText(valueSI, numberFormat);
                expect(parseCount(text, { numberFormat })).toBe(valueSI);
                return;
              }
              if (field.dimension === 'money') {
                const text = plainEditText(valueSI, numberFormat);
                const back = parseMoney(text, { currency: 'EUR', numberFormat });
                // Fifteen digits kept: an amount comes back as typed.
                expect(Math.abs(back - valueSI)).toBeLessThanOrEqual(Math.abs(valueSI) * 1e-14);
                return;
              }
              const dimension = field.dimension;
              const shown = formatQuantity(valueSI, dimension, unitSystem);
              const text = quantityEditText(valueSI, dimension, unitSystem, numberFormat);
              // A bare number in the field means the unit it shows; the text names it anyway.
              const back = readQuantity(text, dimension, {
                numberFormat,
                defaultUnit: shown.unitName,
              }).valueSI;
              // Equal to the digits shown: within half a unit of the sixth significant digit,
              // measured in the unit shown (°F and °C are offset from K, so compare there).
              const shownValue = convertFromSI(valueSI, dimension, shown.unitName);
              const backValue = convertFromSI(back, dimension, shown.unitName);
              const halfDigit =
                shownValue === 0
                  ? 0
                  : 0.5 *
                    10 **
                      (Math.floor(Math.log10(Math.abs(shownValue))) -
                        (EDIT_SIGNIFICANT_DIGITS - 1));
              expect(Math.abs(backValue - shownValue)).toBeLessThanOrEqual(
                halfDigit * (1 + 1e-9) + 1e-12,
              );
              // And shown again, it is the same text: reading and showing agree.
              expect(quantityEditText(back, dimension, unitSystem, numberFormat)).toBe(text);
            }),
            { numRuns: 40 },
          );
        }
      });
    }
  }

  it('knows every dimension it meets', () => {
    for (const field of FIELDS) {
      if (field.dimension !== 'count' && field.dimension !== 'money') {
        expect(DIMENSIONS[field.dimension]).toBeDefined();
      }
    }
  });
});
