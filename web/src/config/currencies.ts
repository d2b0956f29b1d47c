/** ISO 4217 codes offered in pickers; a value holding another code keeps it. */
export const CURRENCIES = [
  'EUR',
  'USD',
  'GBP',
  'CHF',
  'CAD',
  'AUD',
  'JPY',
  'SEK',
  'NOK',
  'DKK',
  'PLN',
  'CZK',
  'NZD',
  'INR',
];
