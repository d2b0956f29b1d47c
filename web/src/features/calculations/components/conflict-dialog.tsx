import { Button, Modal, Typography } from 'antd';
import {
  diffInputs,
  diffOutputs,
  evaluate,
  type CalculationResult,
  type UnitSystem,
} from '@loftwright/buoyancy';
import { useMemo } from 'react';
import type { VersionDetail } from '../api/calculations-api';
import { VersionDiffView } from './version-diff-view';

export interface SaveConflict {
  /** The version that landed first. */
  latest: VersionDetail;
  /** The inputs this browser tried to save. */
  mine: unknown;
}

function resultOf(kind: string, inputs: unknown): CalculationResult['outputs'] {
  try {
    return evaluate(kind, inputs).outputs;
  } catch {
    return {};
  }
}

/**
 * A stale save: the newer version and the user's own inputs side by side, with the two ways out.
 * Neither discards what the user typed until they choose to take the other version.
 */
export function ConflictDialog({
  kind,
  conflict,
  unitSystem,
  saving,
  onKeepMine,
  onTakeTheirs,
  onClose,
}: {
  kind: string;
  conflict: SaveConflict | null;
  unitSystem: UnitSystem;
  saving: boolean;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
  onClose: () => void;
}) {
  const diff = useMemo(() => {
    if (!conflict) return undefined;
    return {
      from: conflict.latest.number,
      to: conflict.latest.number + 1,
      inputs: diffInputs(conflict.latest.inputs, conflict.mine),
      outputs: diffOutputs(conflict.latest.outputs, resultOf(kind, conflict.mine)),
      engineVersion: { from: conflict.latest.engineVersion, to: conflict.latest.engineVersion },
    };
  }, [kind, conflict]);
  const theirs = conflict?.latest;
  return (
    <Modal
      open={conflict !== null}
      width={760}
      title="Someone saved a newer version while you were editing"
      onCancel={onClose}
      footer={
        theirs
          ? [
              <Button key="theirs" onClick={onTakeTheirs}>
                Take version {theirs.number}
              </Button>,
              <Button key="mine" type="primary" loading={saving} onClick={onKeepMine}>
                Keep mine as version {theirs.number + 1}
              </Button>,
            ]
          : null
      }
    >
      {theirs && diff ? (
        <>
          <Typography.Paragraph>
            Version {theirs.number} by {theirs.author?.displayName ?? 'someone'}
            {theirs.note ? ` (“${theirs.note}”)` : ''} landed first. Your inputs are kept: save them
            on top of it as version {theirs.number + 1}, or take theirs and drop your changes.
          </Typography.Paragraph>
          <VersionDiffView
            kind={kind}
            diff={diff}
            unitSystem={unitSystem}
            titles={{ from: `Theirs (version ${theirs.number})`, to: 'Yours (not saved)' }}
          />
        </>
      ) : null}
    </Modal>
  );
}
