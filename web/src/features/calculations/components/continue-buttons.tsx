import { App, Button, Space, Tooltip } from 'antd';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { type CalculationDetail, useContinueCalculation } from '../api/calculations-api';

/**
 * "Continue as …": a new calculation of the next kind in the design chain, made from the newest
 * saved version (the API lists the kinds the reader may continue into).
 */
export function ContinueButtons({ detail, dirty }: { detail: CalculationDetail; dirty: boolean }) {
  const { message } = App.useApp();
  const navigate = useNavigate();
  const version = detail.latestVersion;
  const proceed = useContinueCalculation(detail.id, version);
  if (!detail.latest || detail.continueAs.length === 0) return null;
  return (
    <Space wrap>
      {detail.continueAs.map((target) => (
        <Tooltip
          key={target.toKind}
          title={
            dirty
              ? `From version ${version} as saved: your unsaved changes are not carried.`
              : `From version ${version}.`
          }
        >
          <Button
            loading={proceed.isPending && proceed.variables.toKind === target.toKind}
            onClick={() =>
              proceed.mutate(
                { toKind: target.toKind },
                {
                  onSuccess: (created) => void navigate(paths.calculation.href(created.id)),
                  onError: (error) => void message.error(error.message),
                },
              )
            }
          >
            Continue as {target.title.toLowerCase()}
          </Button>
        </Tooltip>
      ))}
    </Space>
  );
}
