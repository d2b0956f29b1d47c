import type { AddReadingsBody, Envelope, FillLog, FillLogBody } from '@loftwright/contract';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';

export type { FillLog, FillLogBody } from '@loftwright/contract';

/** The sources of gas a fill log names, in the form's words. */
export const GAS_SOURCES = [
  { value: 'electrolysis', label: 'Electrolysis (own hydrogen)' },
  { value: 'cylinder', label: 'Cylinders' },
  { value: 'delivered', label: 'Delivered gas' },
  { value: 'other', label: 'Other' },
] as const satisfies readonly { value: FillLogBody['gasSource']; label: string }[];

const listKey = (calculationId: string) => ['fill-logs', calculationId];

/** The team's library envelopes a fill log can name. */
export const useEnvelopeChoices = () =>
  useQuery({
    queryKey: ['envelopes'],
    queryFn: async () => (await apiClient.get<Envelope[]>('/envelopes')).data,
  });

export const useFillLogs = (calculationId: string) =>
  useQuery({
    queryKey: listKey(calculationId),
    queryFn: async () =>
      (await apiClient.get<FillLog[]>(`/calculations/${calculationId}/fill-logs`)).data,
  });

export function useCreateFillLog(calculationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ versionNumber, draft }: { versionNumber: number; draft: FillLogBody }) =>
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
    mutationFn: async ({ id, mode, readings }: AddReadingsBody & { id: string }) =>
      (await apiClient.post<FillLog>(`/fill-logs/${id}/readings`, { mode, readings })).data,
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
