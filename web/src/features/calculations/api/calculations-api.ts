import {
  keepPreviousData,
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
} from '@tanstack/react-query';
import type { CalculationResult } from '@loftwright/buoyancy';
import { apiClient } from '@/lib/api-client';
import { dispositionFileName, saveBlob } from '@/lib/save-blob';

export type VersionStatus = 'draft' | 'in_review' | 'approved' | 'changes_requested';

interface UserRef {
  id: string;
  displayName: string;
}

/** Shapes of api/src/calculations/calculation-views.ts. */
export interface CalculationSummary {
  id: string;
  title: string;
  kind: string;
  owner: UserRef | null;
  visibility: 'private' | 'team' | 'published';
  tags: string[];
  latestVersion: number;
  status: VersionStatus;
  archived: boolean;
  createdAt: string;
  updatedAt: string;
}

export interface VersionSummary {
  number: number;
  status: VersionStatus;
  note: string;
  author: UserRef | null;
  reviewer: UserRef | null;
  engineVersion: string;
  fingerprint: string;
  createdAt: string;
  submittedAt: string | null;
}

export interface VersionDetail extends VersionSummary {
  inputs: Record<string, unknown>;
  outputs: CalculationResult['outputs'];
  steps: CalculationResult['steps'];
  warnings: CalculationResult['warnings'];
  series: CalculationResult['series'] | null;
}

export interface CalculationDetail extends CalculationSummary {
  versions: VersionSummary[];
  latest: VersionDetail | null;
  /** What the signed-in user may do with it (api/src/calculations/calculation-access.ts). */
  permissions: {
    edit: boolean;
    archive: boolean;
    submit: boolean;
    review: boolean;
    upload: boolean;
    export: boolean;
  };
}

/** A row of GET /api/calculations: the summary and what the signed-in user may do with it. */
export interface CalculationListItem extends CalculationSummary {
  permissions: { archive: boolean };
}

export interface CalculationPage {
  items: CalculationListItem[];
  total: number;
  page: number;
  pageSize: number;
}

export interface ListParams {
  page: number;
  pageSize: number;
  sort?: string;
  kind?: string;
  status?: string;
  owner?: string;
  tag?: string;
  q?: string;
}

export const getCalculations = async (params: ListParams) =>
  (await apiClient.get<CalculationPage>('/calculations', { params })).data;

export const useCalculations = (params: ListParams) =>
  useQuery({
    queryKey: ['calculations', 'list', params],
    queryFn: () => getCalculations(params),
    placeholderData: keepPreviousData,
  });

export const calculationQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['calculations', 'detail', id],
    queryFn: async () => (await apiClient.get<CalculationDetail>(`/calculations/${id}`)).data,
  });

export const useCalculation = (id: string) => useQuery(calculationQueryOptions(id));

export function useCreateCalculation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: {
      title: string;
      kind: string;
      inputs: unknown;
      visibility?: string;
      tags?: string[];
    }) => (await apiClient.post<CalculationDetail>('/calculations', body)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['calculations', 'list'] }),
  });
}

/** Downloads the calculation as a Loftwright file (docs/file-format.md). */
export async function downloadCalculationFile(id: string): Promise<void> {
  const response = await apiClient.get<Blob>(`/calculations/${id}/export`, {
    responseType: 'blob',
  });
  const header = response.headers['content-disposition'] as string | undefined;
  saveBlob(response.data, dispositionFileName(header, 'calculation.loftwright.json'));
}

/** A Loftwright file read in the browser becomes a new calculation of the user's. */
export function useImportCalculation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (file: File) => {
      let body: unknown;
      try {
        body = JSON.parse(await file.text());
      } catch {
        throw new Error(
          `${file.name} is not a JSON file; a Loftwright file ends in .loftwright.json.`,
        );
      }
      return (await apiClient.post<CalculationDetail>('/calculations/import', body)).data;
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['calculations', 'list'] }),
  });
}

/** Archives (the API never deletes): the calculation leaves the lists, its versions stay. */
export function useArchiveCalculation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (id: string) => {
      await apiClient.delete(`/calculations/${id}`);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['calculations'] }),
  });
}

/** A new draft calculation of the same kind, starting from another one's latest inputs. */
export function useDuplicateCalculation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (id: string) => {
      const source = await queryClient.fetchQuery(calculationQueryOptions(id));
      const body = {
        title: `${source.title} (copy)`.slice(0, 200),
        kind: source.kind,
        inputs: source.latest?.inputs ?? {},
        tags: source.tags,
        note: `Copied from “${source.title}”, version ${source.latestVersion}`,
      };
      return (await apiClient.post<CalculationDetail>('/calculations', body)).data;
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['calculations', 'list'] }),
  });
}

export function useSaveVersion(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: { baseVersion: number; inputs: unknown; note: string }) =>
      (await apiClient.post<VersionDetail>(`/calculations/${id}/versions`, body)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['calculations'] }),
  });
}

export function useSubmitVersion(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ number, reviewerId }: { number: number; reviewerId?: string }) =>
      (
        await apiClient.post<VersionDetail>(
          `/calculations/${id}/versions/${number}/submit`,
          reviewerId ? { reviewerId } : {},
        )
      ).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['calculations'] }),
  });
}

/** GET /api/reviewers: who a version can be submitted to. */
export const useReviewers = (enabled: boolean) =>
  useQuery({
    queryKey: ['reviewers'],
    queryFn: async () =>
      (await apiClient.get<{ id: string; displayName: string }[]>('/reviewers')).data,
    enabled,
  });

/** GET .../versions/:a/diff/:b (diffInputs/diffOutputs of @loftwright/buoyancy). */
export interface VersionDiff {
  from: number;
  to: number;
  inputs: { path: string; from: unknown; to: unknown }[];
  outputs: { name: string; label: string; unit: string; from: number | null; to: number | null }[];
  engineVersion: { from: string; to: string };
}

export const useVersionDiff = (id: string, a: number | undefined, b: number | undefined) =>
  useQuery({
    queryKey: ['calculations', 'diff', id, a, b],
    queryFn: async () =>
      (await apiClient.get<VersionDiff>(`/calculations/${id}/versions/${a}/diff/${b}`)).data,
    enabled: a !== undefined && b !== undefined && a !== b,
  });
