import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  AddReviewCommentBody,
  ApproveVersionBody,
  MarkAddressedBody,
  ReviewComment,
  ReviewQueueItem,
  SendBackVersionBody,
} from '@loftwright/contract';
import { apiClient } from '@/lib/api-client';

export type { ReviewComment, ReviewQueueItem } from '@loftwright/contract';

export const useReviewQueue = () =>
  useQuery({
    queryKey: ['reviews', 'queue'],
    queryFn: async () => (await apiClient.get<ReviewQueueItem[]>('/reviews/queue')).data,
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
              ({
                comment,
                timeZone: Intl.DateTimeFormat().resolvedOptions().timeZone,
              } satisfies ApproveVersionBody)
            : ({ comment } satisfies SendBackVersionBody),
        )
      ).data,
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: ['calculations'] });
      void queryClient.invalidateQueries({ queryKey: ['reviews'] });
    },
  });
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
    mutationFn: async ({ number, body, anchor }: AddReviewCommentBody & { number: number }) =>
      (
        await apiClient.post<ReviewComment>(
          `/calculations/${calculationId}/versions/${number}/comments`,
          (anchor ? { body, anchor } : { body }) satisfies AddReviewCommentBody,
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
      (
        await apiClient.post<ReviewComment>(`/comments/${commentId}/addressed`, {
          versionNumber,
        } satisfies MarkAddressedBody)
      ).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: commentsKey(calculationId) }),
  });
}
