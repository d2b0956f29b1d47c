import { Alert, Button, Card, Space, Spin, Typography } from 'antd';
import {
  DEFAULT_LANDING_SPREADS,
  LANDING_RUNS_RANGE,
  type LandingSpreads,
} from '@loftwright/buoyancy';
import { usePlainNumbers } from '@/components/reading/use-number-display';
import type { LandingAreaState } from './use-landing-area';

const SPREAD_LABELS: Record<keyof LandingSpreads, string> = {
  burstDiameter: 'burst diameter',
  ascentRate: 'ascent rate',
  descentDrag: 'parachute drag',
  windSpeed: 'wind speed',
};

/** The run count and spreads the inputs give, defaults filled in as the engine fills them. */
export function landingSettingsOf(inputs: unknown): { runs: number; spreads: LandingSpreads } {
  const settings = (
    inputs as { landingArea?: { runs?: number; spreads?: Partial<LandingSpreads> } }
  )?.landingArea;
  return {
    runs: settings?.runs ?? LANDING_RUNS_RANGE.default,
    spreads: { ...DEFAULT_LANDING_SPREADS, ...settings?.spreads },
  };
}

function hasWindAndSite(inputs: unknown): boolean {
  const { wind, launch } = (inputs ?? {}) as {
    wind?: unknown;
    launch?: { latitudeDeg?: number; longitudeDeg?: number };
  };
  return (
    wind !== undefined && launch?.latitudeDeg !== undefined && launch.longitudeDeg !== undefined
  );
}

/**
 * Where the flight may land: pressed, not on every change, because it flies the balloon some
 * hundreds of times (in a worker, so the page stays usable, and it can be stopped). The regions
 * are drawn on the drift track; this says what was varied and how far.
 */
export function LandingAreaSection({
  landing,
  inputs,
}: {
  landing: LandingAreaState;
  inputs: unknown;
}) {
  const hasWind = hasWindAndSite(inputs);
  const display = usePlainNumbers();
  const { runs, spreads } = landingSettingsOf(inputs);
  const spreadText = (Object.keys(SPREAD_LABELS) as (keyof LandingSpreads)[])
    .map((key) => `${SPREAD_LABELS[key]} ${display.fixed(spreads[key] * 100, 0)} %`)
    .join(', ');
  return (
    <Card title="Landing area" size="small" style={{ marginTop: 16 }} aria-label="Landing area">
      <Typography.Paragraph type="secondary">
        {`${runs} repeated flights, each input varied by one standard deviation of: ${spreadText}. Change them under “Landing area” in the inputs.`}
      </Typography.Paragraph>
      {!hasWind ? (
        <Alert
          type="info"
          showIcon
          title="Give the winds aloft and the launch site’s latitude and longitude to estimate a landing area."
        />
      ) : null}
      <Space orientation="horizontal" wrap style={{ marginTop: 8 }}>
        <Button type="primary" onClick={landing.estimate} loading={landing.running}>
          Estimate landing area
        </Button>
        {landing.running ? (
          <>
            <Spin size="small" />
            <Typography.Text role="status">{`Flying ${runs} runs…`}</Typography.Text>
            <Button onClick={landing.cancel}>Cancel</Button>
          </>
        ) : null}
      </Space>
      {landing.problem ? (
        <Alert type="error" showIcon style={{ marginTop: 8 }} title={landing.problem} />
      ) : null}
      {landing.stale ? (
        <Alert
          type="warning"
          showIcon
          style={{ marginTop: 8 }}
          title="The inputs changed after the landing area was estimated; estimate it again."
        />
      ) : null}
      {landing.area ? (
        <Typography.Paragraph role="status" style={{ marginTop: 8 }}>
          {`Landing area from ${landing.area.runs.length} runs drawn on the drift track`}
          {landing.area.failedRuns > 0
            ? `; ${landing.area.failedRuns} runs did not rise or land in time and are left out`
            : ''}
          .
        </Typography.Paragraph>
      ) : null}
      {landing.area?.notes?.map((note) => (
        <Alert key={note.code} type="info" showIcon style={{ marginTop: 8 }} title={note.message} />
      ))}
    </Card>
  );
}
