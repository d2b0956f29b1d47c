import type { TablePaginationConfig } from 'antd';
import type { SorterResult } from 'antd/es/table/interface';
import { useState } from 'react';
import type { CalculationListItem, CalculationListQuery } from '../api/calculations-api';

/**
 * The page, sort and filters of the calculation list, as the server takes them: a new filter
 * goes back to the first page; the table's paging and sorting set the rest.
 */
export function useCalculationListParams() {
  const [params, setParams] = useState<CalculationListQuery>({
    page: 1,
    pageSize: 20,
    sort: '-updatedAt',
  });
  const filter = (changes: Partial<CalculationListQuery>) =>
    setParams((current) => ({ ...current, page: 1, ...changes }));

  const onTableChange = (
    pagination: TablePaginationConfig,
    _filters: unknown,
    sorter: SorterResult<CalculationListItem> | SorterResult<CalculationListItem>[],
  ) => {
    const single = Array.isArray(sorter) ? sorter[0] : sorter;
    const field = typeof single?.field === 'string' ? single.field : undefined;
    const sort =
      field && single?.order ? `${single.order === 'descend' ? '-' : ''}${field}` : '-updatedAt';
    setParams((current) => ({
      ...current,
      page: pagination.current ?? 1,
      pageSize: pagination.pageSize ?? 20,
      sort,
    }));
  };

  return { params, filter, onTableChange };
}
