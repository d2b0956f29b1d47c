import { Alert, Button, Card, Col, Row, Space, Spin, Tag, Typography } from 'antd';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/auth-api';
import { useClass } from '@/features/classroom/api/classroom-api';
import { ClassesList, NewClassForm } from '@/features/classroom/components/classes-list';
import { ClassRoster, JoinCodeCard } from '@/features/classroom/components/class-roster';
import { ExamplesTable } from '@/features/classroom/components/examples-table';
import { JoinClassForm } from '@/features/classroom/components/join-class-form';
import { PublishExampleForm } from '@/features/classroom/components/publish-example-form';

export function ClassesRoute() {
  const navigate = useNavigate();
  const { user } = useMe();
  const teaches = user?.permissions.runClasses ?? false;
  const studies = user?.permissions.joinClasses ?? false;
  return (
    <>
      <Typography.Title level={1}>Classes</Typography.Title>
      <Typography.Paragraph style={{ maxWidth: 760 }}>
        {teaches
          ? 'Run a class: hand out its join code, publish worked examples for the projector, let students try the inputs themselves and set exercises the engine checks.'
          : 'The classes you have joined and what your teachers published to them.'}
      </Typography.Paragraph>
      <Space orientation="vertical" size="large" style={{ width: '100%' }}>
        {teaches ? (
          <NewClassForm onCreated={(id) => void navigate(paths.classroom.href(id))} />
        ) : null}
        {studies ? (
          <JoinClassForm onJoined={(id) => void navigate(paths.classroom.href(id))} />
        ) : null}
        <ClassesList classHref={paths.classroom.href} />
      </Space>
    </>
  );
}

export function ClassRoute() {
  const { id = '' } = useParams();
  const navigate = useNavigate();
  const { user } = useMe();
  const classroom = useClass(id);
  if (classroom.isPending) return <Spin description="Loading the class…" />;
  if (classroom.error) return <Alert type="warning" showIcon title={classroom.error.message} />;
  const data = classroom.data;
  const teaching = data.standing !== 'student';
  return (
    <>
      <Typography.Text type="secondary">
        <Link to={paths.classes.href()}>Classes</Link>
      </Typography.Text>
      <Typography.Title level={2} style={{ marginTop: 4 }}>
        {data.title} {data.closed ? <Tag>closed</Tag> : null}
      </Typography.Title>
      <Typography.Paragraph type="secondary">
        Teacher: {data.teacher.displayName}
      </Typography.Paragraph>
      {teaching ? (
        <Row gutter={[16, 16]}>
          <Col xs={24} lg={10}>
            <Space orientation="vertical" size="middle" style={{ width: '100%' }}>
              <JoinCodeCard classroom={data} />
              <Card size="small" title={`Students (${data.students?.length ?? 0})`}>
                <ClassRoster classroom={data} />
              </Card>
            </Space>
          </Col>
          <Col xs={24} lg={14}>
            <Space orientation="vertical" size="middle" style={{ width: '100%' }}>
              <Card size="small" title="Worked examples">
                <ExamplesTable
                  classId={data.id}
                  exampleHref={paths.example.href}
                  forStudent={false}
                />
              </Card>
              {user && data.permissions.publish ? (
                <PublishExampleForm
                  classId={data.id}
                  userId={user.id}
                  onPublished={(exampleId) => void navigate(paths.example.href(exampleId))}
                />
              ) : null}
            </Space>
          </Col>
        </Row>
      ) : (
        <ExamplesTable classId={data.id} exampleHref={paths.example.href} forStudent />
      )}
    </>
  );
}

/** The join link a teacher hands out: one button to join, or a clear reason why not. */
export function JoinRoute() {
  const { code = '' } = useParams();
  const navigate = useNavigate();
  const { user, signedIn } = useMe();
  if (!signedIn) {
    return (
      <Card style={{ maxWidth: 520 }}>
        <Typography.Title level={2}>Join a class</Typography.Title>
        <Typography.Paragraph>
          Your teacher’s code: <span className="lw-mono">{code.toUpperCase()}</span>
        </Typography.Paragraph>
        <Space wrap>
          <Link to={paths.register.href(code)}>
            <Button type="primary">Create a student account and join</Button>
          </Link>
          <Link to={paths.signIn.href(paths.join.href(code))}>
            <Button>Sign in to join</Button>
          </Link>
        </Space>
      </Card>
    );
  }
  return (
    <>
      <Typography.Title level={2}>Join a class</Typography.Title>
      {user && !user.permissions.joinClasses ? (
        <Alert
          type="info"
          showIcon
          style={{ marginBottom: 16 }}
          title="Joining needs a student account. Teachers open their own classes from Classes."
        />
      ) : null}
      <Typography.Paragraph>Check the code your teacher gave you, then join.</Typography.Paragraph>
      <JoinClassForm
        initialCode={code}
        onJoined={(id) => void navigate(paths.classroom.href(id), { replace: true })}
      />
      <Button
        type="link"
        style={{ paddingLeft: 0, marginTop: 12 }}
        onClick={() => void navigate(paths.classes.href())}
      >
        Your classes
      </Button>
    </>
  );
}
