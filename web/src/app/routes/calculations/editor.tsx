import { useParams } from 'react-router-dom';
import { useMe } from '@/features/auth/api/auth-api';
import { CalculationEditor } from '@/features/calculations/components/calculation-editor';

export function CalculationEditorRoute() {
  const { id = '' } = useParams();
  const { user } = useMe();
  return <CalculationEditor key={id} id={id} unitSystem={user?.unitSystem ?? 'si'} />;
}
