import { useQuery } from '@tanstack/react-query';
import type { CalculationResult } from '@loftwright/buoyancy';
import { apiClient } from '@/lib/api-client';

interface UserRef {
  id: string;
  displayName: string;
}

/** GET /api/calculations/:id/versions/:n/reviews (api/src/reviews/reviews.service.ts). */
export interface ReviewedVersion {
  number: number;
  status: 'draft' | 'in_review' | 'approved' | 'changes_requested';
  note: string;
  author: UserRef | null;
  engineVersion: string;
  fingerprint: string;
  /** The verify page of the fingerprint, with host (PUBLIC_URL, else the host asked). */
  verifyUrl: string;
  createdAt: string;
  inputs: Record<string, unknown>;
  outputs: CalculationResult['outputs'];
  steps: CalculationResult['steps'];
  warnings: CalculationResult['warnings'];
  reviews: {
    reviewer: UserRef | null;
    decision: 'approved' | 'changes_requested';
    comment: string;
    fingerprint: string;
    /** The calculation's title when the decision was made (null for decisions before it was kept). */
    calculationTitle: string | null;
    createdAt: string;
  }[];
}

export const useReviewedVersion = (id: string, number: number) =>
  useQuery({
    queryKey: ['calculations', 'reviewed', id, number],
    queryFn: async () =>
      (await apiClient.get<ReviewedVersion>(`/calculations/${id}/versions/${number}/reviews`)).data,
  });

/** GET /api/verify/:fingerprint (api/src/reviews/verify.service.ts). */
export type Verification =
  | { fingerprint: string; match: false; message: string }
  | {
      fingerprint: string;
      match: true;
      /** id and title only when the reader may open the calculation; the title as approved. */
      calculation: { id?: string; title?: string; kind: string };
      version: number;
      approvedBy: UserRef | null;
      approvedAt: string;
      comment: string | null;
      engineVersionAtApproval: string;
      currentEngineVersion: string;
      reproduces: boolean;
      differences: {
        name: string;
        label: string;
        unit: string;
        approved: number | null;
        recomputed: number | null;
        /** (recomputed − approved) / |approved|, null where either is missing or approved is 0. */
        relativeChange: number | null;
      }[];
      approvals: {
        calculation: { id: string; title: string } | null;
        version: number;
        approvedBy: UserRef | null;
        approvedAt: string;
      }[];
    };

export const useVerification = (fingerprint: string) =>
  useQuery({
    queryKey: ['verify', fingerprint],
    queryFn: async () => (await apiClient.get<Verification>(`/verify/${fingerprint}`)).data,
  });
