import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';

/** GET /api/reviews/queue items (api/src/reviews/reviews.service.ts). */
export interface QueueItem {
  calculationId: string;
  title: string;
  kind: string;
  number: number;
  author: { id: string; displayName: string } | null;
  reviewer: { id: string; displayName: string } | null;
  submittedAt: string | null;
  fingerprint: string;
}

export const useReviewQueue = () =>
  useQuery({
    queryKey: ['reviews', 'queue'],
    queryFn: async () => (await apiClient.get<QueueItem[]>('/reviews/queue')).data,
  });

export function useDecide(calculationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({
      number,
      decision,
      comment,
    }: {
      number: number;
      decision: 'approve' | 'send-back';
      comment: string;
    }) =>
      (
        await apiClient.post(`/calculations/${calculationId}/versions/${number}/${decision}`, {
          comment,
        })
      ).data,
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: ['calculations'] });
      void queryClient.invalidateQueries({ queryKey: ['reviews'] });
    },
  });
}
