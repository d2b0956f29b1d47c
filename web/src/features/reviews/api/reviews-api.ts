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
        await apiClient.post(
          `/calculations/${calculationId}/versions/${number}/${decision}`,
          decision === 'approve'
            ? // The archived sheet gives the approval in the approver's zone as well as UTC.
              { comment, timeZone: Intl.DateTimeFormat().resolvedOptions().timeZone }
            : { comment },
        )
      ).data,
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: ['calculations'] });
      void queryClient.invalidateQueries({ queryKey: ['reviews'] });
    },
  });
}

/** A review comment (api/src/reviews/review-comments.service.ts, ReviewCommentView). */
export interface ReviewComment {
  id: string;
  versionNumber: number;
  author: { id: string; displayName: string } | null;
  anchor: { kind: 'input' | 'result'; path: string; label: string } | null;
  body: string;
  createdAt: string;
  addressed: {
    versionNumber: number;
    by: { id: string; displayName: string } | null;
    at: string;
  } | null;
}

const commentsKey = (calculationId: string) => ['reviews', 'comments', calculationId];

export const useReviewComments = (calculationId: string) =>
  useQuery({
    queryKey: commentsKey(calculationId),
    queryFn: async () =>
      (await apiClient.get<ReviewComment[]>(`/calculations/${calculationId}/comments`)).data,
  });

export function useAddReviewComment(calculationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({
      number,
      body,
      anchor,
    }: {
      number: number;
      body: string;
      anchor?: { kind: 'input' | 'result'; path: string };
    }) =>
      (
        await apiClient.post<ReviewComment>(
          `/calculations/${calculationId}/versions/${number}/comments`,
          anchor ? { body, anchor } : { body },
        )
      ).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: commentsKey(calculationId) }),
  });
}

export function useMarkAddressed(calculationId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({
      commentId,
      versionNumber,
    }: {
      commentId: string;
      versionNumber: number;
    }) =>
      (await apiClient.post<ReviewComment>(`/comments/${commentId}/addressed`, { versionNumber }))
        .data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: commentsKey(calculationId) }),
  });
}
