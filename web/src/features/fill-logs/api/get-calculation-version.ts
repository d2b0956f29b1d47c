import { queryOptions, useQuery } from '@tanstack/react-query';
import type { VersionDetail } from '@loftwright/contract';
import { apiClient } from '@/lib/api-client';

/**
 * GET /api/calculations/:id/versions/:n: a fill log needs the inputs the version was computed
 * from (its air among them).
 */
export const getCalculationVersion = async (calculationId: string, versionNumber: number) =>
  (await apiClient.get<VersionDetail>(`/calculations/${calculationId}/versions/${versionNumber}`))
    .data;

/** A saved version never changes, so once read it stays fresh. */
export const calculationVersionQueryOptions = (calculationId: string, versionNumber: number) =>
  queryOptions({
    queryKey: ['fill-logs', 'version', calculationId, versionNumber],
    queryFn: () => getCalculationVersion(calculationId, versionNumber),
    staleTime: Infinity,
  });

export const useCalculationVersion = (
  calculationId: string,
  versionNumber: number,
  enabled = true,
) => useQuery({ ...calculationVersionQueryOptions(calculationId, versionNumber), enabled });
