import type { UnitSystem } from '@loftwright/buoyancy';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import { stepNumber } from '@/components/results/step-number';
import type { ReviewedVersion } from '../api/sign-off-api';

/** The results of the version in the reader's units, then every step of their derivation. */
export function SheetResults({
  version,
  unitSystem,
}: {
  version: ReviewedVersion;
  unitSystem: UnitSystem;
}) {
  const { numberFormat } = useReadingPreferences();
  const display = useNumberDisplay(unitSystem);
  const number = (value: number) => stepNumber(value, numberFormat);
  return (
    <>
      <h2>Results</h2>
      <table>
        <tbody>
          {Object.entries(version.outputs).map(([name, output]) => (
            <tr key={name}>
              <th scope="row">{output.label}</th>
              <td className="lw-mono">{display.outputText(output.value, output.unit)}</td>
              <td>{output.context ?? ''}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <h2>Derivation</h2>
      <ol>
        {version.steps.map((step) => (
          <li key={step.id}>
            <strong>{step.label}</strong>: <span className="lw-mono">{step.formula}</span>
            {step.values.length ? (
              <span className="lw-mono">
                {' '}
                with{' '}
                {step.values
                  .map((value) => `${value.symbol} = ${number(value.value)} ${value.unit}`)
                  .join(', ')}
              </span>
            ) : null}
            <span className="lw-mono">
              {' '}
              → {step.result.symbol} = {number(step.result.value)} {step.result.unit}
            </span>{' '}
            <em>({step.source})</em>
          </li>
        ))}
      </ol>
    </>
  );
}
