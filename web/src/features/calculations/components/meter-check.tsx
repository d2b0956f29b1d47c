import { Alert, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { BadRowsList } from '@/components/csv/bad-rows-list';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import type { meterFromCsv } from '../lib/meter-from-csv';

/** What the meter file comes to: the energy, or the rows to fix first. */
export function MeterCheck({
  mapped,
  unitSystem,
}: {
  mapped: ReturnType<typeof meterFromCsv>;
  unitSystem: UnitSystem;
}) {
  const display = useNumberDisplay(unitSystem);
  const energy = mapped.energy;
  return (
    <div role="status" aria-label="Meter check">
      {energy ? (
        <Alert
          type={mapped.bad.length > 0 ? 'warning' : 'success'}
          showIcon
          title={`Energy used: ${display.quantity(energy.energyJ, 'energy').text} over ${display.quantity(energy.durationS, 'time').text}, mean power ${display.quantity(energy.meanPowerW, 'power').text} (${display.number(energy.samples)} samples).`}
        />
      ) : null}
      {mapped.bad.length > 0 ? (
        <>
          <Typography.Paragraph type="danger" style={{ marginTop: 8 }}>
            Fix these rows in the file first: a meter log with gaps would give the wrong energy.
          </Typography.Paragraph>
          <BadRowsList rows={mapped.bad} label="Meter rows that cannot be read" />
        </>
      ) : null}
    </div>
  );
}
