import { Alert, App, Col, Row, Spin } from 'antd';
import { kindCapabilities, type CalculationResult, type UnitSystem } from '@loftwright/buoyancy';
import { ApiError } from '@/lib/api-client';
import { DerivationPanel } from '@/components/results/derivation-panel';
import { describeUnreadable, useUnreadableFields } from '@/components/reading/unreadable-fields';
import { type CalculationDetail, useCalculation } from '../api/calculations-api';
import { useCalculationDraft } from '../hooks/use-calculation-draft';
import { useInputSchema } from '../hooks/use-input-schema';
import { useLiveEvaluation } from '../hooks/use-live-evaluation';
import { useSaveWithConflict } from '../hooks/use-save-with-conflict';
import { useSourceVersion } from '../hooks/use-source-version';
import { useUnsavedChangesGuard } from '../hooks/use-unsaved-changes-guard';
import { CalculationEditorHeader } from './calculation-editor-header';
import { CalculationInputsSection, type InputsPicker } from './calculation-inputs-section';
import { CalculationResultsColumn } from './calculation-results-column';
import { ConflictDialog } from './conflict-dialog';
import { ContinueButtons } from './continue-buttons';
import { LinkedPanel } from './linked-panel';
import { LeaveWithoutSavingDialog } from './leave-without-saving-dialog';
import { SaveVersionControls } from './save-version-controls';

const sameNumbers = (a: CalculationResult['outputs'], b: CalculationResult['outputs']) =>
  Object.keys(a).length === Object.keys(b).length &&
  Object.entries(a).every(
    ([name, output]) =>
      Math.abs(output.value - (b[name]?.value ?? Number.NaN)) <=
      1e-9 * Math.max(1, Math.abs(output.value)),
  );

/** The inputs with a metered energy in place of the measured one; the gas volume stays. */
function withMeteredEnergy(inputs: unknown, energyJ: number) {
  const current = (inputs ?? {}) as {
    fill?: { volumeM3?: number };
    measured?: { volumeM3?: number };
  };
  return {
    ...current,
    measured: {
      energyJ,
      volumeM3: current.measured?.volumeM3 ?? current.fill?.volumeM3 ?? 1,
    },
  };
}

/** Loads a calculation and shows its editor (inputs, live results, derivation). */
export function CalculationEditor({
  id,
  unitSystem,
  picker,
}: {
  id: string;
  unitSystem: UnitSystem;
  /** Composed in by the route: fills inputs from elsewhere (CalculationInputsSection). */
  picker?: InputsPicker;
}) {
  const calculation = useCalculation(id);
  if (calculation.isPending) return <Spin description="Loading the calculation…" />;
  if (calculation.error) {
    const hidden = calculation.error instanceof ApiError && calculation.error.status === 404;
    return (
      <Alert
        type={hidden ? 'warning' : 'error'}
        showIcon
        title={
          hidden
            ? 'This calculation does not exist, or you may not see it.'
            : calculation.error.message
        }
        description={
          hidden
            ? 'Private calculations are open to their owner, admins and, once submitted, reviewers.'
            : undefined
        }
      />
    );
  }
  return (
    <EditorBody
      detail={calculation.data}
      refetch={() => void calculation.refetch()}
      unitSystem={unitSystem}
      picker={picker}
    />
  );
}

/** Inputs, live results and derivation of one loaded calculation, with saving, conflicts and submission. */
export function EditorBody({
  detail,
  refetch,
  unitSystem,
  picker,
}: {
  detail: CalculationDetail;
  refetch: () => void;
  unitSystem: UnitSystem;
  picker?: InputsPicker;
}) {
  const { message } = App.useApp();
  const { id, kind, latest } = detail;
  const draft = useCalculationDraft(latest?.inputs);
  const [unreadable, unreadableRegistry] = useUnreadableFields();
  const schema = useInputSchema(kind);
  const live = useLiveEvaluation(kind, draft.inputs, schema, unitSystem);
  const guard = useUnsavedChangesGuard(draft.dirty);
  // A continued calculation: a newer source version taken into the form, recorded on save.
  const link = useSourceVersion({ detail, inputs: draft.inputs, setInputs: draft.setInputs });
  const save = useSaveWithConflict({
    id,
    schema,
    unitSystem,
    onSaved: (version) => {
      draft.takeSaved(version.inputs);
      draft.setNote('');
      link.clear();
    },
  });
  const sourceVersion = link.taken?.number;
  const editable = detail.permissions.edit;
  const heldBack =
    unreadable.length > 0 ? `Results wait for: ${describeUnreadable(unreadable)}` : undefined;
  const serverDiffers = Boolean(
    !draft.dirty && latest && live.result && !sameNumbers(latest.outputs, live.result.outputs),
  );

  return (
    <>
      <CalculationEditorHeader
        detail={detail}
        serverDiffers={serverDiffers}
        actions={<ContinueButtons detail={detail} dirty={draft.dirty} />}
      />
      <LinkedPanel detail={detail} schema={schema} link={link} />
      <Row gutter={[16, 16]}>
        <Col xs={24} lg={8}>
          <CalculationInputsSection
            schema={schema}
            value={draft.inputs}
            onChange={draft.setInputs}
            unitSystem={unitSystem}
            errors={live.errors}
            notes={live.notes}
            editable={editable}
            dirty={draft.dirty}
            unreadableRegistry={unreadableRegistry}
            picker={picker}
            onMeteredEnergy={
              editable && kindCapabilities(kind).meterImport
                ? (energyJ) => {
                    draft.setInputs(withMeteredEnergy(draft.inputs, energyJ));
                    void message.info(
                      'Metered energy entered. Check the measured gas volume, then save a version.',
                    );
                  }
                : undefined
            }
          >
            <SaveVersionControls
              calculationId={id}
              latestVersion={detail.latestVersion}
              note={draft.note}
              onNoteChange={draft.setNote}
              canSave={
                (draft.dirty || sourceVersion !== undefined) &&
                live.result !== undefined &&
                unreadable.length === 0
              }
              saving={save.saving}
              onSave={() =>
                save.saveVersion(detail.latestVersion, draft.inputs, draft.note, sourceVersion)
              }
              canSubmit={detail.permissions.submit && !draft.dirty}
            />
          </CalculationInputsSection>
        </Col>
        <Col xs={24} lg={8}>
          <CalculationResultsColumn
            kind={kind}
            result={live.result}
            evaluatedInputs={live.evaluatedInputs}
            unitSystem={unitSystem}
            title={draft.dirty ? 'Results (live, not saved)' : 'Results'}
            problem={live.problem}
            heldBack={heldBack}
          />
        </Col>
        <Col xs={24} lg={8}>
          <DerivationPanel steps={live.result?.steps ?? latest?.steps ?? []} />
        </Col>
      </Row>
      <ConflictDialog
        kind={kind}
        conflict={save.conflict}
        unitSystem={unitSystem}
        saving={save.saving}
        onClose={save.closeConflict}
        onTakeTheirs={() => {
          if (!save.conflict) return;
          draft.takeSaved(save.conflict.latest.inputs);
          save.closeConflict();
          refetch();
        }}
        onKeepMine={() => save.keepMine(draft.note, sourceVersion)}
      />
      <LeaveWithoutSavingDialog open={guard.asking} onLeave={guard.leave} onStay={guard.stay} />
    </>
  );
}
