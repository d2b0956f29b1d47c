import { type CalculationResult, KINDS } from '@loftwright/buoyancy';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';

/** What a planner enters (api/src/plans/dto/plan.dto.ts). */
export interface PlanDraft {
  title: string;
  eventDate?: string;
  lines: {
    label?: string;
    count: number;
    calculationId?: string;
    diameterM?: number;
    volumeM3?: number;
  }[];
  fill: { temperatureK: number; pressurePa: number };
  electrolyser?: {
    currentA: number;
    cellsInSeries: number;
    faradaicEfficiency?: number;
    voltage: { kind: 'cell'; cellVoltageV: number };
    supplyEfficiency?: number;
  };
  cylinder?: {
    gasId: string;
    waterVolumeM3: number;
    fillPressurePa: number;
    residualPressurePa?: number;
    temperatureK: number;
  };
  prices?: {
    currency: string;
    electricityPerKWh?: number;
    cylinderEach?: number;
    bulkGasPerM3?: number;
  };
  pricesDate?: string;
}

export interface PlanLineResult {
  label: string;
  volumeM3: number;
  count: number;
  totalM3: number;
  calculationId: string | null;
  versionNumber: number | null;
}

export interface Plan {
  id: string;
  title: string;
  eventDate: string;
  inputs: PlanDraft;
  result: {
    lines: PlanLineResult[];
    totalM3: number;
    outputs: CalculationResult['outputs'];
    steps: CalculationResult['steps'];
    warnings: CalculationResult['warnings'];
  };
  engineVersion: string;
  createdAt: string;
  updatedAt: string;
}

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
    mutationFn: async (draft: PlanDraft) =>
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
export const NEW_PLAN: PlanDraft = {
  title: 'New gas plan',
  lines: [{ volumeM3: 1, count: 1 }],
  fill: { temperatureK: 288.15, pressurePa: 101325 },
  prices: { currency: 'EUR' },
};

export interface CalculationOption {
  id: string;
  title: string;
  kind: string;
  latestVersion: number;
}

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
        await apiClient.get<{ items: CalculationOption[] }>('/calculations', {
          params: { pageSize: 100, sort: 'title' },
        })
      ).data.items.filter((item) => KINDS_WITH_VOLUME.has(item.kind)),
  });
