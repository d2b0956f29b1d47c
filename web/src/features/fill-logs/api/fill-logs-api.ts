import type {
  CalculationResult,
  FillAmbient,
  FillReading,
  LiftInstrument,
} from '@loftwright/buoyancy';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';

export const GAS_SOURCES = [
  { value: 'electrolysis', label: 'Electrolysis (own hydrogen)' },
  { value: 'cylinder', label: 'Cylinders' },
  { value: 'delivered', label: 'Delivered gas' },
  { value: 'other', label: 'Other' },
] as const;

/** GET /api/fill-logs/:id (api/src/fill-logs/fill-log-views.ts). */
export interface FillLog {
  id: string;
  calculationId: string;
  versionNumber: number;
  filledAt: string;
  place: string;
  envelopeLabel: string;
  gasSource: string;
  ambient: FillAmbient;
  readings: FillReading[];
  instrument: LiftInstrument | null;
  note: string;
  outputs: CalculationResult['outputs'];
  steps: CalculationResult['steps'];
  warnings: CalculationResult['warnings'];
  points: { timeS: number; measuredKg: number; predictedKg: number | null }[];
  engineVersion: string;
  createdBy: { id: string; displayName: string } | null;
  createdAt: string;
  updatedAt: string;
}

export interface FillLogDraft {
  filledAt: string;
  place: string;
  envelopeLabel: string;
  gasSource: string;
  ambient: FillAmbient;
  readings: FillReading[];
  instrument: LiftInstrument;
  note: string;
}

const listKey = (calculationId: string) => ['fill-logs', calculationId];

export const useFillLogs = (calculationId: string) =>
  useQuery({
    queryKey: listKey(calculationId),
    queryFn: async () =>
      (await apiClient.get<FillLog[]>(`/calculations/${calculationId}/fill-logs`)).data,
  });

export function useCreateFillLog(calculationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ versionNumber, draft }: { versionNumber: number; draft: FillLogDraft }) =>
      (
        await apiClient.post<FillLog>(
          `/calculations/${calculationId}/versions/${versionNumber}/fill-logs`,
          draft,
        )
      ).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: listKey(calculationId) }),
  });
}

export function useAddReadings(calculationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({
      id,
      mode,
      readings,
    }: {
      id: string;
      mode: 'append' | 'replace';
      readings: FillReading[];
    }) => (await apiClient.post<FillLog>(`/fill-logs/${id}/readings`, { mode, readings })).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: listKey(calculationId) }),
  });
}

export function useRemoveFillLog(calculationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (id: string) => {
      await apiClient.delete(`/fill-logs/${id}`);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: listKey(calculationId) }),
  });
}
