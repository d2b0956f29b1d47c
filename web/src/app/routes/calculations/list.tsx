import { Space, Typography } from 'antd';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/auth-api';
import { CalculationsTable } from '@/features/calculations/components/calculations-table';
import { ImportCalculationButton } from '@/features/calculations/components/import-calculation-button';
import { NewCalculationButton } from '@/features/calculations/components/new-calculation-button';

export function CalculationsRoute() {
  const navigate = useNavigate();
  const { user } = useMe();
  const mayCreate = user?.permissions.createCalculations ?? false;
  return (
    <>
      <Space style={{ width: '100%', justifyContent: 'space-between' }} wrap>
        <Typography.Title level={1} style={{ margin: 0 }}>
          Calculations
        </Typography.Title>
        {mayCreate ? (
          <Space>
            <ImportCalculationButton
              onImported={(id) => void navigate(paths.calculation.href(id))}
            />
            <NewCalculationButton onCreated={(id) => void navigate(paths.calculation.href(id))} />
          </Space>
        ) : null}
      </Space>
      <CalculationsTable
        calculationHref={paths.calculation.href}
        sheetHref={paths.sheet.href}
        mayDuplicate={mayCreate}
        onDuplicated={(id) => void navigate(paths.calculation.href(id))}
      />
    </>
  );
}
