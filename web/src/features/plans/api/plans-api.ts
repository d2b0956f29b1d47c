import { KINDS } from '@loftwright/buoyancy';
import type { CalculationListItem, Plan, SavePlanBody } from '@loftwright/contract';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';

export type { CalculationListItem, Plan, PlanLineResult, SavePlanBody } from '@loftwright/contract';

export const usePlans = () =>
  useQuery({
    queryKey: ['plans'],
    queryFn: async () => (await apiClient.get<Plan[]>('/plans')).data,
  });

export const usePlan = (id: string) =>
  useQuery({
    queryKey: ['plans', id],
    queryFn: async () => (await apiClient.get<Plan>(`/plans/${id}`)).data,
  });

export function useSavePlan(id?: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (draft: SavePlanBody) =>
      (id
        ? await apiClient.put<Plan>(`/plans/${id}`, draft)
        : await apiClient.post<Plan>('/plans', draft)
      ).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['plans'] }),
  });
}

export function useRemovePlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (id: string) => {
      await apiClient.delete(`/plans/${id}`);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['plans'] }),
  });
}

/** A starting point: one envelope, air at 15 °C and 1013.25 hPa, delivered-gas price to fill in. */
export const NEW_PLAN: SavePlanBody = {
  title: 'New gas plan',
  lines: [{ volumeM3: 1, count: 1 }],
  fill: { temperatureK: 288.15, pressurePa: 101325 },
  prices: { currency: 'EUR' },
};

/** Kinds whose results include an envelope volume a plan can fill, as the engine says. */
const KINDS_WITH_VOLUME = new Set(
  KINDS.filter((kind) => kind.capabilities.volumeOutput !== undefined).map((kind) => kind.id),
);

/** The calculations a plan line can take its envelope from. */
export const useCalculationOptions = () =>
  useQuery({
    queryKey: ['plans', 'calculation-options'],
    queryFn: async () =>
      (
        await apiClient.get<{ items: CalculationListItem[] }>('/calculations', {
          params: { pageSize: 100, sort: 'title' },
        })
      ).data.items.filter((item) => KINDS_WITH_VOLUME.has(item.kind)),
  });
