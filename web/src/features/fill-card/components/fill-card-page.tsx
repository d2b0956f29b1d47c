import {
  type FillCard,
  fillCard,
  type FillCardOptions,
  InputError,
  type UnitSystem,
} from '@loftwright/buoyancy';
import { Alert, App, Button, Space, Spin, Typography } from 'antd';
import { type ReactNode, useMemo, useState } from 'react';
import { FormError } from '@/components/errors/form-error';
import { paths } from '@/config/paths';
import { downloadFillCardPdf, useFillCardVersion } from '../api/fill-card-api';
import { FILL_CARD_LABELS, FillCardForm, type FillCardFormValues } from './fill-card-form';
import { FillCardSheet } from './fill-card-sheet';
import './fill-card.css';

export interface FillCardPageProps {
  calculationId: string;
  versionNumber: number;
  title: string;
  kind: string;
  kindTitle: string;
  unitSystem: UnitSystem;
  /** The verify page's QR code, drawn by whoever composes the page. */
  renderQrCode: (url: string) => ReactNode;
}

/**
 * The crew's fill card of one saved version: the form for what is typed at the table, and the
 * card itself, recomputed in the browser with the engine as they type; print it, or fetch the
 * server's one-page PDF.
 */
export function FillCardPage(props: FillCardPageProps) {
  const version = useFillCardVersion(props.calculationId, props.versionNumber);
  if (version.isPending) return <Spin />;
  if (version.error) return <FormError error={version.error} />;
  return (
    <FillCardWorkbench
      {...props}
      inputs={version.data.inputs}
      fingerprint={version.data.fingerprint}
      engineVersion={version.data.engineVersion}
    />
  );
}

/** The version's own free lift, what the card defaults to; undefined if it has none to give. */
function versionFreeLiftKg(kind: string, inputs: unknown): number | undefined {
  try {
    return fillCard(kind, inputs, { fillerMassKg: 0 }).freeLift.value;
  } catch {
    return undefined;
  }
}

/** The typed values as the engine's options: the free lift only when changed, cylinders if any. */
function optionsOf(values: FillCardFormValues, defaultFreeLiftKg?: number): FillCardOptions {
  const { cylinder } = values;
  const anyCylinder = Object.values(cylinder).some((value) => value !== undefined);
  const freeLiftTyped = values.freeLiftKg !== undefined && values.freeLiftKg !== defaultFreeLiftKg;
  return {
    ...(values.fillerMassKg === undefined ? {} : { fillerMassKg: values.fillerMassKg }),
    ...(freeLiftTyped ? { freeLiftKg: values.freeLiftKg } : {}),
    // Missing cylinder fields go to the engine as they are, so it names the one to fill in.
    ...(anyCylinder ? { cylinder: cylinder as Required<FillCardFormValues['cylinder']> } : {}),
  };
}

function FillCardWorkbench({
  calculationId,
  versionNumber,
  title,
  kind,
  kindTitle,
  unitSystem,
  renderQrCode,
  inputs,
  fingerprint,
  engineVersion,
}: FillCardPageProps & { inputs: unknown; fingerprint: string; engineVersion: string }) {
  const { message } = App.useApp();
  const defaultFreeLiftKg = useMemo(() => versionFreeLiftKg(kind, inputs), [kind, inputs]);
  const [values, setValues] = useState<FillCardFormValues>({
    freeLiftKg: defaultFreeLiftKg,
    cylinder: {},
  });
  const options = useMemo(() => optionsOf(values, defaultFreeLiftKg), [values, defaultFreeLiftKg]);
  const computed = useMemo((): { card?: FillCard; error?: InputError } => {
    if (options.fillerMassKg === undefined) return {};
    try {
      return { card: fillCard(kind, inputs, options) };
    } catch (error) {
      if (error instanceof InputError) return { error };
      throw error;
    }
  }, [kind, inputs, options]);
  const problems = Object.fromEntries(
    (computed.error?.issues ?? [])
      .filter((issue) => FILL_CARD_LABELS[issue.field])
      .map((issue) => [issue.field, issue.reason]),
  );
  const otherProblem = computed.error?.issues.find((issue) => !FILL_CARD_LABELS[issue.field]);
  const verifyUrl = `${window.location.origin}${paths.verify.href(fingerprint)}`;
  return (
    <div>
      <Typography.Title level={1} className="lw-fill-card-actions">
        Fill card: {title}, version {versionNumber}
      </Typography.Title>
      <FillCardForm
        values={values}
        onChange={setValues}
        unitSystem={unitSystem}
        problems={problems}
      />
      {options.fillerMassKg === undefined ? (
        <Alert
          type="info"
          showIcon
          title="Type the filler's mass to get the weight to hang on it."
        />
      ) : null}
      {otherProblem ? (
        <Alert
          type="error"
          showIcon
          role="alert"
          title={`This version has no fill card: ${otherProblem.field} ${otherProblem.reason}.`}
        />
      ) : null}
      {computed.card ? (
        <>
          <Space className="lw-fill-card-actions" style={{ marginTop: 12 }}>
            <Button onClick={() => window.print()}>Print the card</Button>
            <Button
              onClick={() =>
                void downloadFillCardPdf(calculationId, versionNumber, options).catch(
                  (error: unknown) =>
                    void message.error(error instanceof Error ? error.message : String(error)),
                )
              }
            >
              Download the PDF
            </Button>
          </Space>
          <FillCardSheet
            card={computed.card}
            header={{ title, kindTitle, versionNumber, fingerprint, engineVersion, verifyUrl }}
            unitSystem={unitSystem}
            qrCode={renderQrCode(verifyUrl)}
          />
        </>
      ) : null}
    </div>
  );
}
