import { Spin } from 'antd';
import type { CalculationResult, UnitSystem } from '@loftwright/buoyancy';
import { lazy, Suspense } from 'react';
import { PanelBoundary } from '@/components/errors/panel-boundary';
import { ResultsPanel } from '@/components/results/results-panel';
import { LandingAreaSection } from '../landing/landing-area-section';
import { useKindLandingArea } from '../landing/use-landing-area';

// The charting library is most of the editor's weight: the inputs and results come first, the
// pictures a moment later.
const CalculationCharts = lazy(() =>
  import('../charts/calculation-charts').then((module) => ({ default: module.CalculationCharts })),
);

/** The live results of the inputs, then their charts once computed. */
export function CalculationResultsColumn({
  kind,
  result,
  evaluatedInputs,
  unitSystem,
  title,
  problem,
  heldBack,
}: {
  kind: string;
  result: CalculationResult | undefined;
  /** The inputs `result` is for. */
  evaluatedInputs: unknown;
  unitSystem: UnitSystem;
  title: string;
  problem: string | undefined;
  /** Why no results are shown though they may be computed: fields that do not read. */
  heldBack: string | undefined;
}) {
  // Estimated when asked, in a worker; drawn on the drift track once it is for these inputs.
  const landing = useKindLandingArea(kind, evaluatedInputs, unitSystem);
  return (
    <>
      <ResultsPanel
        result={heldBack ? undefined : result}
        unitSystem={unitSystem}
        title={title}
        problem={heldBack ?? problem}
      />
      {result && evaluatedInputs ? (
        <PanelBoundary what="the charts">
          <Suspense fallback={<Spin description="Drawing the charts…" />}>
            <CalculationCharts
              kind={kind}
              inputs={evaluatedInputs as Record<string, unknown>}
              result={result}
              unitSystem={unitSystem}
              landingArea={landing.area}
            />
          </Suspense>
        </PanelBoundary>
      ) : null}
      {landing.offered && result ? (
        <LandingAreaSection landing={landing} inputs={evaluatedInputs} />
      ) : null}
    </>
  );
}
