import type {
  Envelope,
  EnvelopeBody,
  EnvelopeDetail,
  UpdateEnvelopeBody,
} from '@loftwright/contract';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';

export type {
  Envelope,
  EnvelopeBody,
  EnvelopeDetail,
  EnvelopeFill,
  LibraryEnvelopeKind,
} from '@loftwright/contract';

export const useEnvelopes = (enabled = true) =>
  useQuery({
    queryKey: ['envelopes'],
    queryFn: async () => (await apiClient.get<Envelope[]>('/envelopes')).data,
    enabled,
  });

export const useEnvelope = (id: string) =>
  useQuery({
    queryKey: ['envelopes', id],
    queryFn: async () => (await apiClient.get<EnvelopeDetail>(`/envelopes/${id}`)).data,
  });

/** Adds an envelope, or replaces one from the version the edit started from (409 if it moved). */
export function useSaveEnvelope(id?: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: EnvelopeBody | UpdateEnvelopeBody) =>
      (id
        ? await apiClient.put<EnvelopeDetail>(`/envelopes/${id}`, body)
        : await apiClient.post<EnvelopeDetail>('/envelopes', body)
      ).data,
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['envelopes'] }),
  });
}

export function useRemoveEnvelope() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (id: string) => {
      await apiClient.delete(`/envelopes/${id}`);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['envelopes'] }),
  });
}
