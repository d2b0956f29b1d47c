import { Alert, Button, Col, Form, Row, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { FieldFormError } from '@/components/errors/field-form-error';
import {
  describeUnreadable,
  UnreadableFieldsContext,
  useUnreadableFields,
} from '@/components/reading/unreadable-fields';
import { type Plan, useSavePlan } from '../api/plans-api';
import { usePlanDraft } from '../hooks/use-plan-draft';
import { PlanCylinderFields } from './plan-cylinder-fields';
import { PlanElectrolyserFields } from './plan-electrolyser-fields';
import { planLabel } from './plan-field-labels';
import { PlanFillSection } from './plan-fill-section';
import { PlanLinesSection } from './plan-lines-section';
import { PlanPricesSection } from './plan-prices-section';
import { PlanSummary } from './plan-summary';
import { PlanTitleFields } from './plan-title-fields';

/**
 * A gas plan: the envelopes of an event times their counts, the air at filling, the supply and
 * its prices; saved to the server, which computes the totals, running time and cost per source.
 */
export function PlanEditor({ plan, unitSystem }: { plan: Plan; unitSystem: UnitSystem }) {
  const save = useSavePlan(plan.id);
  const editor = usePlanDraft(plan.inputs);
  const [unreadableFields, unreadableRegistry] = useUnreadableFields();
  const heldBack = editor.anyUnread || unreadableFields.length > 0;

  return (
    <Row gutter={[16, 16]}>
      <Col xs={24} xl={12}>
        <UnreadableFieldsContext.Provider value={unreadableRegistry}>
          <Form layout="vertical" component="div" requiredMark={false}>
            <PlanTitleFields editor={editor} />
            <PlanLinesSection editor={editor} unitSystem={unitSystem} />
            <PlanFillSection editor={editor} unitSystem={unitSystem} />
            <Typography.Title level={5}>Sources</Typography.Title>
            <PlanElectrolyserFields editor={editor} unitSystem={unitSystem} />
            <PlanCylinderFields editor={editor} unitSystem={unitSystem} />
            <PlanPricesSection editor={editor} />
            <FieldFormError error={save.error} unitSystem={unitSystem} labels={planLabel} />
            {heldBack ? (
              <Alert
                type="warning"
                showIcon
                title={`Not saved until these read: ${
                  describeUnreadable(unreadableFields) || 'a quantity field above'
                }`}
                style={{ marginBottom: 8 }}
              />
            ) : null}
            <Button
              type="primary"
              loading={save.isPending}
              disabled={heldBack}
              onClick={() => save.mutate(editor.draft)}
            >
              Save and compute
            </Button>
          </Form>
        </UnreadableFieldsContext.Provider>
      </Col>
      <Col xs={24} xl={12}>
        <PlanSummary
          planId={plan.id}
          result={save.data?.result ?? plan.result}
          currency={(save.data ?? plan).inputs.prices?.currency ?? ''}
          justSaved={save.isSuccess}
          unitSystem={unitSystem}
        />
      </Col>
    </Row>
  );
}
