import { Button, Form, Input, Table, Tag } from 'antd';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { FormError } from '@/components/errors/form-error';
import { type ClassSummary, useClasses, useCreateClass } from '../api/classroom-api';

/** A teacher names a new class; it gets its join code at once. */
export function NewClassForm({ onCreated }: { onCreated: (id: string) => void }) {
  const create = useCreateClass();
  const [title, setTitle] = useState('');
  return (
    <Form
      layout="inline"
      aria-label="Create a class"
      onFinish={() => create.mutate({ title }, { onSuccess: (created) => onCreated(created.id) })}
    >
      <Form.Item label="New class" htmlFor="class-title">
        <Input
          id="class-title"
          placeholder="Physics 11B: buoyancy week"
          value={title}
          maxLength={200}
          style={{ width: 320 }}
          onChange={(event) => setTitle(event.target.value)}
        />
      </Form.Item>
      <Button type="primary" htmlType="submit" loading={create.isPending} disabled={!title.trim()}>
        Create class
      </Button>
      <FormError error={create.error} />
    </Form>
  );
}

/** The classes the user teaches or sits in. */
export function ClassesList({ classHref }: { classHref: (id: string) => string }) {
  const classes = useClasses();
  return (
    <Table<ClassSummary>
      rowKey="id"
      size="middle"
      aria-label="Classes"
      loading={classes.isPending}
      dataSource={classes.data ?? []}
      locale={{ emptyText: 'No classes yet' }}
      pagination={{ hideOnSinglePage: true }}
      columns={[
        {
          title: 'Class',
          dataIndex: 'title',
          render: (title: string, row) => <Link to={classHref(row.id)}>{title}</Link>,
        },
        {
          title: 'You are',
          dataIndex: 'standing',
          render: (standing: ClassSummary['standing']) =>
            standing === 'teacher' ? 'teacher' : standing === 'student' ? 'student' : 'admin',
        },
        { title: 'Students', dataIndex: 'studentCount', width: 100 },
        {
          title: 'State',
          dataIndex: 'closed',
          render: (closed: boolean) =>
            closed ? <Tag>closed</Tag> : <Tag color="processing">open</Tag>,
        },
        {
          title: 'Join code',
          dataIndex: 'joinCode',
          render: (code: string | undefined) =>
            code ? <span className="lw-mono">{code}</span> : '—',
        },
      ]}
    />
  );
}
