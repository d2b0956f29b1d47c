import { Alert, Button, Form, Input, Modal, Typography } from 'antd';
import type { UnitSystem, WindLayerValues } from '@loftwright/buoyancy';
import { useWindImport } from './use-wind-import';
import { WindColumnsFields } from './wind-columns-fields';
import { WindLevelsPreview } from './wind-levels-preview';

/**
 * Winds aloft from a forecast or sounding file (CSV or whitespace-separated text): the columns
 * mapped with their units, the levels read previewed and the bad lines listed by number. "Use"
 * only puts the levels into the form's wind; nothing is saved until a version is.
 */
export function WindImport({
  open,
  unitSystem,
  onClose,
  onUse,
}: {
  open: boolean;
  unitSystem: UnitSystem;
  onClose: () => void;
  onUse: (layers: WindLayerValues[]) => void;
}) {
  const wind = useWindImport();
  const reading = wind.read?.ok ? wind.read.reading : undefined;
  const usable = reading?.profile ? reading.layers.length : 0;
  return (
    <Modal
      open={open}
      title="Winds aloft from a file (CSV or text)"
      width={880}
      onCancel={onClose}
      destroyOnHidden
      footer={[
        <Button key="cancel" onClick={onClose}>
          Cancel
        </Button>,
        <Button
          key="use"
          type="primary"
          disabled={usable === 0}
          onClick={() => reading && onUse([...reading.layers])}
        >
          {`Use these ${usable} levels`}
        </Button>,
      ]}
    >
      <Form layout="vertical" component="div">
        <Form.Item label="Wind file">
          <input
            type="file"
            accept=".csv,.txt,.dat,text/csv,text/plain"
            aria-label="Wind file"
            onChange={(event) => {
              const file = event.target.files?.[0];
              if (file) void file.text().then((text) => wind.choose(file.name, text));
            }}
          />
          {wind.fileName ? (
            <Typography.Text type="secondary"> {wind.fileName}</Typography.Text>
          ) : null}
        </Form.Item>
        <Form.Item label="Or paste the text">
          <Input.TextArea
            aria-label="Wind text"
            rows={5}
            value={wind.text}
            onChange={(event) => wind.paste(event.target.value)}
            style={{ fontFamily: 'monospace' }}
          />
        </Form.Item>
        <WindColumnsFields wind={wind} />
        {wind.read && !wind.read.ok ? (
          <Alert type="error" showIcon title={wind.read.problem} />
        ) : null}
        {reading ? <WindLevelsPreview reading={reading} unitSystem={unitSystem} /> : null}
      </Form>
    </Modal>
  );
}
