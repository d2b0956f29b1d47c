import { Button, Form, Input, Modal, Select } from 'antd';
import { KINDS } from '@loftwright/buoyancy';
import { useState } from 'react';
import { useCreateCalculation } from '../api/calculations-api';

/** "New calculation": pick a kind and a title; it starts from the kind's documented example. */
export function NewCalculationButton({ onCreated }: { onCreated: (id: string) => void }) {
  const [open, setOpen] = useState(false);
  const create = useCreateCalculation();
  const [form] = Form.useForm<{ title: string; kind: string }>();
  return (
    <>
      <Button type="primary" onClick={() => setOpen(true)}>
        New calculation
      </Button>
      <Modal
        open={open}
        title="New calculation"
        okText="Create"
        confirmLoading={create.isPending}
        onCancel={() => setOpen(false)}
        onOk={() => form.submit()}
        destroyOnHidden
      >
        <Form
          form={form}
          layout="vertical"
          initialValues={{ kind: 'lift-check' }}
          onFinish={(values) => {
            const kind = KINDS.find((candidate) => candidate.id === values.kind);
            create.mutate(
              { title: values.title, kind: values.kind, inputs: kind?.example ?? {} },
              {
                onSuccess: (created) => {
                  setOpen(false);
                  onCreated(created.id);
                },
              },
            );
          }}
        >
          <Form.Item
            label="Kind"
            name="kind"
            rules={[{ required: true }]}
            extra={create.error?.message}
          >
            <Select
              options={KINDS.map((kind) => ({
                value: kind.id,
                label: kind.title,
                title: kind.description,
              }))}
            />
          </Form.Item>
          <Form.Item
            label="Title"
            name="title"
            rules={[{ required: true, message: 'Give the calculation a title.' }]}
          >
            <Input maxLength={200} />
          </Form.Item>
        </Form>
      </Modal>
    </>
  );
}
