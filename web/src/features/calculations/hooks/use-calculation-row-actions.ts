import { App } from 'antd';
import {
  type CalculationListItem,
  useArchiveCalculation,
  useDuplicateCalculation,
} from '../api/calculations-api';

/** Duplicating and archiving a calculation from its row of the list, each said in a message. */
export function useCalculationRowActions(onDuplicated: (id: string) => void) {
  const { message } = App.useApp();
  const archive = useArchiveCalculation();
  const duplicate = useDuplicateCalculation();
  return {
    duplicate: (row: CalculationListItem) =>
      duplicate.mutate(row.id, {
        onSuccess: (copy) => onDuplicated(copy.id),
        onError: (failure) => void message.error(failure.message),
      }),
    /** Whether this row is being duplicated now. */
    duplicating: (row: CalculationListItem) =>
      duplicate.isPending && duplicate.variables === row.id,
    archive: (row: CalculationListItem) =>
      archive.mutateAsync(row.id).then(
        () => void message.success(`Archived “${row.title}”.`),
        (failure: Error) => void message.error(failure.message),
      ),
  };
}

export type CalculationRowActions = ReturnType<typeof useCalculationRowActions>;
