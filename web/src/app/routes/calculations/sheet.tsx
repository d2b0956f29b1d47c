import { Spin } from 'antd';
import { useParams } from 'react-router-dom';
import { useMe } from '@/features/auth/api/auth-api';
import { useCalculation } from '@/features/calculations/api/calculations-api';
import { SignOffSheet } from '@/features/sign-off/components/sign-off-sheet';

export function SignOffSheetRoute() {
  const { id = '', n = '1' } = useParams();
  const calculation = useCalculation(id);
  const unitSystem = useMe().user?.unitSystem ?? 'si';
  if (!calculation.data) return <Spin />;
  return (
    <SignOffSheet
      calculationId={id}
      title={calculation.data.title}
      kind={calculation.data.kind}
      number={Number(n)}
      unitSystem={unitSystem}
    />
  );
}
