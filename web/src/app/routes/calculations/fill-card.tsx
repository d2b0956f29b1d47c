import { KINDS } from '@loftwright/buoyancy';
import { Spin } from 'antd';
import { useParams } from 'react-router-dom';
import { FormError } from '@/components/errors/form-error';
import { useMe } from '@/features/auth/api/auth-api';
import { useCalculation } from '@/features/calculations/api/calculations-api';
import { FillCardPage } from '@/features/fill-card/components/fill-card-page';
import { VerifyQrCode } from '@/features/sign-off/components/verify-qr-code';

/** The fill card of one version, with the sign-off sheet's QR code of the verify page. */
export function FillCardRoute() {
  const { id = '', n = '1' } = useParams();
  const calculation = useCalculation(id);
  const unitSystem = useMe().user?.unitSystem ?? 'si';
  if (calculation.error) return <FormError error={calculation.error} />;
  if (!calculation.data) return <Spin />;
  const kind = calculation.data.kind;
  return (
    <FillCardPage
      calculationId={id}
      versionNumber={Number(n)}
      title={calculation.data.title}
      kind={kind}
      kindTitle={KINDS.find((candidate) => candidate.id === kind)?.title ?? kind}
      unitSystem={unitSystem}
      renderQrCode={(url) => <VerifyQrCode url={url} />}
    />
  );
}
