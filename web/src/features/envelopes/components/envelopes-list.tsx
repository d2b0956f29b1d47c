import { Button, Popconfirm, Space, Table, Tag, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { FormError } from '@/components/errors/form-error';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import { type Envelope, useEnvelopes, useRemoveEnvelope } from '../api/envelopes-api';
import { EnvelopeEditor } from './envelope-editor';

/** The envelope's own measure: a burst diameter or a rated superpressure. */
function useMeasureText(unitSystem: UnitSystem) {
  const display = useNumberDisplay(unitSystem);
  return (envelope: Envelope) =>
    envelope.burstDiameterM !== null
      ? `bursts at ${display.quantity(envelope.burstDiameterM, 'length').text}`
      : envelope.ratedSuperpressurePa !== null
        ? `rated ${display.quantity(envelope.ratedSuperpressurePa, 'pressureDifference').text}`
        : '';
}

/** The team's envelopes; those who may manage the library add, change and remove them here. */
export function EnvelopesList({
  unitSystem,
  canManage,
  envelopeHref,
}: {
  unitSystem: UnitSystem;
  canManage: boolean;
  envelopeHref: (id: string) => string;
}) {
  const envelopes = useEnvelopes();
  const remove = useRemoveEnvelope();
  const display = useNumberDisplay(unitSystem);
  const measure = useMeasureText(unitSystem);
  const [editing, setEditing] = useState<Envelope | 'new' | undefined>();
  return (
    <>
      {canManage ? (
        <Button type="primary" style={{ marginBottom: 12 }} onClick={() => setEditing('new')}>
          Add an envelope
        </Button>
      ) : null}
      <FormError error={envelopes.error ?? remove.error} />
      <Table<Envelope>
        rowKey="id"
        loading={envelopes.isPending}
        dataSource={envelopes.data ?? []}
        pagination={false}
        columns={[
          {
            title: 'Name',
            render: (_, envelope) => <Link to={envelopeHref(envelope.id)}>{envelope.name}</Link>,
          },
          {
            title: 'Kind',
            render: (_, envelope) => <Tag>{envelope.kind}</Tag>,
          },
          {
            title: 'Mass',
            render: (_, envelope) => display.quantity(envelope.massKg, 'mass').text,
          },
          { title: 'Burst or rating', render: (_, envelope) => measure(envelope) },
          { title: 'Film', dataIndex: 'film' },
          { title: 'Fills', dataIndex: 'fillCount' },
          {
            title: 'Actions',
            render: (_, envelope) => (
              <Space>
                {envelope.permissions.edit ? (
                  <Button size="small" onClick={() => setEditing(envelope)}>
                    Change
                  </Button>
                ) : null}
                {envelope.permissions.remove ? (
                  <Popconfirm
                    title={`Remove ${envelope.name} from the library?`}
                    okText="Remove"
                    onConfirm={() => remove.mutate(envelope.id)}
                  >
                    <Button size="small" danger>
                      Remove
                    </Button>
                  </Popconfirm>
                ) : envelope.permissions.edit ? (
                  <Typography.Text type="secondary">kept: fills name it</Typography.Text>
                ) : null}
              </Space>
            ),
          },
        ]}
      />
      {editing ? (
        <EnvelopeEditor
          open
          envelope={editing === 'new' ? undefined : editing}
          unitSystem={unitSystem}
          onClose={() => setEditing(undefined)}
        />
      ) : null}
    </>
  );
}
