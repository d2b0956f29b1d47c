import { useState } from 'react';
import { useCalculationVersion } from '../api/get-calculation-version';
import type { FillLogVersion } from './use-fill-log-fields';

/**
 * The version a new fill is logged against, fixed when the dialog opens: a version saved
 * meanwhile neither moves the log nor resets what has been typed. It is read ahead for those who
 * may log, so the dialog opens on the version's air.
 */
export function useLoggingVersion(calculationId: string, latestVersion: number, canEdit: boolean) {
  const [loggingVersion, setLoggingVersion] = useState<number>();
  const versionNumber = loggingVersion ?? latestVersion;
  const version = useCalculationVersion(calculationId, versionNumber, canEdit);
  const forForm: FillLogVersion =
    version.status === 'success'
      ? { status: 'success', inputs: version.data.inputs }
      : version.status === 'error'
        ? { status: 'error', message: version.error.message }
        : { status: 'pending' };
  return {
    /** Whether the dialog to log a fill is open. */
    logging: loggingVersion !== undefined,
    versionNumber,
    version: forForm,
    start: () => setLoggingVersion(latestVersion),
    stop: () => setLoggingVersion(undefined),
  };
}
