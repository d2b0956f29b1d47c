import { Spin } from 'antd';
import { useParams } from 'react-router-dom';
import { useCalculation } from '@/features/calculations/api/calculations-api';
import { SignOffSheet } from '@/features/sign-off/components/sign-off-sheet';

export function SignOffSheetRoute() {
  const { id = '', n = '1' } = useParams();
  const calculation = useCalculation(id);
  if (!calculation.data) return <Spin />;
  return (
    <SignOffSheet
      calculationId={id}
      title={calculation.data.title}
      kind={calculation.data.kind}
      number={Number(n)}
    />
  );
}
