import { InputError } from '../errors.js';
import { NUMBER_FORMATS, type NumberFormat } from './number-format.js';
import { readLeadingNumber, trimSpaces } from './number-text.js';

/** Currency signs people type, and the ISO 4217 codes each may stand for. */
const CURRENCY_SIGNS: Readonly<Record<string, readonly string[]>> = {
  '€': ['EUR'],
  '£': ['GBP'],
  '¥': ['JPY', 'CNY'],
  '₹': ['INR'],
  zł: ['PLN'],
  Kč: ['CZK'],
  kr: ['SEK', 'NOK', 'DKK', 'ISK'],
  $: ['USD', 'CAD', 'AUD', 'NZD', 'SGD', 'HKD', 'MXN'],
};

/** What a price is per, as people write it. */
const PER_UNITS: Readonly<Record<string, 'kWh' | 'm³'>> = {
  kwh: 'kWh',
  'm³': 'm³',
  m3: 'm³',
  'm^3': 'm³',
};

export interface MoneyReadOptions {
  /** ISO 4217 code the amount is in: the plan's or calculation's currency. */
  readonly currency: string;
  /** What the price is per ("kWh", "m³"), or nothing for an amount each. */
  readonly per?: 'kWh' | 'm³';
  readonly numberFormat?: NumberFormat;
  readonly field?: string;
}

const LEADING_SIGN = new RegExp(`^(${Object.keys(CURRENCY_SIGNS).map(escape).join('|')}|[A-Z]{3})`);
const TRAILING = new RegExp(
  `^(${Object.keys(CURRENCY_SIGNS).map(escape).join('|')}|[A-Za-z]{3})?\\s*(?:/\\s*(\\S+))?$`,
);

function escape(text: string): string {
  return text.replace(/[$.]/g, '\\$&');
}

/**
 * Reads an amount of money a person typed ("0.25", "0,25 EUR", "€0.50", "0.25 EUR/kWh") under the
 * one reading rule for numbers. A currency, where typed, must be the one the amount is in; money
 * is never converted between currencies. Returns the amount in that currency.
 * @throws InputError naming `field`, with the forms it accepts
 */
export function parseMoney(text: string, options: MoneyReadOptions): number {
  const field = options.field ?? 'price';
  const format = options.numberFormat ?? 'point-comma';
  const trimmed = trimSpaces(text);
  const lead = LEADING_SIGN.exec(trimmed);
  const numberText = lead ? trimSpaces(trimmed.slice(lead[0].length)) : trimmed;
  const reading = readLeadingNumber(numberText, format);
  const forms = acceptedForms(options, format);
  if (!reading.ok) {
    const reason = reading.reason.startsWith('could be')
      ? reading.reason
      : `${reading.reason}: type ${forms}`;
    throw new InputError(field, text, reason);
  }
  const tail = TRAILING.exec(reading.rest);
  if (!tail) throw new InputError(field, text, `does not read as money: type ${forms}`);
  const [, sign, perText] = tail;
  for (const typed of [lead?.[1], sign]) {
    if (typed !== undefined && !means(typed, options.currency)) {
      throw new InputError(
        field,
        text,
        `is in ${typed}, but these prices are in ${options.currency}: Loftwright does not convert currencies`,
      );
    }
  }
  if (perText !== undefined) {
    const per = PER_UNITS[perText.toLowerCase()] ?? PER_UNITS[perText];
    if (per === undefined || per !== options.per) {
      throw new InputError(
        field,
        text,
        options.per
          ? `is a price per kWh or m³ as the field says: type it per ${options.per}`
          : `is a price each: type it without “/${perText}”`,
      );
    }
  }
  if (reading.value < 0) throw new InputError(field, text, 'must not be negative');
  return reading.value;
}

function means(typed: string, currency: string): boolean {
  if (/^[A-Za-z]{3}$/.test(typed)) return typed.toUpperCase() === currency;
  return CURRENCY_SIGNS[typed]?.includes(currency) ?? false;
}

function acceptedForms(options: MoneyReadOptions, format: NumberFormat): string {
  const amount = `0${NUMBER_FORMATS[format].decimal}25`;
  const per = options.per ? `/${options.per}` : '';
  return `a price such as ${amount} or ${amount} ${options.currency}${per}`;
}
