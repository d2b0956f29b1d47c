import { queryOptions, useQuery } from '@tanstack/react-query';
import type { HealthReport } from '@loftwright/contract';
import { apiClient } from '@/lib/api-client';

export type { HealthReport } from '@loftwright/contract';

export async function getHealth(): Promise<HealthReport> {
  // A 503 still carries the report, so read it instead of treating it as a failure.
  const response = await apiClient.get<HealthReport>('/health', {
    validateStatus: (status) => status === 200 || status === 503,
  });
  return response.data;
}

export const getHealthQueryOptions = () =>
  queryOptions({ queryKey: ['health'], queryFn: getHealth, staleTime: 10_000 });

export const useHealth = () => useQuery(getHealthQueryOptions());
