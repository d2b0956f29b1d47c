import { Alert, Typography } from 'antd';
import { Link, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/auth-api';
import { EnvelopeDetailView } from '@/features/envelopes/components/envelope-detail';
import { EnvelopesList } from '@/features/envelopes/components/envelopes-list';

const notForYou = (
  <Alert type="info" showIcon title="The envelope library is open to the team's roles." />
);

export function EnvelopesRoute() {
  const { user } = useMe();
  if (!user?.permissions.seeEnvelopes) return notForYou;
  return (
    <>
      <Typography.Title level={1}>Envelopes</Typography.Title>
      <Typography.Paragraph style={{ maxWidth: 760 }}>
        The envelopes your team keeps, with their mass and burst diameter or rated superpressure, to
        choose in a calculation instead of typing them, and each one's fills measured against what
        was predicted. The starter entries are invented examples: replace their figures with your
        own.
      </Typography.Paragraph>
      <EnvelopesList
        unitSystem={user.unitSystem}
        canManage={user.permissions.manageEnvelopes}
        envelopeHref={paths.envelope.href}
      />
    </>
  );
}

export function EnvelopeRoute() {
  const { id = '' } = useParams();
  const { user } = useMe();
  if (!user?.permissions.seeEnvelopes) return notForYou;
  return (
    <>
      <Link to={paths.envelopes.href()}>All envelopes</Link>
      <EnvelopeDetailView
        id={id}
        unitSystem={user.unitSystem}
        calculationHref={paths.calculation.href}
      />
    </>
  );
}
