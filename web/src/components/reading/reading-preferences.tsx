import type { NumberFormat } from '@loftwright/buoyancy';
import { createContext, useContext } from 'react';

/** How the signed-in person writes numbers and which currency their new prices are in. */
export interface ReadingPreferences {
  numberFormat: NumberFormat;
  currency: string;
}

export const ReadingPreferencesContext = createContext<ReadingPreferences>({
  numberFormat: 'point-comma',
  currency: 'EUR',
});

/** The person's number format and currency, set once by the app from their account. */
export const useReadingPreferences = () => useContext(ReadingPreferencesContext);
