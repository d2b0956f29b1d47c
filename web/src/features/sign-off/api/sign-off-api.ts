import type { ReviewedVersion, Verification } from '@loftwright/contract';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';

export type { ReviewedVersion, Verification } from '@loftwright/contract';

/** GET /api/calculations/:id/versions/:n/reviews: the version as its sheet shows it. */
export const useReviewedVersion = (id: string, number: number) =>
  useQuery({
    queryKey: ['calculations', 'reviewed', id, number],
    queryFn: async () =>
      (await apiClient.get<ReviewedVersion>(`/calculations/${id}/versions/${number}/reviews`)).data,
  });

/** GET /api/verify/:fingerprint */
export const useVerification = (fingerprint: string) =>
  useQuery({
    queryKey: ['verify', fingerprint],
    queryFn: async () => (await apiClient.get<Verification>(`/verify/${fingerprint}`)).data,
  });
