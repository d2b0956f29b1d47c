import { Button, Card, Descriptions, Popconfirm, Space, Table, Typography } from 'antd';
import { useState } from 'react';
import {
  type ClassDetail,
  useCloseClass,
  useRemoveStudent,
  useRenewJoinCode,
} from '../api/classroom-api';

/** The join code and link to hand out, large enough to read off a projector. */
export function JoinCodeCard({ classroom }: { classroom: ClassDetail }) {
  const renew = useRenewJoinCode(classroom.id);
  const close = useCloseClass(classroom.id);
  // Read once per showing: whether the code has run out only needs to be right when shown.
  const [shownAt] = useState(() => Date.now());
  if (classroom.closed) {
    return (
      <Card size="small" title="Join code">
        The class is closed: nobody can join, students keep reading what was published.
      </Card>
    );
  }
  const expired =
    classroom.joinCodeExpiresAt !== undefined &&
    new Date(classroom.joinCodeExpiresAt).getTime() < shownAt;
  return (
    <Card size="small" title="Join code" aria-label="Join code">
      <Typography.Text
        className="lw-mono"
        strong
        style={{ fontSize: 40, letterSpacing: 4 }}
        data-join-code
        copyable={{ text: classroom.joinCode ?? '', tooltips: ['Copy the code', 'Copied'] }}
      >
        {classroom.joinCode}
      </Typography.Text>
      <Descriptions size="small" column={1} style={{ marginTop: 8 }}>
        <Descriptions.Item label="Join link">
          <Typography.Text copyable className="lw-mono">
            {classroom.joinUrl}
          </Typography.Text>
        </Descriptions.Item>
        <Descriptions.Item label={expired ? 'Expired' : 'Works until'}>
          {classroom.joinCodeExpiresAt
            ? new Date(classroom.joinCodeExpiresAt).toLocaleString()
            : '—'}
        </Descriptions.Item>
      </Descriptions>
      <Space style={{ marginTop: 8 }}>
        <Button loading={renew.isPending} onClick={() => renew.mutate(14)}>
          New code for 14 days
        </Button>
        <Popconfirm
          title="Close the class?"
          description="Nobody can join or submit answers after this; students can still read it."
          okText="Close class"
          cancelText="Keep open"
          onConfirm={() => close.mutateAsync()}
        >
          <Button danger>Close class</Button>
        </Popconfirm>
      </Space>
    </Card>
  );
}

type Student = NonNullable<ClassDetail['students']>[number];

export function ClassRoster({ classroom }: { classroom: ClassDetail }) {
  const remove = useRemoveStudent(classroom.id);
  return (
    <Table<Student>
      rowKey="id"
      size="small"
      aria-label="Students"
      dataSource={classroom.students ?? []}
      locale={{ emptyText: 'No students have joined yet' }}
      pagination={{ hideOnSinglePage: true, pageSize: 50 }}
      columns={[
        { title: 'Student', dataIndex: 'displayName' },
        {
          title: 'Joined',
          dataIndex: 'joinedAt',
          render: (at: string) => new Date(at).toLocaleString(),
        },
        {
          title: 'Actions',
          key: 'actions',
          render: (_: unknown, student) => (
            <Popconfirm
              title={`Remove ${student.displayName} from the class?`}
              okText="Remove"
              cancelText="Keep"
              onConfirm={() => remove.mutateAsync(student.id)}
            >
              <Button type="link" danger size="small" aria-label={`Remove ${student.displayName}`}>
                Remove
              </Button>
            </Popconfirm>
          ),
        },
      ]}
    />
  );
}
