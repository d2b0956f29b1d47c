import { Alert, Table, Typography } from 'antd';
import type { UnitSystem, WindProfileReading } from '@loftwright/buoyancy';
import { BadRowsList } from '@/components/csv/bad-rows-list';
import { useNumberDisplay } from '@/components/reading/use-number-display';

/**
 * The levels the engine read from the file, in the reader's units, with the lines it left out
 * by line number and why, and whether the file's temperatures take over from the standard day.
 */
export function WindLevelsPreview({
  reading,
  unitSystem,
}: {
  reading: WindProfileReading;
  unitSystem: UnitSystem;
}) {
  const display = useNumberDisplay(unitSystem);
  const heightsM = reading.profile?.heightsM;
  const rows = reading.layers.map((layer, index) => ({
    key: reading.lines[index] ?? index,
    line: reading.lines[index],
    height:
      heightsM?.[index] !== undefined
        ? display.quantity(heightsM[index], 'length').text
        : layer.heightM !== undefined
          ? display.quantity(layer.heightM, 'length').text
          : '',
    pressure:
      layer.pressurePa !== undefined ? display.quantity(layer.pressurePa, 'pressure').text : '',
    direction: `${display.fixed(layer.directionDeg, 0)} °`,
    speed: display.quantity(layer.speedMS, 'velocity').text,
    temperature:
      layer.temperatureK !== undefined
        ? display.quantity(layer.temperatureK, 'temperature').text
        : '',
  }));
  const topM = heightsM ? heightsM[heightsM.length - 1] : undefined;
  const hasTemperatures = reading.layers.some((layer) => layer.temperatureK !== undefined);
  return (
    <section aria-label="Wind levels read">
      <Typography.Paragraph>
        {reading.layers.length} {reading.layers.length === 1 ? 'level' : 'levels'} read
        {reading.bad.length > 0
          ? `, ${reading.bad.length} ${reading.bad.length === 1 ? 'line' : 'lines'} left out`
          : ''}
        .
      </Typography.Paragraph>
      {reading.problem ? <Alert type="error" showIcon title={reading.problem} /> : null}
      {hasTemperatures && topM !== undefined ? (
        <Alert
          type="info"
          showIcon
          style={{ marginBottom: 8 }}
          title={`The file's temperatures replace the standard atmosphere up to its top level (${display.quantity(topM, 'length').text}); above it the standard atmosphere is used.`}
        />
      ) : null}
      <Table
        size="small"
        aria-label="Levels read from the file"
        pagination={{ pageSize: 8, hideOnSinglePage: true }}
        dataSource={rows}
        columns={[
          { title: 'Line', dataIndex: 'line' },
          { title: 'Height', dataIndex: 'height' },
          { title: 'Pressure', dataIndex: 'pressure' },
          { title: 'From', dataIndex: 'direction' },
          { title: 'Speed', dataIndex: 'speed' },
          { title: 'Temperature', dataIndex: 'temperature' },
        ]}
      />
      {reading.bad.length > 0 ? (
        <>
          <Typography.Text strong>Lines left out</Typography.Text>
          <BadRowsList rows={reading.bad} label="Lines left out" />
        </>
      ) : null}
    </section>
  );
}
