import {
  keepPreviousData,
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
} from '@tanstack/react-query';
import type {
  CalculationDetail,
  CalculationListQuery,
  ContinueCalculationBody,
  CalculationPage,
  CreateCalculationBody,
  SaveVersionBody,
  UserRef,
  VersionDetail,
  VersionDiff,
} from '@loftwright/contract';
import { apiClient } from '@/lib/api-client';
import { dispositionFileName, saveBlob } from '@/lib/save-blob';

export type {
  CalculationContinuation,
  CalculationDetail,
  CalculationSource,
  CalculationListItem,
  CalculationListQuery,
  CalculationPage,
  CalculationSummary,
  VersionDetail,
  VersionDiff,
  VersionStatus,
  VersionSummary,
} from '@loftwright/contract';

export const getCalculations = async (params: CalculationListQuery) =>
  (await apiClient.get<CalculationPage>('/calculations', { params })).data;

export const useCalculations = (params: CalculationListQuery) =>
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
    mutationFn: async (body: CreateCalculationBody) =>
      (await apiClient.post<CalculationDetail>('/calculations', body)).data,
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
      const body: CreateCalculationBody = {
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
    mutationFn: async (body: SaveVersionBody) =>
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
    queryFn: async () => (await apiClient.get<UserRef[]>('/reviewers')).data,
    enabled,
  });

/** GET .../versions/:a/diff/:b (diffInputs/diffOutputs of @loftwright/buoyancy). */
export const useVersionDiff = (id: string, a: number | undefined, b: number | undefined) =>
  useQuery({
    queryKey: ['calculations', 'diff', id, a, b],
    queryFn: async () =>
      (await apiClient.get<VersionDiff>(`/calculations/${id}/versions/${a}/diff/${b}`)).data,
    enabled: a !== undefined && b !== undefined && a !== b,
  });

/** GET /api/calculations/:id/versions/:n: one saved version (a source's, for "Take version N"). */
export const getVersion = async (id: string, n: number) =>
  (await apiClient.get<VersionDetail>(`/calculations/${id}/versions/${n}`)).data;

/** POST .../versions/:n/continue: a new calculation of the next kind made from this version. */
/** "Continue as …" from version `version` of calculation `id`. */
export function useContinueCalculation(id: string, version: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: ContinueCalculationBody) =>
      (
        await apiClient.post<CalculationDetail>(
          `/calculations/${id}/versions/${version}/continue`,
          body,
        )
      ).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['calculations'] }),
  });
}
