import { readableIssue, type UnitSystem } from '@loftwright/buoyancy';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import type { FieldLabels } from '@/lib/readable-api-error';
import { FormError } from './form-error';

/**
 * FormError for forms of quantities: a range the server names is given in the unit the field
 * shows and the person's number format ("Air temperature must be between −100 °C and 150 °C").
 */
export function FieldFormError({
  error,
  labels,
  unitSystem,
}: {
  error: Error | null;
  labels: FieldLabels;
  unitSystem: UnitSystem;
}) {
  const { numberFormat } = useReadingPreferences();
  return (
    <FormError
      error={error}
      labels={labels}
      describe={(issue, field) => readableIssue(issue, field, { unitSystem, numberFormat })}
    />
  );
}
