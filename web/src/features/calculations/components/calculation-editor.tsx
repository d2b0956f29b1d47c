import { Alert, App, Button, Col, Form, Input, Modal, Row, Space, Spin, Typography } from 'antd';
import {
  CHECK_THIS,
  evaluate,
  InputError,
  inputFieldInfo,
  kindCapabilities,
  KINDS,
  normaliseInputs,
  readableIssue,
  type CalculationResult,
  type NumberFormat,
  type UnitSystem,
} from '@loftwright/buoyancy';
import { lazy, Suspense, useDeferredValue, useEffect, useMemo, useState } from 'react';
import { useBlocker } from 'react-router-dom';
import { ApiError } from '@/lib/api-client';
import { localMoment } from '@/lib/local-moment';
import { readableApiError } from '@/lib/readable-api-error';
import {
  type CalculationDetail,
  useCalculation,
  useSaveVersion,
  type VersionDetail,
} from '../api/calculations-api';
import { ConflictDialog, type SaveConflict } from './conflict-dialog';
import { MeterImport } from './meter-import';
import { DerivationPanel } from '@/components/results/derivation-panel';
import { ResultsPanel } from '@/components/results/results-panel';
import { PanelBoundary } from '@/components/errors/panel-boundary';
import { SchemaField } from './schema-form';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import {
  describeUnreadable,
  UnreadableFieldsContext,
  useUnreadableFields,
} from '@/components/reading/unreadable-fields';
import { StatusTag } from './status-tag';
import { SubmitForReview } from './submit-for-review';

// The charting library is most of the editor's weight: the inputs and results come first, the
// pictures a moment later.
const CalculationCharts = lazy(() =>
  import('../charts/calculation-charts').then((module) => ({ default: module.CalculationCharts })),
);

interface LiveResult {
  result?: CalculationResult;
  errors: Record<string, string>;
  /** "Check this" notes by field path: values that are allowed but seldom met. */
  notes: Record<string, string>;
  problem?: string;
}

const NO_NOTES: Record<string, string> = {};

/** The engine's "check this" notes, by the field each is about. */
function notesByField(result: CalculationResult): Record<string, string> {
  const notes: Record<string, string> = {};
  for (const warning of result.warnings) {
    if (warning.code === CHECK_THIS && warning.field) notes[warning.field] = warning.message;
  }
  return notes;
}

/**
 * The engine, run in the browser on every change of the inputs (no request per keystroke). Its
 * refusals come back as sentences naming each field by its label, ranges in the units shown.
 */
function evaluateLive(
  kind: string,
  inputs: unknown,
  schema: Record<string, unknown>,
  shownAs: { unitSystem: UnitSystem; numberFormat: NumberFormat },
): LiveResult {
  try {
    // Notes are written in the reader's units; the server records its own in SI.
    const result = evaluate(kind, inputs, { display: shownAs });
    return { result, errors: {}, notes: notesByField(result) };
  } catch (error) {
    if (!(error instanceof InputError))
      return {
        errors: {},
        notes: NO_NOTES,
        problem: error instanceof Error ? error.message : String(error),
      };
    const { errors, sentences } = fieldErrors(error, schema, shownAs);
    return { errors, notes: NO_NOTES, problem: `Results wait for: ${sentences.join('; ')}` };
  }
}

/** The engine's refusals by field (beside each field) and as sentences (for the summary). */
function fieldErrors(
  error: InputError,
  schema: Record<string, unknown>,
  shownAs: { unitSystem: UnitSystem; numberFormat: NumberFormat },
) {
  const errors: Record<string, string> = {};
  const sentences: string[] = [];
  for (const issue of error.issues) {
    const field = inputFieldInfo(schema, issue.field);
    const sentence = readableIssue(issue, field, shownAs);
    // Beside the field the label is already shown; the summary names it.
    errors[issue.field] ??= field ? sentence.slice(field.label.length).trim() : sentence;
    sentences.push(sentence);
  }
  return { errors, sentences };
}

const NO_ERRORS: Record<string, string> = {};

/**
 * The field checks alone, on the inputs as they are now: cheap (no computation), so a message
 * beside a field goes the moment the field is put right, not when the results catch up.
 */
function checkFieldsNow(
  kind: string,
  inputs: unknown,
  schema: Record<string, unknown>,
  shownAs: { unitSystem: UnitSystem; numberFormat: NumberFormat },
): Record<string, string> {
  try {
    normaliseInputs(kind, inputs);
    return NO_ERRORS;
  } catch (error) {
    return error instanceof InputError ? fieldErrors(error, schema, shownAs).errors : NO_ERRORS;
  }
}

const sameNumbers = (a: CalculationResult['outputs'], b: CalculationResult['outputs']) =>
  Object.keys(a).length === Object.keys(b).length &&
  Object.entries(a).every(
    ([name, output]) =>
      Math.abs(output.value - (b[name]?.value ?? Number.NaN)) <=
      1e-9 * Math.max(1, Math.abs(output.value)),
  );

/** Loads a calculation and shows its editor (inputs, live results, derivation). */
export function CalculationEditor({ id, unitSystem }: { id: string; unitSystem: UnitSystem }) {
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
    />
  );
}

/** Inputs, live results and derivation of one loaded calculation, with saving, conflicts and submission. */
export function EditorBody({
  detail,
  refetch,
  unitSystem,
}: {
  detail: CalculationDetail;
  refetch: () => void;
  unitSystem: UnitSystem;
}) {
  const { message } = App.useApp();
  const id = detail.id;
  const save = useSaveVersion(id);
  const latest = detail.latest;
  const [inputs, setInputs] = useState<unknown>(() => latest?.inputs);
  const [savedInputs, setSavedInputs] = useState<string>(() => JSON.stringify(latest?.inputs));
  const [note, setNote] = useState('');
  const [conflict, setConflict] = useState<SaveConflict | null>(null);
  const [meterOpen, setMeterOpen] = useState(false);

  const deferredInputs = useDeferredValue(inputs);
  const kind = detail.kind;
  const { numberFormat } = useReadingPreferences();
  const [unreadable, unreadableRegistry] = useUnreadableFields();
  const schema = useMemo(
    () => KINDS.find((candidate) => candidate.id === kind)?.inputSchema ?? {},
    [kind],
  );
  const live = useMemo(
    () =>
      deferredInputs === undefined || !kind
        ? { errors: {}, notes: NO_NOTES }
        : evaluateLive(kind, deferredInputs, schema, { unitSystem, numberFormat }),
    [kind, deferredInputs, schema, unitSystem, numberFormat],
  );
  const errorsNow = useMemo(
    () =>
      inputs === undefined || !kind
        ? NO_ERRORS
        : checkFieldsNow(kind, inputs, schema, { unitSystem, numberFormat }),
    [kind, inputs, schema, unitSystem, numberFormat],
  );
  // Checks the engine makes while computing (a rule needing a field) follow once the results
  // are for these very inputs; a stale one never outlives the typing that put it right.
  const errorsShown = useMemo(
    () => (deferredInputs === inputs ? { ...live.errors, ...errorsNow } : errorsNow),
    [deferredInputs, inputs, live.errors, errorsNow],
  );
  const heldBack =
    unreadable.length > 0 ? `Results wait for: ${describeUnreadable(unreadable)}` : undefined;
  const dirty = inputs !== undefined && JSON.stringify(inputs) !== savedInputs;

  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      dirty && currentLocation.pathname !== nextLocation.pathname,
  );
  useEffect(() => {
    const warn = (event: BeforeUnloadEvent) => {
      if (dirty) event.preventDefault();
    };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  const editable = detail.permissions.edit;

  const doSave = (baseVersion: number, toSave: unknown) =>
    save.mutate(
      { baseVersion, inputs: toSave, note },
      {
        onSuccess: (version) => {
          setSavedInputs(JSON.stringify(version.inputs));
          setInputs(version.inputs);
          setNote('');
          setConflict(null);
          void message.success(`Saved as version ${version.number}.`);
        },
        onError: (error) => {
          if (error instanceof ApiError && error.status === 409) {
            setConflict({ latest: error.body.latest as VersionDetail, mine: toSave });
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

  const serverDiffers =
    !dirty && latest && live.result && !sameNumbers(latest.outputs, live.result.outputs);
  return (
    <>
      <Space align="center" wrap style={{ marginBottom: 8 }}>
        <Typography.Title level={2} style={{ margin: 0 }}>
          {detail.title}
        </Typography.Title>
        <Typography.Text className="lw-mono">v{detail.latestVersion}</Typography.Text>
        <StatusTag status={detail.status} />
      </Space>
      {detail.status === 'approved' ? (
        <Alert
          type="success"
          showIcon
          title={`Version ${detail.latestVersion} is approved and locked.`}
          description="Saving a change makes a new draft version; the approved one stays as it is."
          style={{ marginBottom: 12 }}
        />
      ) : null}
      {detail.versions
        .filter((version) => version.status === 'in_review')
        .map((version) => (
          <Alert
            key={version.number}
            type="info"
            showIcon
            role="status"
            title={`Version ${version.number} is in review with ${version.reviewer?.displayName ?? 'any reviewer'}.`}
            description={
              version.submittedAt ? `Submitted ${localMoment(version.submittedAt)}.` : undefined
            }
            style={{ marginBottom: 12 }}
          />
        ))}
      {serverDiffers ? (
        <Alert
          type="warning"
          showIcon
          title="The saved version's numbers differ from what this browser computes"
          description="The server's recomputed results are the ones stored; reload to get the engine the server runs."
          style={{ marginBottom: 12 }}
        />
      ) : null}
      <Row gutter={[16, 16]}>
        <Col xs={24} lg={8}>
          <section aria-label="Inputs">
            <Typography.Title level={4}>Inputs</Typography.Title>
            <Form layout="vertical" component="div" requiredMark={false}>
              <UnreadableFieldsContext.Provider value={unreadableRegistry}>
                <SchemaField
                  name=""
                  path=""
                  schema={schema}
                  value={inputs}
                  onChange={setInputs}
                  unitSystem={unitSystem}
                  errors={errorsShown}
                  notes={live.notes}
                  disabled={!editable}
                />
              </UnreadableFieldsContext.Provider>
            </Form>
            {editable && kindCapabilities(kind).meterImport ? (
              <Button style={{ marginBottom: 12 }} onClick={() => setMeterOpen(true)}>
                Energy from a meter log (CSV)
              </Button>
            ) : null}
            {editable && dirty && Object.keys(live.notes).length > 0 ? (
              <Alert
                type="warning"
                showIcon
                role="status"
                title={`Check before saving: ${Object.keys(live.notes).length === 1 ? 'one value lies' : `${Object.keys(live.notes).length} values lie`} outside what is usually met.`}
                description="They are kept as typed, and the notes are recorded with the version."
                style={{ marginBottom: 8 }}
              />
            ) : null}
            {editable ? (
              <Space orientation="vertical" style={{ width: '100%' }}>
                <Input
                  aria-label="Change note"
                  placeholder="What changed (change note)"
                  value={note}
                  onChange={(event) => setNote(event.target.value)}
                  maxLength={2000}
                />
                <Space wrap>
                  <Button
                    type="primary"
                    disabled={!dirty || !live.result || unreadable.length > 0}
                    loading={save.isPending}
                    onClick={() => doSave(detail.latestVersion, inputs)}
                  >
                    Save as version {detail.latestVersion + 1}
                  </Button>
                  {detail.permissions.submit && !dirty ? (
                    <SubmitForReview calculationId={id} versionNumber={detail.latestVersion} />
                  ) : null}
                </Space>
              </Space>
            ) : (
              <Alert
                type="info"
                showIcon
                title="You can read this calculation; only its owner saves versions."
              />
            )}
          </section>
        </Col>
        <Col xs={24} lg={8}>
          <ResultsPanel
            result={heldBack ? undefined : live.result}
            unitSystem={unitSystem}
            title={dirty ? 'Results (live, not saved)' : 'Results'}
            problem={heldBack ?? live.problem}
          />
          {live.result && deferredInputs ? (
            <PanelBoundary what="the charts">
              <Suspense fallback={<Spin description="Drawing the charts…" />}>
                <CalculationCharts
                  kind={kind}
                  inputs={deferredInputs as Record<string, unknown>}
                  result={live.result}
                  unitSystem={unitSystem}
                />
              </Suspense>
            </PanelBoundary>
          ) : null}
        </Col>
        <Col xs={24} lg={8}>
          <DerivationPanel steps={live.result?.steps ?? latest?.steps ?? []} />
        </Col>
      </Row>
      {meterOpen ? (
        <MeterImport
          open={meterOpen}
          unitSystem={unitSystem}
          onClose={() => setMeterOpen(false)}
          onUse={(energyJ) => {
            const current = (inputs ?? {}) as {
              fill?: { volumeM3?: number };
              measured?: { volumeM3?: number };
            };
            setInputs({
              ...current,
              measured: {
                energyJ,
                volumeM3: current.measured?.volumeM3 ?? current.fill?.volumeM3 ?? 1,
              },
            });
            setMeterOpen(false);
            void message.info(
              'Metered energy entered. Check the measured gas volume, then save a version.',
            );
          }}
        />
      ) : null}
      <ConflictDialog
        kind={kind}
        conflict={conflict}
        unitSystem={unitSystem}
        saving={save.isPending}
        onClose={() => setConflict(null)}
        onTakeTheirs={() => {
          if (!conflict) return;
          setInputs(conflict.latest.inputs);
          setSavedInputs(JSON.stringify(conflict.latest.inputs));
          setConflict(null);
          refetch();
        }}
        onKeepMine={() => {
          if (conflict) doSave(conflict.latest.number, conflict.mine);
        }}
      />
      <Modal
        open={blocker.state === 'blocked'}
        title="Leave without saving?"
        okText="Leave"
        cancelText="Stay"
        onOk={() => blocker.proceed?.()}
        onCancel={() => blocker.reset?.()}
      >
        Your changes to the inputs are not saved yet.
      </Modal>
    </>
  );
}
