import { App } from 'antd';
import { inputFieldInfo, readableIssue, type UnitSystem } from '@loftwright/buoyancy';
import { useState } from 'react';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import { ApiError } from '@/lib/api-client';
import { readableApiError } from '@/lib/readable-api-error';
import { useSaveVersion, type VersionDetail } from '../api/calculations-api';
import type { SaveConflict } from '../components/conflict-dialog';

/**
 * Saving a version of the inputs. A save on top of a version someone else saved meanwhile (409)
 * becomes a conflict to resolve; other refusals are said in a message, each field by its label.
 */
export function useSaveWithConflict({
  id,
  schema,
  unitSystem,
  onSaved,
}: {
  id: string;
  schema: Record<string, unknown>;
  unitSystem: UnitSystem;
  onSaved: (version: VersionDetail) => void;
}) {
  const { message } = App.useApp();
  const { numberFormat } = useReadingPreferences();
  const save = useSaveVersion(id);
  const [conflict, setConflict] = useState<SaveConflict | null>(null);

  /** `sourceVersion`: a continued calculation's source version taken into these inputs. */
  const saveVersion = (
    baseVersion: number,
    inputs: unknown,
    note: string,
    sourceVersion?: number,
  ) =>
    save.mutate(
      { baseVersion, inputs, note, ...(sourceVersion === undefined ? {} : { sourceVersion }) },
      {
        onSuccess: (version) => {
          onSaved(version);
          setConflict(null);
          void message.success(`Saved as version ${version.number}.`);
        },
        onError: (error) => {
          if (error instanceof ApiError && error.status === 409) {
            setConflict({ latest: error.body.latest as VersionDetail, mine: inputs });
          } else {
            // The server names fields inside the inputs by path; say them by their labels.
            const labels = (field: string) =>
              field.startsWith('inputs.')
                ? inputFieldInfo(schema, field.slice('inputs.'.length))
                : undefined;
            void message.error(
              readableApiError(error, labels, (issue, field) =>
                readableIssue(issue, field, { unitSystem, numberFormat }),
              ).join('; '),
            );
          }
        },
      },
    );

  return {
    saveVersion,
    saving: save.isPending,
    /** The newer version and the inputs this browser tried to save on the older one. */
    conflict,
    /** Saves the inputs that met the conflict on top of the newer version. */
    keepMine: (note: string, sourceVersion?: number) => {
      if (conflict) saveVersion(conflict.latest.number, conflict.mine, note, sourceVersion);
    },
    closeConflict: () => setConflict(null),
  };
}
